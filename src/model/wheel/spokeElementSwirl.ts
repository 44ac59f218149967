import { illinoisRoot } from '../numeric';
import { rowWakeTransportSpeed, spokeRowDrag } from '../sections';
import { cageSwirlFraction } from './cageSwirlFraction';
import { type SpokeRow, spokeAnnulusLoads } from './spokeAnnulusLoads';

/** Tolerance on the swirl fraction of the root search (far below the section laws' 5-17 % bias). */
const TOLERANCE = 1e-9;
const row = new Float64Array(3);
const sums = new Float64Array(5);

/**
 * The swirl of the air the spokes at one radius meet, from the angular-momentum balance of the whole
 * spoke cage, solved consistently with the spokes' drag law.
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
 * fraction x, spin omega r (1 - x) before their own row shielding, with x the root of
 *   1 - (1 - x)(1 - delta) = a'(dQ/dr at x)
 * (the spin the spokes meet equals the mean the balance allows); found by false position (illinoisRoot)
 * on [0, 1], where at x = 1 the spokes feel no spin and the in-plane freestream's pushes cancel over a
 * revolution.
 *
 * Writes into out: [0] the extra swirl fraction x (0 when the merged wake holds the swirl), [1] the mean
 * swirl a' of the balance at that x, [2] delta.
 *
 * @param spokes the spoke section and the air (spokeAnnulusLoads)
 * @param radiusM r (> 0)
 * @param omegaRadPerS omega (>= 0; 0 gives no swirl)
 * @param airspeedMps V (>= 0)
 * @param torqueScale factor from spokeAnnulusLoads' sum at unit weight to the annulus torque per unit
 *   radius dQ/dr: N / SPOKE_ANGLE_STEPS x the profile drag factor x the cover share
 * @param torquePerRadiusNmPerM dQ/dr at no extra swirl (x = 0)
 * @throws RangeError for bad input (from the parts).
 */
export function spokeElementSwirl(
  spokes: SpokeRow,
  radiusM: number,
  omegaRadPerS: number,
  airspeedMps: number,
  torqueScale: number,
  torquePerRadiusNmPerM: number,
  out: Float64Array,
): void {
  out[0] = 0;
  out[1] = 0;
  out[2] = 0;
  const spin = omegaRadPerS * radiusM;
  if (!(spin > 0) || !(torqueScale > 0)) return;
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
  const rho = spokes.rhoKgPerM3;
  const mean = (torque: number) =>
    cageSwirlFraction(Math.max(0, torque), radiusM, omegaRadPerS, throughflow, rho);
  out[2] = delta;
  const mean0 = mean(torquePerRadiusNmPerM);
  if (mean0 <= delta) {
    out[1] = mean0;
    return;
  }
  const torqueAt = (x: number) => {
    sums.fill(0);
    sums[3] = Number.POSITIVE_INFINITY;
    spokeAnnulusLoads(spokes, radiusM, spin * (1 - x), 1, sums);
    return sums[2]! * torqueScale;
  };
  const x = illinoisRoot((s) => 1 - (1 - s) * (1 - delta) - mean(torqueAt(s)), 0, 1, TOLERANCE);
  out[0] = x;
  out[1] = mean(torqueAt(x));
}
