import { describe, expect, it } from 'vitest';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';
import { trefftzInducedDrag } from '../../../src/model/lattice/trefftzInducedDrag';

/** Prescribed strip circulation Gamma(z) on every panel's trailing ring (the rest zero). */
function prescribed(lattice: ReturnType<typeof buildDiscLattice>, f: (z: number) => number): Float64Array {
  const g = new Float64Array(lattice.panelCount);
  for (let s = 0; s < lattice.spanCount; s++) {
    const z = lattice.controlZ[s * lattice.chordCount]!;
    for (let c = 0; c < lattice.chordCount; c++) g[s * lattice.chordCount + c] = f(z);
  }
  return g;
}

describe('trefftzInducedDrag', () => {
  it('elliptic loading Gamma0 sqrt(1 - z^2/R^2): C_Di = Gamma0^2 / (4 R^2) on S = pi R^2 (Prandtl lifting line, D = pi rho Gamma0^2 / 8; Anderson sec. 5.3)', () => {
    const R = 0.35;
    const gamma0 = 0.2;
    const expected = (gamma0 * gamma0) / (4 * R * R);
    let previous = Number.POSITIVE_INFINITY;
    for (const N of [8, 16, 32, 64]) {
      const lattice = buildDiscLattice({ radiusM: R, spanCount: N, chordCount: 1, ground: false });
      const got = trefftzInducedDrag(
        lattice,
        prescribed(lattice, (z) => gamma0 * Math.sqrt(1 - (z * z) / (R * R))),
      );
      const rel = Math.abs(got / expected - 1);
      // Measured: the discrete sum converges to the exact value (relative error ~ 1/N^2).
      expect(rel, `N=${N} got=${got} expected=${expected} rel=${rel}`).toBeLessThanOrEqual(2 / (N * N));
      expect(rel, `N=${N} error decreases`).toBeLessThanOrEqual(previous);
      previous = rel;
    }
  });

  it('the ground image reduces the induced drag of the same loading (ground effect) and the drag is >= 0', () => {
    const R = 0.35;
    const free = buildDiscLattice({ radiusM: R, spanCount: 16, chordCount: 1, ground: false });
    const grounded = buildDiscLattice({ radiusM: R, spanCount: 16, chordCount: 1, ground: true });
    const shape = (z: number): number => Math.sqrt(Math.max(0, 1 - (z * z) / (R * R)));
    const dFree = trefftzInducedDrag(free, prescribed(free, shape));
    const dGround = trefftzInducedDrag(grounded, prescribed(grounded, shape));
    expect(dGround, `ground=${dGround} free=${dFree}`).toBeLessThan(dFree);
    expect(dGround, 'non-negative').toBeGreaterThan(0);
  });

  it('checks its arguments', () => {
    const lattice = buildDiscLattice({ radiusM: 1, spanCount: 4, chordCount: 1, ground: false });
    expect(() => trefftzInducedDrag(lattice, new Float64Array(3))).toThrow(/gamma.length=3/);
  });
});
