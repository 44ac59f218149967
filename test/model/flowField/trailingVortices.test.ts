import { describe, expect, it } from 'vitest';
import { trailingVortices } from '../../../src/model/flowField/trailingVortices';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

const EPS = Number.EPSILON;

describe('trailingVortices', () => {
  it('strengths sum to zero (Helmholtz: vortex lines do not end in the fluid), tol 64 eps max|gamma|', () => {
    const lat = buildWheelLattice({
      radiusM: 0.334,
      spanCount: 20,
      chordCount: 10,
      ground: true,
      openAnnuliM: [[0, 0.25]],
    });
    const open = new Float64Array(lat.panelCount);
    for (let p = 0; p < lat.panelCount; p++) {
      const r = Math.hypot(lat.centroidX[p]!, lat.centroidZ[p]!);
      open[p] = r < 0.25 ? 0.6 : 0;
    }
    const { gamma } = solveLattice(lat, open);
    const n = lat.spanCount + 1;
    const x = new Float64Array(n);
    const z = new Float64Array(n);
    const g = new Float64Array(n);
    expect(trailingVortices(lat, gamma, x, z, g)).toBe(n);
    let sum = 0;
    let scale = 0;
    for (let k = 0; k < n; k++) {
      sum += g[k]!;
      scale = Math.max(scale, Math.abs(g[k]!));
      expect(z[k], `edge ${k}`).toBe(lat.edgeZ[k]);
      // Starts behind the trailing edge: x <= -sqrt(R^2 - z^2) + a quarter panel, never ahead of the disc's back.
      expect(x[k]!, `edge ${k} x`).toBeLessThanOrEqual(1e-12);
    }
    const tol = 64 * EPS * scale;
    expect(Math.abs(sum), `sum=${sum} expected=0 tol=${tol}`).toBeLessThanOrEqual(tol);
    expect(scale, 'some vorticity is shed').toBeGreaterThan(0.01);
  });

  it('rectangular wing without ground: tip vortices of opposite sign, antisymmetric shedding (Prandtl lifting line; common practice, no source)', () => {
    const lat = rectangularLattice(1.2, 0.2, 12, 4, -0.6, Number.NaN);
    const { gamma } = solveLattice(lat, new Float64Array(lat.panelCount));
    const n = lat.spanCount + 1;
    const x = new Float64Array(n);
    const z = new Float64Array(n);
    const g = new Float64Array(n);
    trailingVortices(lat, gamma, x, z, g);
    // Gamma > 0 at unit forcing: the lower tip sheds -Gamma (about -x), the upper +Gamma.
    expect(g[0]!).toBeLessThan(0);
    expect(g[n - 1]!).toBeGreaterThan(0);
    for (let k = 0; k < n; k++) {
      const tol = 1e-10 * Math.abs(g[0]!);
      expect(
        Math.abs(g[k]! + g[n - 1 - k]!),
        `k=${k} ${g[k]} vs ${g[n - 1 - k]} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      // Uniform chord: every wake leg starts a quarter panel behind the trailing edge, x = -0.1 - 0.25*0.05.
      const exp = -0.1 - 0.25 * 0.05;
      expect(Math.abs(x[k]! - exp), `k=${k} x=${x[k]} expected=${exp}`).toBeLessThanOrEqual(64 * EPS);
    }
    // The last ring's circulation of the lowest strip is what the lower tip sheds (sign flipped).
    expect(g[0]).toBe(-gamma[lat.chordCount - 1]!);
  });

  it('names a short output', () => {
    const lat = rectangularLattice(1, 1, 3, 2, 0, Number.NaN);
    const gamma = new Float64Array(lat.panelCount);
    expect(() =>
      trailingVortices(lat, gamma, new Float64Array(4), new Float64Array(3), new Float64Array(4)),
    ).toThrow(/outZ.length=3/);
    expect(() =>
      trailingVortices(
        lat,
        new Float64Array(2),
        new Float64Array(4),
        new Float64Array(4),
        new Float64Array(4),
      ),
    ).toThrow(/gamma.length=2/);
  });
});
