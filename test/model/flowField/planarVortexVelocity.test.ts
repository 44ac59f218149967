import { describe, expect, it } from 'vitest';
import { packLatticeVortices } from '../../../src/model/flowField/packLatticeVortices';
import { planarVortexVelocity } from '../../../src/model/flowField/planarVortexVelocity';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { latticeVelocity } from '../../../src/model/lattice/latticeVelocity';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

describe('packLatticeVortices + planarVortexVelocity', () => {
  it('reproduce latticeVelocity (Katz & Plotkin eq. 10.115 summed over the lattice) to 1e-12 of the local speed', () => {
    for (const ground of [true, false]) {
      const lattice = buildWheelLattice({
        radiusM: 0.334,
        spanCount: 14,
        chordCount: 7,
        ground,
        openAnnuliM: [
          [0, 0.1],
          [0.2, 0.26],
        ],
      });
      const open = new Float64Array(lattice.panelCount);
      for (let p = 0; p < lattice.panelCount; p++) {
        const r = Math.hypot(lattice.centroidX[p]!, lattice.centroidZ[p]!);
        open[p] = r < 0.1 || (r > 0.2 && r < 0.26) ? 0.5 : 0;
      }
      const { gamma } = solveLattice(lattice, open);
      const set = packLatticeVortices(lattice, gamma);
      const a = new Float64Array(3);
      const b = new Float64Array(3);
      // Deterministic points in a box around the wheel, on and off its plane.
      for (let i = 0; i < 200; i++) {
        const x = -0.6 + ((i * 37) % 101) * 0.012;
        const y = [0, 0.004, -0.05, 0.3][i % 4]!;
        const z = -0.334 + ((i * 53) % 97) * 0.008;
        latticeVelocity(lattice, gamma, x, y, z, a);
        planarVortexVelocity(set, x, y, z, b);
        const scale = Math.hypot(a[0]!, a[1]!, a[2]!);
        const tol = 1e-12 * Math.max(scale, 1e-6);
        for (let j = 0; j < 3; j++) {
          expect(
            Math.abs(a[j]! - b[j]!),
            `ground=${ground} P=(${x},${y},${z}) j=${j} got=${b[j]} expected=${a[j]} tol=${tol}`,
          ).toBeLessThanOrEqual(tol);
        }
      }
    }
  });

  it('a horseshoe far downstream: the velocity between two trailing legs of a wide wing tends to the 2-D pair value (Katz & Plotkin sec. 2.13; from memory), tol 1%', () => {
    // One ring of span b = 2 m, circulation G: far downstream at mid-span (x -> -inf, y = 0) the two
    // semi-infinite legs each give G / (2 pi (b/2)) (twice the half-infinite value), together 2 G / (pi b)
    // along -y for G > 0 (downwash of the lifting line).
    const lat = rectangularLattice(2, 0.1, 1, 1, -1, Number.NaN);
    const g = 1.3;
    const set = packLatticeVortices(lat, Float64Array.from([g]));
    const out = planarVortexVelocity(set, -500, 0, 0, new Float64Array(3));
    const exp = (-2 * g) / (Math.PI * 2);
    const tol = 0.01 * Math.abs(exp);
    expect(Math.abs(out[1]! - exp), `got=${out[1]} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('drops zero circulation and reuses the arrays of the set it is given', () => {
    const lat = rectangularLattice(1, 0.3, 3, 2, 0, Number.NaN);
    const set = packLatticeVortices(lat, new Float64Array(lat.panelCount));
    expect(set.segmentCount).toBe(0);
    expect(set.legCount).toBe(0);
    const segments = set.segments;
    const again = packLatticeVortices(lat, new Float64Array(lat.panelCount).fill(1), set);
    expect(again).toBe(set);
    expect(again.segments).toBe(segments);
    // Per strip: the bound line of ring 0, no net line between equal rings, 2 sides per ring, 2 legs.
    expect(again.segmentCount).toBe(3 * (1 + 2 * 2));
    expect(again.legCount).toBe(6);
    expect(() => packLatticeVortices(lat, new Float64Array(2))).toThrow(/gamma.length=2/);
    expect(() => planarVortexVelocity(again, 0, 0, 0, new Float64Array(2))).toThrow(/out.length=2/);
  });
});
