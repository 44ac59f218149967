import { illinoisRoot } from '../numeric';
import { rowWakeTransportSpeed, spokeRowDrag } from '../sections';
import { cageSwirlFraction } from './cageSwirlFraction';
import { type SpokeRow, spokeAnnulusLoads } from './spokeAnnulusLoads';

/** Tolerance on the residual of the swirl balance, a fraction of omega r: it moves the spokes' loads by
 * about 2e-4 relative, below the 1e-3 to which the Reynolds-number fixed point (spokeRowDrag) and the
 * quadrature hold them, and far below the section laws' 5-17 % bias. */
const TOLERANCE = 1e-4;
/** Secant steps before falling back to false position. */
const SECANT_STEPS = 3;
const row = new Float64Array(3);
/** spokeAnnulusLoads' sums at the last spin evaluated. */
const sums = new Float64Array(6);

function loadsAt(spokes: SpokeRow, radiusM: number, spinMps: number): void {
  sums.fill(0);
  sums[3] = Number.POSITIVE_INFINITY;
  spokeAnnulusLoads(spokes, radiusM, spinMps, 1, sums);
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
 * (the spin the spokes meet equals the mean the balance allows; at x = a'(0) the spokes meet at least
 * a'(0) while the mean cannot exceed it, so g >= 0 there): one Newton step from x = 0 with the torque's
 * slope, then secant steps, and false position (illinoisRoot) on [0, a'(0)] should they leave it.
 *
 * Writes into out (9 entries): [0] the extra swirl fraction x (0 when the merged wake holds the swirl),
 * [1] the mean swirl a' of the balance at x (at a root, the swirl the spokes meet), [2] delta, and in
 * [3..8] spokeAnnulusLoads' sums at the spin omega r (1 - x) and unit length (x force, z force, torque,
 * smallest and largest Reynolds number, torque slope), before the factor N / SPOKE_ANGLE_STEPS.
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
  out.fill(0, 0, 3);
  out.set(sums, 3);
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
  const residual = (x: number) => {
    loadsAt(spokes, radiusM, spin * (1 - x));
    return 1 - (1 - x) * (1 - delta) - Math.max(0, sums[2]! * torqueScale) * perTorque;
  };
  // Newton from x = 0: g(0) = delta - mean0, g'(0) = (1 - delta) + spin dQ/d(spin) a' per torque; then
  // secant steps (g is nearly linear over [0, mean0]); false position on the bracket if they stray.
  const slope = 1 - delta + spin * Math.max(0, sums[5]! * torqueScale) * perTorque;
  let xPrev = 0;
  let gPrev = delta - mean0;
  let x = Math.min(mean0, (mean0 - delta) / slope);
  let g = residual(x);
  for (let step = 0; step < SECANT_STEPS && Math.abs(g) >= TOLERANCE; step++) {
    const next = x - (g * (x - xPrev)) / (g - gPrev);
    if (!(next > 0 && next < mean0)) break;
    xPrev = x;
    gPrev = g;
    x = next;
    g = residual(x);
  }
  if (Math.abs(g) >= TOLERANCE) {
    const gHi = residual(mean0);
    x =
      gHi > 0
        ? illinoisRoot(
            (s) => (s === 0 ? delta - mean0 : s === mean0 ? gHi : residual(s)),
            0,
            mean0,
            TOLERANCE,
          )
        : mean0;
    // The search ends on an evaluated point, but not always the last one: make the sums x's.
    residual(x);
  }
  out[0] = x;
  out[1] = 1 - (1 - x) * (1 - delta);
  out.set(sums, 3);
}
