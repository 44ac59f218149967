/**
 * Saturation vapour pressure over liquid water, Buck's equation: A. L. Buck (1981), "New equations for
 * computing vapor pressure and enhancement factor", J. Appl. Meteorol. 20, 1527-1532, with the
 * coefficients of Buck's 1996 revision: e_s = 611.21 exp((18.678 - t/234.5) t / (257.14 + t)) Pa,
 * t in degrees Celsius. Buck states it within 0.05 % of the reference (Wexler) values over -40..50 C.
 */

const MIN_TEMPERATURE_K = 223.15;
const MAX_TEMPERATURE_K = 373.15;

/**
 * Saturation vapour pressure of water (Pa) at temperatureK (K), 223.15..373.15 K (-50..100 C).
 * @throws RangeError when temperatureK is not finite or outside that range.
 */
export function saturationVapourPressure(temperatureK: number): number {
  if (
    !Number.isFinite(temperatureK) ||
    temperatureK < MIN_TEMPERATURE_K ||
    temperatureK > MAX_TEMPERATURE_K
  ) {
    throw new RangeError(
      `temperatureK=${temperatureK}: must be finite and within ${MIN_TEMPERATURE_K}..${MAX_TEMPERATURE_K} K (Buck's equation range)`,
    );
  }
  const tC = temperatureK - 273.15;
  return 611.21 * Math.exp(((18.678 - tC / 234.5) * tC) / (257.14 + tC));
}
