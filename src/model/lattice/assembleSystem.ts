import type { RingLattice } from './types';

/**
 * System matrix of the lattice with porous panels, row-major n x n:
 *   M = (1 - o) A - o D,
 * A the influence matrix, D the bidiagonal operator giving each panel's vortex-sheet strength
 * gamma_i = (Gamma_i - Gamma_up) / dx_i (Gamma_up = the ring upstream in the same strip, 0 at the
 * leading panel). Row i states the linear porous condition: the through-flow velocity is
 * proportional to the pressure jump rho V gamma_i, w = (2 / K) gamma_i for a screen of resistance
 * coefficient K (linearised screen law, Taylor & Davies 1944, ARC R&M 2237 - from memory), written
 * with the openness o = 2 / (K + 2):
 *   (1 - o_i) (sum_j A_ij Gamma_j + Vn_i) - o_i gamma_i = 0,
 * so the right-hand side is -(1 - o_i) Vn_i. o = 0 is the solid panel's zero-normal-flow condition
 * (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3), o = 1 a panel that carries no load.
 * Allocation-free when `out` (length >= n*n) is given.
 */
export function assembleSystem(
  lattice: RingLattice,
  openness: Float64Array,
  out?: Float64Array,
): Float64Array {
  const n = lattice.panelCount;
  if (openness.length !== n) {
    throw new RangeError(`assembleSystem: openness.length=${openness.length} must equal panelCount=${n}`);
  }
  for (let i = 0; i < n; i++) {
    const o = openness[i]!;
    if (!(o >= 0 && o <= 1)) {
      throw new RangeError(`assembleSystem: openness[${i}]=${o} must lie in [0, 1]`);
    }
  }
  const m = out ?? new Float64Array(n * n);
  if (m.length < n * n) {
    throw new RangeError(`assembleSystem: out.length=${m.length} must be at least n*n=${n * n}`);
  }
  const a = lattice.influence;
  if (a.length < n * n) {
    throw new RangeError(
      `assembleSystem: the influence matrix has ${a.length} entries, not n*n=${n * n} (a lattice the cache has evicted?)`,
    );
  }
  const chordCount = lattice.chordCount;
  for (let i = 0; i < n; i++) {
    const o = openness[i]!;
    const solid = 1 - o;
    const row = i * n;
    for (let j = 0; j < n; j++) m[row + j] = solid * a[row + j]!;
    if (o > 0) {
      const g = o / lattice.chordLengthM[i]!;
      m[row + i]! -= g;
      if (i % chordCount !== 0) m[row + i - 1]! += g;
    }
  }
  return m;
}
