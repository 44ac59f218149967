/**
 * Mean velocity deficit of the turbulent far wake of a 2-D body (a plane wake), as a fraction of the
 * free-stream speed, at distance x behind the body and offset y from the wake's centre line.
 *
 * Schlichting, Boundary-Layer Theory (ch. "Free turbulent flows", the plane wake; measurements of
 * Schlichting 1930 and Reichardt): centre-line deficit u1/U = 0.98 (x / (Cd d))^(-1/2) and half-value
 * width b_1/2 = 0.25 (x Cd d)^(1/2), with a Gaussian profile u/u1 = exp(-ln 2 (y / b_1/2)^2). These
 * constants carry the body's momentum deficit: integral of u/U dy = 0.98 x 0.25 x sqrt(pi / ln 2) Cd d
 * = 0.52 Cd d ~ Cd d / 2, the drag per unit span over rho U^2 (tested as an invariant).
 *
 * The law holds far downstream (x > about 50 Cd d, Schlichting). Nearer the body the wake is narrower
 * and deeper than the law says; the deficit is capped at 1 (the air at rest relative to the body), the
 * stated limit of its use by the wheel's rim model (rimTyreLoads), which applies it from x ~ 20 Cd d.
 *
 * @param distanceM x behind the body (m, > 0)
 * @param offsetM y from the wake's centre line (m)
 * @param dragLengthM Cd d, the body's drag coefficient times its frontal size (m, >= 0)
 * @throws RangeError for a non-positive distance, a negative drag length or non-finite input.
 */
/** Schlichting's plane-wake constants: centre-line deficit 0.98 (x / Cd d)^(-1/2), half-value width
 * 0.25 (x Cd d)^(1/2) (see above); shared with tandemDragRatio. */
export const PLANE_WAKE_CENTRE_CONSTANT = 0.98;
export const PLANE_WAKE_HALF_VALUE_CONSTANT = 0.25;

export function planeWakeDeficit(distanceM: number, offsetM: number, dragLengthM: number): number {
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) {
    throw new RangeError(`distanceM=${distanceM}: must be finite and > 0`);
  }
  if (!Number.isFinite(offsetM)) throw new RangeError(`offsetM=${offsetM}: must be finite`);
  if (!(dragLengthM >= 0) || !Number.isFinite(dragLengthM)) {
    throw new RangeError(`dragLengthM=${dragLengthM}: must be finite and >= 0`);
  }
  if (dragLengthM === 0) return 0;
  const centre = PLANE_WAKE_CENTRE_CONSTANT * Math.sqrt(dragLengthM / distanceM);
  const halfWidth = PLANE_WAKE_HALF_VALUE_CONSTANT * Math.sqrt(distanceM * dragLengthM);
  const eta = offsetM / halfWidth;
  return Math.min(1, centre * Math.exp(-Math.LN2 * eta * eta));
}
