/** Dynamic pressure q = rho V^2 / 2 (Bernoulli; e.g. Anderson, Fundamentals of Aerodynamics, ch. 3). */

/**
 * Dynamic pressure (Pa) of air of density rhoKgPerM3 moving at speedMps (either sign).
 * @throws RangeError when rhoKgPerM3 is not finite and > 0, or speedMps is not finite.
 */
export function dynamicPressure(rhoKgPerM3: number, speedMps: number): number {
  if (!Number.isFinite(rhoKgPerM3) || rhoKgPerM3 <= 0) {
    throw new RangeError(`rhoKgPerM3=${rhoKgPerM3}: must be finite and > 0`);
  }
  if (!Number.isFinite(speedMps)) {
    throw new RangeError(`speedMps=${speedMps}: must be finite`);
  }
  return 0.5 * rhoKgPerM3 * speedMps * speedMps;
}
