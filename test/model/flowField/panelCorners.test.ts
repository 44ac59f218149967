import { describe, expect, it } from 'vitest';
import { panelCorners } from '../../../src/model/flowField/panelCorners';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import type { RingLattice } from '../../../src/model/lattice/types';

const EPS = Number.EPSILON;

/** Shoelace area of the quad p (Bronshtein, Handbook of Mathematics: polygon area). */
function quadArea(c: Float64Array, p: number): number {
  let a = 0;
  for (let j = 0; j < 4; j++) {
    const k = (j + 1) % 4;
    a += c[8 * p + 2 * j]! * c[8 * p + 2 * k + 1]! - c[8 * p + 2 * k]! * c[8 * p + 2 * j + 1]!;
  }
  return 0.5 * Math.abs(a);
}

function checkAreas(lattice: RingLattice, relTol: number): void {
  const c = panelCorners(lattice, new Float64Array(8 * lattice.panelCount));
  for (let p = 0; p < lattice.panelCount; p++) {
    const got = quadArea(c, p);
    const exp = lattice.areaM2[p]!;
    const tol = relTol * Math.max(exp, 1e-6 * lattice.referenceAreaM2);
    expect(Math.abs(got - exp), `panel ${p} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  }
}

describe('panelCorners (inverts the quarter-chord ring placement of Katz & Plotkin sec. 12.3; exact algebra)', () => {
  it('rectangular wing: corners are the uniform panel edges, leading edge at chord / 2', () => {
    const chord = 0.3;
    const lat = rectangularLattice(0.8, chord, 4, 5, -0.2, Number.NaN);
    const c = panelCorners(lat, new Float64Array(8 * lat.panelCount));
    const tol = 64 * EPS * chord;
    for (let s = 0; s < 4; s++) {
      for (let m = 0; m < 5; m++) {
        const p = s * 5 + m;
        const front = chord / 2 - (m * chord) / 5;
        const back = chord / 2 - ((m + 1) * chord) / 5;
        const got = [c[8 * p]!, c[8 * p + 2]!, c[8 * p + 4]!, c[8 * p + 6]!];
        const exp = [front, back, back, front];
        for (let j = 0; j < 4; j++) {
          expect(
            Math.abs(got[j]! - exp[j]!),
            `s=${s} m=${m} corner ${j} got=${got[j]} expected=${exp[j]} tol=${tol}`,
          ).toBeLessThanOrEqual(tol);
        }
        expect(c[8 * p + 1]).toBe(lat.edgeZ[s]);
        expect(c[8 * p + 7]).toBe(lat.edgeZ[s + 1]);
      }
    }
  });

  it('disc and wheel lattices: every quad has the lattice panel area (trapezoid), tol 1e-12 relative', () => {
    checkAreas(buildDiscLattice({ radiusM: 0.33, spanCount: 24, chordCount: 12, ground: true }), 1e-12);
    checkAreas(
      buildWheelLattice({
        radiusM: 0.334,
        spanCount: 24,
        chordCount: 12,
        ground: true,
        openAnnuliM: [
          [0, 0.12],
          [0.2, 0.259],
        ],
      }),
      1e-12,
    );
  });

  it("disc lattice: the leading and trailing corners lie on the disc's circle x = +-sqrt(R^2 - z^2)", () => {
    const R = 0.33;
    const lat = buildDiscLattice({ radiusM: R, spanCount: 16, chordCount: 10, ground: false });
    const c = panelCorners(lat, new Float64Array(8 * lat.panelCount));
    const tol = 1e-12 * R;
    for (let s = 0; s < lat.spanCount; s++) {
      const lead = 8 * s * lat.chordCount;
      const trail = 8 * (s * lat.chordCount + lat.chordCount - 1);
      for (const [got, z] of [
        [c[lead]!, c[lead + 1]!],
        [c[lead + 6]!, c[lead + 7]!],
        [-c[trail + 2]!, c[trail + 3]!],
        [-c[trail + 4]!, c[trail + 5]!],
      ] as const) {
        const exp = Math.sqrt(Math.max(0, R * R - z * z));
        expect(Math.abs(got - exp), `z=${z} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
      }
    }
  });

  it('rejects a short output array', () => {
    const lat = rectangularLattice(1, 1, 2, 2, 0, Number.NaN);
    expect(() => panelCorners(lat, new Float64Array(31))).toThrow(/out.length=31/);
  });
});
