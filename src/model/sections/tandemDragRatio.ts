import { planeWakeDeficit } from './planeWakeDeficit';

/** Gauss-Legendre nodes on [-1, 1], n = 2, weights 1 (Abramowitz & Stegun, Table 25.4). */
const GL2_X = 1 / Math.sqrt(3);

function dragShare(distanceM: number, yM: number, dragLengthM: number): number {
  const u = 1 - planeWakeDeficit(distanceM, yM, dragLengthM);
  return u * u;
}

/**
 * Drag of a 2-D body standing in the far wake of an equal body ahead, as a fraction of its drag in the
 * undisturbed stream at the same drag coefficient: the mean of (1 - u1(y) / U)^2 over the follower's
 * frontal width (2-point Gauss-Legendre across it), with the plane far-wake deficit u1 of Schlichting's
 * law (planeWakeDeficit, capped at the stream speed) at the distance behind the leader and the
 * follower's lateral offset from the wake's centre line.
 *
 * Tandem circular cylinders (M. M. Zdravkovich 1977, "Review of flow interference between two circular
 * cylinders in various arrangements", J. Fluids Eng. 99, 618-633; D. Sumner 2010, J. Fluids Struct. 26,
 * 849-899): the downstream cylinder's drag stays well below the single cylinder's for spacings up to
 * tens of diameters. The wake law is a far-wake estimate; below the critical spacing (~3.5 diameters,
 * where the leader's shear layers reattach on the follower) it gives shielding of the right sign but
 * not the measured negative drag.
 *
 * @param distanceM distance behind the leader along the flow (> 0)
 * @param offsetM follower's lateral offset from the wake's centre line (finite; sign irrelevant)
 * @param dragLengthM the leader's drag coefficient times its reference length, Cd L (>= 0)
 * @param followerWidthM the follower's frontal width across the flow (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function tandemDragRatio(
  distanceM: number,
  offsetM: number,
  dragLengthM: number,
  followerWidthM: number,
): number {
  if (!(followerWidthM > 0) || !Number.isFinite(followerWidthM)) {
    throw new RangeError(`followerWidthM=${followerWidthM}: must be finite and > 0`);
  }
  const y = Math.abs(offsetM);
  const h = 0.5 * followerWidthM * GL2_X;
  return 0.5 * (dragShare(distanceM, y - h, dragLengthM) + dragShare(distanceM, y + h, dragLengthM));
}
