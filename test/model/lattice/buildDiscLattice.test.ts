import { describe, expect, it } from 'vitest';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';

const EPS = Number.EPSILON;

describe('buildDiscLattice', () => {
  it('free disc: the strips tile the inscribed regular 2N-gon, area N R^2 sin(pi / N) (elementary geometry, exact)', () => {
    const R = 0.35;
    for (const N of [2, 7, 24]) {
      const lattice = buildDiscLattice({ radiusM: R, spanCount: N, chordCount: 3, ground: false });
      let area = 0;
      for (let i = 0; i < lattice.panelCount; i++) area += lattice.areaM2[i]!;
      const expected = N * R * R * Math.sin(Math.PI / N);
      const tol = 64 * EPS * expected;
      expect(
        Math.abs(area - expected),
        `N=${N} got=${area} expected=${expected} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      expect(lattice.referenceAreaM2).toBe(Math.PI * R * R);
    }
  });

  it('free disc: cosine-spaced edges, mid-angle control stations, exact mirror symmetry about z = 0', () => {
    const R = 0.3;
    const N = 9;
    const lattice = buildDiscLattice({ radiusM: R, spanCount: N, chordCount: 4, ground: false });
    for (let k = 0; k <= N; k++) {
      const expected = -R * Math.cos((Math.PI * k) / N);
      expect(Math.abs(lattice.edgeZ[k]! - expected), `z_${k}`).toBeLessThanOrEqual(4 * EPS * R);
      expect(lattice.edgeZ[k], `symmetry of z_${k}`).toBe(-lattice.edgeZ[N - k]!);
    }
    for (let s = 0; s < N; s++) {
      const zc = lattice.controlZ[s * 4]!;
      const expected = -R * Math.cos((Math.PI * (s + 0.5)) / N);
      expect(Math.abs(zc - expected), `z_c ${s}`).toBeLessThanOrEqual(4 * EPS * R);
    }
    expect(lattice.groundZM).toBeNaN();
  });

  it('ground: edges z_k = -R + 2R sin(pi k / 2N) (cosine spacing of the disc plus its image), ground plane at -R', () => {
    const R = 0.3;
    const N = 8;
    const lattice = buildDiscLattice({ radiusM: R, spanCount: N, chordCount: 2, ground: true });
    expect(lattice.groundZM).toBe(-R);
    for (let k = 0; k <= N; k++) {
      const expected = -R + 2 * R * Math.sin((Math.PI * k) / (2 * N));
      expect(Math.abs(lattice.edgeZ[k]! - expected), `z_${k}`).toBeLessThanOrEqual(4 * EPS * R);
    }
  });

  it('every control point lies inside its panel, every bound point on its quarter-chord line', () => {
    for (const ground of [false, true]) {
      const lattice = buildDiscLattice({ radiusM: 0.35, spanCount: 12, chordCount: 5, ground });
      const cols = lattice.chordCount + 1;
      for (let p = 0; p < lattice.panelCount; p++) {
        const s = Math.floor(p / lattice.chordCount);
        const c = p % lattice.chordCount;
        const z = lattice.controlZ[p]!;
        expect(z > lattice.edgeZ[s]! && z < lattice.edgeZ[s + 1]!, `p=${p} z inside strip`).toBe(true);
        // Ring spans x between vortex lines c and c+1: the control point lies between them.
        const t = (z - lattice.edgeZ[s]!) / (lattice.edgeZ[s + 1]! - lattice.edgeZ[s]!);
        const xFront = (1 - t) * lattice.nodeX[s * cols + c]! + t * lattice.nodeX[(s + 1) * cols + c]!;
        const xBack = (1 - t) * lattice.nodeX[s * cols + c + 1]! + t * lattice.nodeX[(s + 1) * cols + c + 1]!;
        expect(lattice.controlX[p]! < xFront && lattice.controlX[p]! > xBack, `p=${p} x inside ring`).toBe(
          true,
        );
        expect(
          Math.hypot(lattice.centroidX[p]!, lattice.centroidZ[p]!),
          `p=${p} centroid inside disc`,
        ).toBeLessThan(0.35);
      }
    }
  });

  it('checks its arguments', () => {
    expect(() => buildDiscLattice({ radiusM: -1, spanCount: 4, chordCount: 2, ground: false })).toThrow(
      /radiusM=-1/,
    );
    expect(() => buildDiscLattice({ radiusM: 1, spanCount: 1, chordCount: 2, ground: false })).toThrow(
      /spanCount=1/,
    );
    expect(() => buildDiscLattice({ radiusM: 1, spanCount: 4, chordCount: 0.5, ground: false })).toThrow(
      /chordCount=0.5/,
    );
  });
});
