import type { WheelLattice } from '../lattice/buildWheelLattice';
import { panelAnnulusFraction } from './panelAnnulusFraction';
import { screenOpenness, spokeScreenForceLengthM, spokeScreenResistance } from './spokeScreen';
import type { WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/**
 * Openness of every panel of a lattice that does not follow the region edges (the fixed lattice: one
 * per wheel radius and counts, shared by every design), so a panel may be partly open: the share f_k
 * of its area in each open annulus k (panelAnnulusFraction, exact), the rest solid (tyre, rim, covers).
 * The regions are panelOpenness's, so the two lattices discretise one model: open inside the rim's inner
 * radius except the cover's annulus; the hub's disc (inside the flange radius) opens with the spokes
 * at the flange radius, even under a cover that reaches it (a stated simplification of panelOpenness).
 *
 * Derivation. assembleSystem's row states, at each point of the sheet, the linear porous condition
 * (1 - o) w - o gamma = 0 (w the normal through-flow velocity, gamma the sheet strength, o = 2 / (K + 2)
 * from the linear screen law w = (2 / K) gamma, Taylor & Davies 1944; o = 0 on solid parts). The lattice
 * holds w (at the control point) and gamma uniform over a panel; the panel's row is the area mean of the
 * pointwise condition (a Galerkin projection on panel-wise constants), (1 - o_mean) w - o_mean gamma = 0,
 * with o_mean = sum_k f_k o_k, o_k = 2 / (K_k + 2) the spokes' screen (spokeScreen) read at the panel's
 * centroid radius clamped into annulus k. Whole panels keep main's o (0 or 2 / (K + 2)), and the row is
 * linear in the shares, so a region edge moving across a panel moves the solution continuously.
 * (The through-flow mean w = sum_k f_k (2 / K_k) gamma, o = 2 f / (K + 2 f) for one annulus, was
 * measured too and rejected: with small K it opens a mostly solid panel at the rim's edge almost fully,
 * and the open spoked wheel's side-force slope fell 23 % short of the aligned lattice's at 24 x 12.)
 *
 * `solidOut` (optional) receives each panel's solid area share 1 - sum_k f_k, for edgeSuctionShares and
 * for leaving partly solid panels out of the porous dissipation (surfaceSolution).
 *
 * `rotationRatio` = ground speed / airspeed (omega R / V): the spokes' rotation relative to the air.
 */
export function partialPanelOpenness(
  lattice: WheelLattice,
  wheel: WheelGeometry,
  radii: WheelRadii,
  rotationRatio: number,
  porosityScale: number,
  out: Float64Array = new Float64Array(lattice.panelCount),
  solidOut?: Float64Array,
): Float64Array {
  if (out.length !== lattice.panelCount || (solidOut && solidOut.length !== lattice.panelCount)) {
    throw new RangeError(`out and solidOut must have ${lattice.panelCount} entries`);
  }
  // The open set of panelOpenness: inside the rim, outside the cover (the hub's disc open even when a
  // cover reaches the flange radius).
  const { coverInnerRadiusM: cIn, coverOuterRadiusM: cOut, rimInnerRadiusM: rimIn } = radii;
  const annuli = (cOut > cIn ? [[0, cIn] as const, [cOut, rimIn] as const] : [[0, rimIn] as const]).filter(
    ([a, b]) => b > a,
  );
  const shares = annuli.map(([a, b]) => panelAnnulusFraction(lattice, a, b));
  for (let p = 0; p < lattice.panelCount; p++) {
    const x = lattice.centroidX[p]!;
    const z = lattice.centroidZ[p]!;
    const rc = Math.sqrt(x * x + z * z);
    let o = 0;
    let share = 0;
    for (let k = 0; k < annuli.length; k++) {
      const f = shares[k]![p]!;
      if (f === 0) continue;
      const [a, b] = annuli[k]!;
      const r = Math.min(b, Math.max(a, rc));
      const rs = Math.max(r, radii.hubRadiusM);
      const ratio = (rotationRatio * r) / radii.outerRadiusM;
      const k2 = spokeScreenResistance(
        rs,
        wheel.spokeCount,
        spokeScreenForceLengthM(wheel, rs, ratio),
        ratio,
        porosityScale,
      );
      o += f * screenOpenness(k2);
      share += f;
    }
    out[p] = Math.min(1, o);
    if (solidOut) solidOut[p] = Math.max(0, 1 - share);
  }
  return out;
}
