import { describe, expect, it } from 'vitest';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';
import { factorLattice } from '../../../src/model/lattice/factorLattice';
import { solveFactored } from '../../../src/model/lattice/solveFactored';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

describe('factorLattice + solveFactored', () => {
  const lattice = buildDiscLattice({ radiusM: 0.3, spanCount: 10, chordCount: 5, ground: true });
  const n = lattice.panelCount;
  const o = new Float64Array(n);
  for (let i = 0; i < n; i++) o[i] = (i % 3) * 0.3;

  it('satisfies every boundary condition: (1-o)(A G + Vn) - o gamma = 0 (residual within 1e-12 relative)', () => {
    const factor = factorLattice(lattice, o);
    const sol = solveFactored(factor);
    let worst = 0;
    for (let i = 0; i < n; i++) {
      let w = 1;
      for (let j = 0; j < n; j++) w += lattice.influence[i * n + j]! * sol.gamma[j]!;
      const up = i % lattice.chordCount === 0 ? 0 : sol.gamma[i - 1]!;
      const sheet = (sol.gamma[i]! - up) / lattice.chordLengthM[i]!;
      worst = Math.max(worst, Math.abs((1 - o[i]!) * w - o[i]! * sheet));
    }
    expect(worst, `max residual ${worst}`).toBeLessThanOrEqual(1e-12);
  });

  it('one factorisation serves any forcing: the solution is linear in Vn (exact scaling up to rounding)', () => {
    const factor = factorLattice(lattice, o);
    const unit = solveFactored(factor);
    const scaled = solveFactored(factor, new Float64Array(n).fill(0.25));
    const tol = 1e-12;
    expect(Math.abs(scaled.normalSlope - 0.25 * unit.normalSlope), 'C_N').toBeLessThanOrEqual(tol);
    expect(
      Math.abs(scaled.porousDragSlope - 0.0625 * unit.porousDragSlope),
      'porous drag',
    ).toBeLessThanOrEqual(tol);
    expect(Math.abs(scaled.inducedDragFactor - unit.inducedDragFactor), 'Ki unchanged').toBeLessThanOrEqual(
      tol,
    );
    expect(Math.abs(scaled.centreX - unit.centreX), 'x_cp unchanged').toBeLessThanOrEqual(tol);
    const direct = solveLattice(lattice, o);
    expect(direct.normalSlope).toBe(unit.normalSlope);
  });

  it('keeps a private copy of the openness and checks the forcing length', () => {
    const copy = Float64Array.from(o);
    const factor = factorLattice(lattice, copy);
    copy[0] = 1;
    expect(factor.openness[0]).toBe(o[0]);
    expect(() => solveFactored(factor, new Float64Array(3))).toThrow(/normalVelocityMps.length=3/);
    const bad = new Float64Array(n);
    bad[2] = Number.NaN;
    expect(() => solveFactored(factor, bad)).toThrow(/normalVelocityMps\[2\]=NaN/);
  });
});
