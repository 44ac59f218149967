import { describe, expect, it } from 'vitest';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { panelDiscArea } from '../../../src/model/lattice/panelDiscArea';

// Independent check: midpoint rule on a fine grid of the panel (x along each height between the sides).
function gridArea(
  lead0: number,
  trail0: number,
  lead1: number,
  trail1: number,
  z0: number,
  z1: number,
  r: number,
) {
  const nz = 2000;
  const nx = 2000;
  let a = 0;
  for (let i = 0; i < nz; i++) {
    const t = (i + 0.5) / nz;
    const z = z0 + t * (z1 - z0);
    const lead = lead0 + t * (lead1 - lead0);
    const trail = trail0 + t * (trail1 - trail0);
    const dx = (lead - trail) / nx;
    for (let j = 0; j < nx; j++) {
      const x = trail + (j + 0.5) * dx;
      if (x * x + z * z <= r * r) a += dx;
    }
  }
  return (a * (z1 - z0)) / nz;
}

describe('panelDiscArea', () => {
  const cases = [
    // [lead0, trail0, lead1, trail1, z0, z1, r, exact, what]
    [1, 0, 1, 0, 0, 1, 1, Math.PI / 4, 'unit square on the quarter disc: pi / 4'],
    [2, -2, 2, -2, -2, 2, 1, Math.PI, 'a square holding the whole disc: pi r^2'],
    [0.3, -0.2, 0.3, -0.2, -0.4, 0.5, 1, 0.45, 'a rectangle inside the disc: its own area'],
    // Circular segment beyond the chord z = 0.5 of the unit circle, r^2 acos(d) - d sqrt(1 - d^2), half of it (x > 0).
    [
      2,
      0,
      2,
      0,
      0.5,
      2,
      1,
      0.5 * (Math.acos(0.5) - 0.5 * Math.sqrt(0.75)),
      'half the segment beyond z = 0.5',
    ],
    [5, 4, 5, 4, -1, 1, 1, 0, 'a panel clear of the disc: 0'],
  ] as const;
  for (const [l0, t0, l1, t1, z0, z1, r, exact, what] of cases) {
    it(`gives the exact area of ${what} (elementary geometry)`, () => {
      const got = panelDiscArea(l0, t0, l1, t1, z0, z1, r);
      const tol = 1e-13;
      expect(
        Math.abs(got - exact),
        `input=${[l0, t0, l1, t1, z0, z1, r]} got=${got} expected=${exact} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    });
  }

  it('agrees with a fine midpoint grid on slanted panels cut by the circle in several ways', () => {
    const panels = [
      [0.9, 0.2, 0.6, -0.1, 0.3, 0.8, 0.7],
      [0.35, -0.35, 0.1, -0.1, 0.6, 0.95, 0.8],
      [0.5, -0.6, 0.8, -0.3, -0.9, -0.2, 0.75],
      [1.2, 0.9, 0.7, 0.45, -0.3, 0.4, 0.6],
    ];
    for (const [l0, t0, l1, t1, z0, z1, r] of panels) {
      const got = panelDiscArea(l0!, t0!, l1!, t1!, z0!, z1!, r!);
      const expected = gridArea(l0!, t0!, l1!, t1!, z0!, z1!, r!);
      const tol = 2e-5; // the grid's own error (2000 x 2000 cells, first order at the circle)
      expect(
        Math.abs(got - expected),
        `input=${[l0, t0, l1, t1, z0, z1, r]} got=${got} grid=${expected} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('sums to pi r^2 over a disc lattice for a circle inside the lattice (invariant)', () => {
    const R = 0.334;
    const lattice = buildWheelLattice({
      radiusM: R,
      spanCount: 24,
      chordCount: 12,
      ground: true,
      openAnnuliM: [],
      chordClustering: 0.5,
    });
    const cols = lattice.chordCount + 1;
    for (const r of [0.03, 0.2, 0.3]) {
      let sum = 0;
      for (let s = 0; s < lattice.spanCount; s++) {
        for (let m = 0; m < lattice.chordCount; m++) {
          const k = s * cols + m;
          sum += panelDiscArea(
            lattice.panelEdgeLowerX[k]!,
            lattice.panelEdgeLowerX[k + 1]!,
            lattice.panelEdgeUpperX[k]!,
            lattice.panelEdgeUpperX[k + 1]!,
            lattice.edgeZ[s]!,
            lattice.edgeZ[s + 1]!,
            r,
          );
        }
      }
      const exact = Math.PI * r * r;
      expect(
        Math.abs(sum - exact) / exact,
        `r=${r} got=${sum} expected=${exact} tol=1e-12`,
      ).toBeLessThanOrEqual(1e-12);
    }
  });

  it('rejects an empty strip or a bad radius', () => {
    expect(() => panelDiscArea(1, 0, 1, 0, 1, 1, 1)).toThrow(/z1M/);
    expect(() => panelDiscArea(1, 0, 1, 0, 0, 1, -1)).toThrow(/radiusM/);
  });
});
