/**
 * Far wake of a 2-D body (H. Schlichting, Boundary-Layer Theory, ch. "Free turbulent flows", the plane
 * wake behind a cylinder; 7th ed. eqs. 24.34-24.35, from memory): at a distance x behind a body of drag
 * per span D = 0.5 rho U^2 (Cd L), the turbulent wake is self-similar with
 *   centreline velocity deficit  u1 / U = 0.98 (x / (Cd L))^(-1/2),
 *   half-width                   b      = 0.57 (x Cd L)^(1/2),
 *   profile                      u1(y) / u1 = (1 - (|y| / b)^(3/2))^2 for |y| < b, 0 beyond.
 * The constants follow from the momentum balance: the deficit integrates to Cd L U / 2 (drag = momentum
 * flux deficit; 0.98 x 0.57 x 0.9 = 0.503 of the 0.5 it should be). Schlichting states the law for
 * x / (Cd L) > ~50; nearer it is the self-similar extrapolation (a stated approximation).
 * The far wake depends on the body only through its drag length Cd L, so it serves round and thin
 * sections alike.
 */

/** Schlichting's constants (see above). */
export const PLANE_WAKE_DEFICIT_CONSTANT = 0.98;
export const PLANE_WAKE_WIDTH_CONSTANT = 0.57;

/**
 * Centreline velocity deficit u1 / U of the plane turbulent far wake.
 * @param distanceM x, distance behind the body along the flow (> 0)
 * @param dragLengthM Cd L, the body's drag coefficient times its reference length (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function planeWakeDeficit(distanceM: number, dragLengthM: number): number {
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) {
    throw new RangeError(`distanceM=${distanceM}: must be finite and > 0`);
  }
  if (!(dragLengthM > 0) || !Number.isFinite(dragLengthM)) {
    throw new RangeError(`dragLengthM=${dragLengthM}: must be finite and > 0`);
  }
  return PLANE_WAKE_DEFICIT_CONSTANT * Math.sqrt(dragLengthM / distanceM);
}
