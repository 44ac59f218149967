import { PLANE_WAKE_DEFICIT_CONSTANT, PLANE_WAKE_WIDTH_CONSTANT } from './planeWakeDeficit';

/** Gauss-Legendre nodes on [-1, 1], n = 2, weights 1 (Abramowitz & Stegun, Table 25.4). */
const GL2_X = 1 / Math.sqrt(3);

function dragShare(deficitAtCentre: number, halfWidthM: number, yM: number): number {
  const a = Math.abs(yM) / halfWidthM;
  if (a >= 1) return 1;
  const f = 1 - a * Math.sqrt(a);
  const u = 1 - Math.min(1, deficitAtCentre * f * f);
  return u * u;
}

/**
 * Drag of a 2-D body standing in the far wake of an equal body ahead, as a fraction of its drag in the
 * undisturbed stream at the same drag coefficient: the mean of (1 - u1(y) / U)^2 over the follower's
 * frontal width, with the plane far-wake deficit u1 of Schlichting's law (planeWakeDeficit,
 * planeWakeHalfWidthM, planeWakeProfile) at the distance behind the leader and the follower's lateral
 * offset from the wake's centreline (2-point Gauss-Legendre across the width). Where the wake law
 * predicts a deficit above the stream speed (very close spacing) the local speed is taken as zero.
 *
 * Tandem circular cylinders (M. M. Zdravkovich 1977, "Review of flow interference between two circular
 * cylinders in various arrangements", J. Fluids Eng. 99, 618-633): the downstream cylinder's drag stays
 * well below the single cylinder's for spacings up to tens of diameters. The wake law is a far-wake
 * estimate; below the critical spacing (~3.5 diameters, where the leader's shear layers reattach on the
 * follower) it gives shielding of the right sign but not the measured negative drag.
 *
 * @param distanceM distance behind the leader along the flow (> 0)
 * @param offsetM follower's lateral offset from the wake's centreline (finite; sign irrelevant)
 * @param dragLengthM the leader's drag coefficient times its reference length, Cd L (> 0)
 * @param followerWidthM the follower's frontal width across the flow (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function tandemDragRatio(
  distanceM: number,
  offsetM: number,
  dragLengthM: number,
  followerWidthM: number,
): number {
  if (!Number.isFinite(offsetM)) throw new RangeError(`offsetM=${offsetM}: must be finite`);
  if (!(followerWidthM > 0) || !Number.isFinite(followerWidthM)) {
    throw new RangeError(`followerWidthM=${followerWidthM}: must be finite and > 0`);
  }
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) {
    throw new RangeError(`distanceM=${distanceM}: must be finite and > 0`);
  }
  if (!(dragLengthM > 0) || !Number.isFinite(dragLengthM)) {
    throw new RangeError(`dragLengthM=${dragLengthM}: must be finite and > 0`);
  }
  const root = Math.sqrt(distanceM * dragLengthM);
  const deficit = (PLANE_WAKE_DEFICIT_CONSTANT * dragLengthM) / root;
  const b = PLANE_WAKE_WIDTH_CONSTANT * root;
  const y = Math.abs(offsetM);
  const h = 0.5 * followerWidthM;
  if (y - h >= b) return 1; // wholly outside the wake
  return 0.5 * (dragShare(deficit, b, y - h * GL2_X) + dragShare(deficit, b, y + h * GL2_X));
}
