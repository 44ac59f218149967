/**
 * Dynamic viscosity of air by Sutherland's law, with White's constants (F. M. White, Viscous Fluid Flow,
 * Table 1-2): mu = mu0 (T/T0)^(3/2) (T0 + S) / (T + S), mu0 = 1.716e-5 Pa s, T0 = 273.15 K, S = 110.4 K.
 * White quotes it within 2 % over 170..1900 K.
 */

const MU0_PA_S = 1.716e-5;
const T0_K = 273.15;
const SUTHERLAND_K = 110.4;

/**
 * Dynamic viscosity of air (Pa s) at temperatureK (K), 170..1900 K.
 * @throws RangeError when temperatureK is not finite or outside that range.
 */
export function sutherlandViscosity(temperatureK: number): number {
  if (!Number.isFinite(temperatureK) || temperatureK < 170 || temperatureK > 1900) {
    throw new RangeError(
      `temperatureK=${temperatureK}: must be finite and within 170..1900 K (Sutherland's law range)`,
    );
  }
  return MU0_PA_S * (temperatureK / T0_K) ** 1.5 * ((T0_K + SUTHERLAND_K) / (temperatureK + SUTHERLAND_K));
}
