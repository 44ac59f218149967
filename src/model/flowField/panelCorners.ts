import type { RingLattice } from '../lattice/types';

/**
 * Geometric corners of every lattice panel, recovered from its vortex-ring corners. A ring's
 * spanwise lines sit a quarter panel behind the panel's leading edge (Katz & Plotkin, Low-Speed
 * Aerodynamics, 2nd ed., sec. 12.3: bound vortex at the quarter chord, the last ring's trailing line a
 * quarter panel behind the trailing edge), so along each strip edge line with panel edges L[0..n]
 * (leading to trailing) and ring nodes N[0..n]:
 *   N[m] = 0.75 L[m] + 0.25 L[m+1] (m < n),   N[n] = 1.25 L[n] - 0.25 L[n-1].
 * The last two give L[n] = (N[n-1] + 3 N[n]) / 4, and L[m] = (N[m] - 0.25 L[m+1]) / 0.75 runs back to
 * the leading edge, each step damping earlier rounding by 1/3 (the forward recursion would amplify it
 * by 3). Elementary algebra, no further source.
 *
 * Writes 8 numbers per panel p (row-major), the corners in order around the panel in the x-z plane:
 * (x, z) leading-lower, trailing-lower, trailing-upper, leading-upper, i.e. out[8p .. 8p + 7].
 */
export function panelCorners(lattice: RingLattice, out: Float64Array): Float64Array {
  const { spanCount, chordCount, edgeZ, nodeLowerX, nodeUpperX } = lattice;
  const need = 8 * lattice.panelCount;
  if (out.length < need) {
    throw new RangeError(`panelCorners: out.length=${out.length} must be at least 8 * panelCount = ${need}`);
  }
  if (chordCount < 1) throw new RangeError(`panelCorners: chordCount=${chordCount} must be >= 1`);
  const cols = chordCount + 1;
  for (let s = 0; s < spanCount; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const row = s * cols;
    // Walk back from the trailing edge; each line's edge position is kept for the previous panel.
    const n = chordCount;
    let lower = (nodeLowerX[row + n - 1]! + 3 * nodeLowerX[row + n]!) / 4;
    let upper = (nodeUpperX[row + n - 1]! + 3 * nodeUpperX[row + n]!) / 4;
    for (let m = n - 1; m >= 0; m--) {
      const lowerFront = (nodeLowerX[row + m]! - 0.25 * lower) / 0.75;
      const upperFront = (nodeUpperX[row + m]! - 0.25 * upper) / 0.75;
      const o = 8 * (s * chordCount + m);
      out[o] = lowerFront;
      out[o + 1] = z0;
      out[o + 2] = lower;
      out[o + 3] = z0;
      out[o + 4] = upper;
      out[o + 5] = z1;
      out[o + 6] = upperFront;
      out[o + 7] = z1;
      lower = lowerFront;
      upper = upperFront;
    }
  }
  return out;
}
