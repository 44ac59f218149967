import { describe, expect, it } from 'vitest';
import { assembleSystem } from '../../../src/model/lattice/assembleSystem';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';

describe('assembleSystem (linear porous condition (1-o)(A G + Vn) - o gamma = 0)', () => {
  const lattice = buildDiscLattice({ radiusM: 0.35, spanCount: 6, chordCount: 4, ground: true });
  const n = lattice.panelCount;

  it('o = 0 gives the solid influence matrix A exactly (Katz & Plotkin sec. 12.3)', () => {
    const m = assembleSystem(lattice, new Float64Array(n));
    for (let i = 0; i < n * n; i++) expect(m[i], `entry ${i}`).toBe(lattice.influence[i]);
  });

  it('o = 1 gives -D: the sheet-strength operator, bidiagonal within each strip (exact)', () => {
    const m = assembleSystem(lattice, new Float64Array(n).fill(1));
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const dx = lattice.chordLengthM[i]!;
        let expected = 0;
        if (j === i) expected = -1 / dx;
        else if (j === i - 1 && i % lattice.chordCount !== 0) expected = 1 / dx;
        expect(m[i * n + j], `M[${i},${j}]`).toBe(expected);
      }
    }
  });

  it('is allocation-free with `out` and blends rows linearly in o', () => {
    const out = new Float64Array(n * n);
    const o = new Float64Array(n).fill(0.3);
    const got = assembleSystem(lattice, o, out);
    expect(got, 'returns out').toBe(out);
    const i = 7;
    const dx = lattice.chordLengthM[i]!;
    const expected = 0.7 * lattice.influence[i * n + i]! - 0.3 / dx;
    const tol = 4 * Number.EPSILON * Math.abs(expected);
    expect(
      Math.abs(got[i * n + i]! - expected),
      `M[7,7] got=${got[i * n + i]} expected=${expected}`,
    ).toBeLessThanOrEqual(tol);
  });

  it('checks its arguments', () => {
    expect(() => assembleSystem(lattice, new Float64Array(n - 1))).toThrow(/openness.length/);
    const bad = new Float64Array(n);
    bad[3] = 1.5;
    expect(() => assembleSystem(lattice, bad)).toThrow(/openness\[3\]=1.5/);
    bad[3] = Number.NaN;
    expect(() => assembleSystem(lattice, bad)).toThrow(/openness\[3\]=NaN/);
    expect(() => assembleSystem(lattice, new Float64Array(n), new Float64Array(4))).toThrow(/out.length=4/);
  });
});
