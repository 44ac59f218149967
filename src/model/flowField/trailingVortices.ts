import type { RingLattice } from '../lattice/types';

/**
 * The trailing vortices a ring lattice sheds into its wake, one per strip edge line k = 0..spanCount:
 * where it starts (the wake legs' start points, a quarter panel behind the trailing edge; where two
 * strips' corners differ on a shared edge line, their mean) and its circulation, right-handed about
 * the downstream direction (-x):
 *   Gamma_k = gamma_last(k - 1) - gamma_last(k),
 * gamma_last(s) the circulation of strip s's trailing ring (0 outside the lattice). It is the spanwise
 * change of the bound circulation shed into the wake (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed.,
 * sec. 12.3, the vortex-ring wake; Prandtl's lifting-line picture), and the strengths sum to zero: the
 * wake's vortex lines do not end in the fluid (Helmholtz's second theorem).
 * Writes spanCount + 1 values into each output and returns spanCount + 1.
 */
export function trailingVortices(
  lattice: RingLattice,
  gamma: Float64Array,
  outX: Float64Array,
  outZ: Float64Array,
  outStrength: Float64Array,
): number {
  const { spanCount, chordCount, edgeZ, nodeLowerX, nodeUpperX } = lattice;
  if (gamma.length !== lattice.panelCount) {
    throw new RangeError(
      `trailingVortices: gamma.length=${gamma.length} must equal panelCount=${lattice.panelCount}`,
    );
  }
  const count = spanCount + 1;
  for (const [name, a] of [
    ['outX', outX],
    ['outZ', outZ],
    ['outStrength', outStrength],
  ] as const) {
    if (a.length < count) {
      throw new RangeError(
        `trailingVortices: ${name}.length=${a.length} must be >= spanCount + 1 = ${count}`,
      );
    }
  }
  const cols = chordCount + 1;
  for (let k = 0; k < count; k++) {
    const below = k > 0 ? gamma[(k - 1) * chordCount + chordCount - 1]! : 0;
    const above = k < spanCount ? gamma[k * chordCount + chordCount - 1]! : 0;
    const xBelow = k > 0 ? nodeUpperX[(k - 1) * cols + chordCount]! : Number.NaN;
    const xAbove = k < spanCount ? nodeLowerX[k * cols + chordCount]! : Number.NaN;
    outX[k] = k === 0 ? xAbove : k === spanCount ? xBelow : 0.5 * (xBelow + xAbove);
    outZ[k] = edgeZ[k]!;
    outStrength[k] = below - above;
  }
  return count;
}
