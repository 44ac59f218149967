import { rowWakeTransportSpeed, spokeRowDrag } from '../sections';
import { cageSwirlFraction } from './cageSwirlFraction';
import {
  SPOKE_ANGLE_STEPS,
  type SpokeRow,
  spokeAnnulusLoads,
  spokeAnnulusLoadsFrozen,
} from './spokeAnnulusLoads';

/** Tolerance on the residual of the swirl balance, a fraction of omega r (far below the section laws'
 * 5-17 % bias; the frozen evaluations are cheap). */
const TOLERANCE = 1e-9;
const MAX_STEPS = 50;
const row = new Float64Array(3);
/** spokeAnnulusLoads' sums at the spin omega r, the positions' frozen coefficients, and the loads at
 * those coefficients for another spin. */
const sums = new Float64Array(8);
const coefficients = new Float64Array(SPOKE_ANGLE_STEPS);
const frozen = new Float64Array(3);

function loadsAt(spokes: SpokeRow, radiusM: number, spinMps: number): void {
  // Zeroed entry by entry: fill() is a builtin call, dearer than eight stores for eight entries.
  for (let i = 0; i < 8; i++) sums[i] = 0;
  sums[3] = Number.POSITIVE_INFINITY;
  spokeAnnulusLoads(spokes, radiusM, spinMps, 1, sums, coefficients);
}

/** g(x) of the swirl balance (see spokeElementSwirl), from the loads at the frozen coefficients; leaves
 * those loads in `frozen`. A plain function, not a closure made per element. */
function swirlResidual(
  spokes: SpokeRow,
  radiusM: number,
  spinMps: number,
  x: number,
  delta: number,
  torqueScale: number,
  perTorque: number,
): number {
  // As in loadsAt: no fill() call per step.
  frozen[0] = 0;
  frozen[1] = 0;
  frozen[2] = 0;
  spokeAnnulusLoadsFrozen(spokes, radiusM, spinMps * (1 - x), coefficients, frozen);
  return 1 - (1 - x) * (1 - delta) - Math.max(0, frozen[2]! * torqueScale) * perTorque;
}

/**
 * The loads of the spokes at one radius and the swirl of the air they meet, from the angular-momentum
 * balance of the whole spoke cage, solved consistently with the spokes' drag law.
 *
 * Two estimates of the same swirl, as a fraction of omega r:
 * - at the spoke plane, the centre of the merged wake of the spokes ahead: delta = 1 - sqrt(drag ratio)
 *   of spokeRowDrag for the spin omega r and the through-flow V sin(beta) (the spokes' loads already meet
 *   it: spokeAnnulusLoads). A through-flow carries the wakes off the plane, and delta falls to 0 at a few
 *   degrees of yaw;
 * - the mean over the air flushed through the annulus, a' (cageSwirlFraction: Glauert's annulus balance),
 *   with the air passing the disc at the airspeed V (Glauert's momentum theory for a rotor met edgewise or
 *   obliquely) plus the through-flow by which the spokes' merged wake spreads off the plane
 *   (rowWakeTransportSpeed).
 * The swirl the spokes meet at their plane, where they put it in, is at least the mean over the flushed
 * air. While delta >= a' the merged wake already holds it and nothing is added. Where a' > delta (the
 * wakes carried off by a through-flow at yaw, or a weak through-flow), the spokes meet an extra swirl
 * fraction x, spin omega r (1 - x) before their own row shielding, with x the root in [0, a'(0)] of
 *   g(x) = 1 - (1 - x)(1 - delta) - a'(dQ/dr at x)
 * (the spin the spokes meet equals the mean the balance allows). The swirl is small (a few per cent of
 * omega r), so g is solved with each revolution position's drag coefficient and wake shielding kept at
 * their values for the spin omega r (spokeAnnulusLoadsFrozen: only the relative velocity changes): one
 * Newton step from x = 0 with the torque's slope, then secant steps (bisection toward the bracket
 * [0, a'(0)] should one leave it; at x = a'(0) the spokes meet at least a'(0) while the mean cannot
 * exceed it, so g >= 0 there). The loads at x come from the same frozen coefficients: one evaluation of
 * the section laws per element, as without the swirl. Against the full consistent solution, every
 * coefficient re-evaluated at every x (test/model/wheel/spokeElementSwirl.test.ts), the wheel's spoke
 * loads agree to 0.5 % at worst over the validity range (where a through-flow moves the wakes to the edge
 * of the next spoke, so the shielding changes with the spin), 0.1 % typically; the swirl itself changes
 * them by 1-5 %.
 *
 * Writes into out (8 entries): [0] the extra swirl fraction x (0 when the merged wake holds the swirl),
 * [1] the mean swirl a' of the balance at x (when x > 0, the swirl the spokes meet), [2] delta, and in
 * [3..7] the element's loads at unit length as spokeAnnulusLoads sums them, at the spin omega r (1 - x)
 * (x force, z force, torque, before the factor N / SPOKE_ANGLE_STEPS; the smallest and largest Reynolds
 * number met, taken at x = 0).
 *
 * @param spokes the spoke section and the air (spokeAnnulusLoads)
 * @param radiusM r (> 0)
 * @param omegaRadPerS omega (>= 0; 0 gives no swirl)
 * @param airspeedMps V (>= 0)
 * @param torqueScale factor from spokeAnnulusLoads' sum at unit length to the annulus torque per unit
 *   radius dQ/dr: N / SPOKE_ANGLE_STEPS x the profile drag factor x the cover share (0: no swirl)
 * @throws RangeError for bad input (from the parts).
 */
export function spokeElementSwirl(
  spokes: SpokeRow,
  radiusM: number,
  omegaRadPerS: number,
  airspeedMps: number,
  torqueScale: number,
  out: Float64Array,
): void {
  const spin = omegaRadPerS * radiusM;
  loadsAt(spokes, radiusM, spin);
  out[0] = 0;
  out[1] = 0;
  out[2] = 0;
  for (let i = 0; i < 5; i++) out[3 + i] = sums[i]!;
  // A spin below 1e-9 of the airspeed puts no swirl worth solving into the air (and its row geometry
  // underflows).
  if (!(spin > 1e-9 * airspeedMps) || !(spin > 0) || !(torqueScale > 0)) return;
  const spacing = spokes.spacingPerRadius * radiusM;
  spokeRowDrag(
    spokes.round,
    spokes.thicknessRatio,
    spokes.refLengthM,
    spacing,
    spin,
    spokes.vNormalMps,
    spokes.nuM2PerS,
    row,
  );
  const delta = 1 - Math.sqrt(row[1]!);
  const throughflow = airspeedMps + rowWakeTransportSpeed(row[0]! * spokes.refLengthM, spacing, spin);
  // a' per unit torque per radius (N m / m) of the balance.
  const perTorque = cageSwirlFraction(1, radiusM, omegaRadPerS, throughflow, spokes.rhoKgPerM3);
  const mean0 = Math.max(0, sums[2]! * torqueScale) * perTorque;
  out[1] = mean0;
  out[2] = delta;
  if (mean0 <= delta) return;
  // Newton from x = 0 with the torque's slope, then secant steps on g, each g from the loads at frozen
  // drag coefficients and shielding (spokeAnnulusLoadsFrozen); the root stays in [0, mean0].
  let xPrev = 0;
  let gPrev = delta - mean0;
  let x = Math.min(
    mean0,
    (mean0 - delta) / (1 - delta + spin * Math.max(0, sums[7]! * torqueScale) * perTorque),
  );
  let gx = swirlResidual(spokes, radiusM, spin, x, delta, torqueScale, perTorque);
  for (let step = 0; step < MAX_STEPS && Math.abs(gx) > TOLERANCE; step++) {
    let next = x - (gx * (x - xPrev)) / (gx - gPrev);
    // Keep to the bracket [0, mean0] (g(0) < 0 <= g(mean0)); bisect toward it should the secant leave it.
    if (!(next > 0 && next < mean0)) next = 0.5 * (x + (gx < 0 ? mean0 : 0));
    xPrev = x;
    gPrev = gx;
    x = next;
    gx = swirlResidual(spokes, radiusM, spin, x, delta, torqueScale, perTorque);
  }
  out[0] = x;
  out[1] = 1 - (1 - x) * (1 - delta);
  out[3] = frozen[0]!;
  out[4] = frozen[1]!;
  out[5] = frozen[2]!;
}
