import { PLANE_WAKE_CENTRE_CONSTANT, PLANE_WAKE_HALF_VALUE_CONSTANT } from './planeWakeDeficit';

/** Gauss-Legendre nodes on [-1, 1], n = 2, weights 1 (Abramowitz & Stegun, Table 25.4). */
const GL2_X = 1 / Math.sqrt(3);
/** Half-value widths beyond which the wake is taken as gone (deficit < 2e-5 of its centre value). */
const TAIL_CUTOFF = 4;
// Local copies of the shared constants: read once, not through a module binding in the hot loop.
const CENTRE = PLANE_WAKE_CENTRE_CONSTANT;
const HALF_VALUE = PLANE_WAKE_HALF_VALUE_CONSTANT;

function tandemInputError(
  distanceM: number,
  offsetM: number,
  dragLengthM: number,
  widthM: number,
): RangeError {
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) {
    return new RangeError(`distanceM=${distanceM}: must be finite and > 0`);
  }
  if (!Number.isFinite(offsetM)) return new RangeError(`offsetM=${offsetM}: must be finite`);
  if (!(dragLengthM >= 0) || !Number.isFinite(dragLengthM)) {
    return new RangeError(`dragLengthM=${dragLengthM}: must be finite and >= 0`);
  }
  return new RangeError(`followerWidthM=${widthM}: must be finite and > 0`);
}

/** (1 - deficit)^2 at lateral position y of a Gaussian wake (centre deficit, half-value width). */
function dragShare(centre: number, halfValueWidthM: number, yM: number): number {
  const eta = yM / halfValueWidthM;
  const u = 1 - Math.min(1, centre * Math.exp(-Math.LN2 * eta * eta));
  return u * u;
}

/**
 * Drag of a 2-D body standing in the far wake of an equal body ahead, as a fraction of its drag in the
 * undisturbed stream at the same drag coefficient: the mean of (1 - u1(y) / U)^2 over the follower's
 * frontal width (2-point Gauss-Legendre across it), with the plane far-wake deficit u1 of Schlichting's
 * law (the constants and Gaussian profile of planeWakeDeficit, capped at the stream speed, evaluated
 * here once per call for speed: this runs for every spoke element) at the distance behind the leader
 * and the follower's lateral offset from the wake's centre line.
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
  // One combined test keeps the hot path small (it runs for every spoke element); the message is built
  // only on failure.
  if (
    !(distanceM > 0 && distanceM < Number.POSITIVE_INFINITY) ||
    !(Math.abs(offsetM) < Number.POSITIVE_INFINITY) ||
    !(dragLengthM >= 0 && dragLengthM < Number.POSITIVE_INFINITY) ||
    !(followerWidthM > 0 && followerWidthM < Number.POSITIVE_INFINITY)
  ) {
    throw tandemInputError(distanceM, offsetM, dragLengthM, followerWidthM);
  }
  if (dragLengthM === 0) return 1;
  const root = Math.sqrt(distanceM * dragLengthM);
  const centre = (CENTRE * dragLengthM) / root;
  const halfValueWidth = HALF_VALUE * root;
  const y = Math.abs(offsetM);
  const h = 0.5 * followerWidthM * GL2_X;
  // Beyond TAIL_CUTOFF half-value widths the Gaussian deficit is below 2e-5 of its centre value: the
  // follower stands outside the wake (a stated truncation, far below the law's own accuracy).
  if (y - h >= TAIL_CUTOFF * halfValueWidth) return 1;
  // On the centre line the two Gauss points sit at -h and h, where the even profile gives the same
  // bits (negation is exact): their mean is either one, one exponential saved.
  if (y === 0) return dragShare(centre, halfValueWidth, h);
  return 0.5 * (dragShare(centre, halfValueWidth, y - h) + dragShare(centre, halfValueWidth, y + h));
}
