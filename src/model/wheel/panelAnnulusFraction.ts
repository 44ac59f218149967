import type { WheelLattice } from '../lattice/buildWheelLattice';
import { panelDiscArea } from '../lattice/panelDiscArea';

/**
 * Share of each panel's area inside the annulus inner <= r <= outer (m): the panel's exact areas in
 * the two discs (panelDiscArea) differenced, over the panel's area. Shares within 1e-12 of 0 or 1 are
 * snapped there (rounding of a panel wholly outside or inside). Geometry only.
 */
export function panelAnnulusFraction(
  lattice: WheelLattice,
  innerM: number,
  outerM: number,
  out: Float64Array = new Float64Array(lattice.panelCount),
): Float64Array {
  if (!(innerM >= 0 && outerM >= innerM && Number.isFinite(outerM))) {
    throw new RangeError(
      `panelAnnulusFraction: annulus [${innerM}, ${outerM}] must satisfy 0 <= inner <= outer, finite`,
    );
  }
  if (out.length !== lattice.panelCount) {
    throw new RangeError(
      `panelAnnulusFraction: out must have ${lattice.panelCount} entries, got ${out.length}`,
    );
  }
  const { spanCount, chordCount, edgeZ, panelEdgeLowerX: lo, panelEdgeUpperX: up } = lattice;
  const cols = chordCount + 1;
  for (let s = 0; s < spanCount; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    for (let m = 0; m < chordCount; m++) {
      const p = s * chordCount + m;
      const k = s * cols + m;
      const inDisc = (r: number) =>
        r > 0 ? panelDiscArea(lo[k]!, lo[k + 1]!, up[k]!, up[k + 1]!, z0, z1, r) : 0;
      const area = lattice.areaM2[p]!;
      const f = area > 0 ? (inDisc(outerM) - inDisc(innerM)) / area : 0;
      out[p] = f < 1e-12 ? 0 : f > 1 - 1e-12 ? 1 : f;
    }
  }
  return out;
}
