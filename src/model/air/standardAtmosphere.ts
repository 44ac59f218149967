/**
 * ISA troposphere (ICAO Doc 7488, 1993; U.S. Standard Atmosphere 1976, identical below 32 km):
 * linear temperature lapse from sea level to the tropopause at 11 km geopotential altitude,
 * T = T0 - L h, p = p0 (T / T0)^(g0 / (R L)), rho = p / (R T).
 */

export interface StandardAtmosphereState {
  temperatureK: number;
  pressurePa: number;
  densityKgPerM3: number;
}

/** Sea-level temperature (K), pressure (Pa), lapse rate (K/m), g0 (m/s^2), R of dry air (J/(kg K)). */
const SEA_LEVEL_TEMPERATURE_K = 288.15;
const SEA_LEVEL_PRESSURE_PA = 101325;
const LAPSE_RATE_K_PER_M = 0.0065;
const G0_MPS2 = 9.80665;
const R_AIR_J_PER_KG_K = 287.05287;
/** g0 / (R L) = 5.25588 (the standard's exponent). */
const PRESSURE_EXPONENT = G0_MPS2 / (R_AIR_J_PER_KG_K * LAPSE_RATE_K_PER_M);

/** Lowest altitude accepted (m); the 1976 standard tabulates from -5 km, road cycling needs far less. */
export const STANDARD_ATMOSPHERE_MIN_ALTITUDE_M = -5000;
/** Tropopause (m): top of the linear-lapse layer this function models. */
export const STANDARD_ATMOSPHERE_MAX_ALTITUDE_M = 11000;

/**
 * Temperature, pressure and density of the ISA at a geopotential altitude (m) in -5 km .. 11 km.
 * @throws RangeError when altitudeM is not finite or outside that layer.
 */
export function standardAtmosphere(altitudeM: number): StandardAtmosphereState {
  if (
    !Number.isFinite(altitudeM) ||
    altitudeM < STANDARD_ATMOSPHERE_MIN_ALTITUDE_M ||
    altitudeM > STANDARD_ATMOSPHERE_MAX_ALTITUDE_M
  ) {
    throw new RangeError(
      `altitudeM=${altitudeM}: must be finite and within ${STANDARD_ATMOSPHERE_MIN_ALTITUDE_M}..${STANDARD_ATMOSPHERE_MAX_ALTITUDE_M} m (ISA troposphere)`,
    );
  }
  const temperatureK = SEA_LEVEL_TEMPERATURE_K - LAPSE_RATE_K_PER_M * altitudeM;
  const pressurePa = SEA_LEVEL_PRESSURE_PA * (temperatureK / SEA_LEVEL_TEMPERATURE_K) ** PRESSURE_EXPONENT;
  const densityKgPerM3 = pressurePa / (R_AIR_J_PER_KG_K * temperatureK);
  return { temperatureK, pressurePa, densityKgPerM3 };
}
