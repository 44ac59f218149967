/**
 * Unit conversions used only at the edges (files, command line, page). The model works in SI.
 *
 * Exact definitions: 1 km/h = 1000/3600 m/s; 1 mile = 1609.344 m (international mile, exact since
 * 1959); standard acceleration of gravity g0 = 9.80665 m/s^2 (exact, NIST SP 811 (2008) B.8/B.9);
 * 0 degC = 273.15 K (exact, NIST SP 811 4.2.1.1). One gram-force is 1e-3 kg x g0.
 */

/** Standard acceleration of gravity (m/s^2), exact by definition (NIST SP 811). */
export const G0_MPS2 = 9.80665;
/** Metres in one international mile, exact. */
export const METRES_PER_MILE = 1609.344;
/** Kelvin at 0 degrees Celsius, exact. */
export const KELVIN_AT_0C = 273.15;

export function degToRad(deg: number): number {
  return (deg * Math.PI) / 180;
}

export function radToDeg(rad: number): number {
  return (rad * 180) / Math.PI;
}

export function kmhToMps(kmh: number): number {
  return kmh / 3.6;
}

export function mpsToKmh(mps: number): number {
  return mps * 3.6;
}

export function mphToMps(mph: number): number {
  return (mph * METRES_PER_MILE) / 3600;
}

export function mpsToMph(mps: number): number {
  return (mps * 3600) / METRES_PER_MILE;
}

export function celsiusToKelvin(celsius: number): number {
  return celsius + KELVIN_AT_0C;
}

export function kelvinToCelsius(kelvin: number): number {
  return kelvin - KELVIN_AT_0C;
}

/** Force in newtons expressed in grams-force (gf): N / g0 * 1000. */
export function newtonsToGramsForce(forceN: number): number {
  return (forceN / G0_MPS2) * 1000;
}

export function gramsForceToNewtons(gramsForce: number): number {
  return (gramsForce / 1000) * G0_MPS2;
}

/**
 * Grams-force of a drag area at a given speed and density: cdA * 0.5 rho V^2 / g0 * 1000.
 * The trade quotes drag this way ("grams at 50 km/h").
 */
export function dragAreaToGramsForce(cdaM2: number, speedMps: number, rhoKgPerM3: number): number {
  return newtonsToGramsForce(cdaM2 * 0.5 * rhoKgPerM3 * speedMps * speedMps);
}
