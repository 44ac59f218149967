import { saturationVapourPressure } from './saturationVapourPressure';

/**
 * Density of moist air as an ideal-gas mixture of dry air and water vapour (Dalton's law of partial
 * pressures): rho = (p - p_v) / (R_d T) + p_v / (R_v T), p_v = RH e_s(T) (e_s by Buck 1981).
 * Gas constants: R_d = 287.058 J/(kg K) (dry air, M = 28.9645 g/mol), R_v = 461.495 J/(kg K) (water,
 * M = 18.01528 g/mol). Neglects the compressibility factor and enhancement factor of the CIPM-2007
 * formula (each below 0.05 % at ambient conditions).
 */

export interface AirState {
  temperatureK: number;
  pressurePa: number;
  /** Relative humidity as a fraction 0..1. */
  relativeHumidity: number;
}

const R_DRY_J_PER_KG_K = 287.058;
const R_VAPOUR_J_PER_KG_K = 461.495;

/**
 * Moist-air density (kg/m^3).
 * @throws RangeError when temperatureK is outside 223.15..373.15 K, pressurePa is not in (0, 2e5], relativeHumidity
 * is not in 0..1, or the vapour partial pressure would exceed the total pressure.
 */
export function airDensity({ temperatureK, pressurePa, relativeHumidity }: AirState): number {
  if (!Number.isFinite(pressurePa) || pressurePa <= 0 || pressurePa > 2e5) {
    throw new RangeError(`pressurePa=${pressurePa}: must be finite, > 0 and <= 2e5 Pa`);
  }
  if (!Number.isFinite(relativeHumidity) || relativeHumidity < 0 || relativeHumidity > 1) {
    throw new RangeError(`relativeHumidity=${relativeHumidity}: must be a fraction within 0..1`);
  }
  const vapourPa = relativeHumidity * saturationVapourPressure(temperatureK);
  if (vapourPa >= pressurePa) {
    throw new RangeError(
      `relativeHumidity=${relativeHumidity}: vapour pressure ${vapourPa} Pa must stay below pressurePa=${pressurePa}`,
    );
  }
  return (
    (pressurePa - vapourPa) / (R_DRY_J_PER_KG_K * temperatureK) +
    vapourPa / (R_VAPOUR_J_PER_KG_K * temperatureK)
  );
}
