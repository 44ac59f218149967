import { describe, expect, it } from 'vitest';
import { buildDiscLattice } from '../../../src/model/lattice/buildDiscLattice';
import { latticeVelocity } from '../../../src/model/lattice/latticeVelocity';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { segmentVelocity } from '../../../src/model/lattice/segmentVelocity';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

const out = new Float64Array(3);
const img = new Float64Array(3);

/** Points on the ground plane z = g, off the disc plane (y != 0) and on it. */
function groundPoints(g: number): [number, number, number][] {
  const pts: [number, number, number][] = [];
  for (const x of [-0.6, -0.2, 0.05, 0.3, 0.9]) for (const y of [-0.4, -0.05, 0.02, 0.3]) pts.push([x, y, g]);
  return pts;
}

describe('latticeVelocity and the ground image (method of images: a plane wall is replaced by the mirrored vortices of opposite circulation, Milne-Thomson, Theoretical Hydrodynamics - from memory)', () => {
  it('a single segment plus its mirror image with opposite circulation has w_z = 0 on the ground', () => {
    const g = -0.35;
    const [ax, ay, az, bx, by, bz] = [0.1, 0, 0.2, -0.3, 0, -0.1];
    for (const [x, y, z] of groundPoints(g)) {
      segmentVelocity(ax, ay, az, bx, by, bz, x, y, z, 1, out);
      segmentVelocity(ax, ay, 2 * g - az, bx, by, 2 * g - bz, x, y, z, -1, img);
      const w = out[2]! + img[2]!;
      const tol = 1e-12 * Math.hypot(out[0]!, out[1]!, out[2]!);
      expect(Math.abs(w), `P=(${x},${y},${z}) w=${w} real=${out[2]} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });

  it('a single vortex ring (one-panel lattice) with ground has w_z = 0 on the ground', () => {
    const lattice = rectangularLattice(0.4, 0.3, 1, 1, -0.2, -0.35);
    const gamma = Float64Array.from([1.7]);
    let scale = 0;
    for (const [x, y, z] of groundPoints(-0.35)) {
      latticeVelocity(lattice, gamma, x, y, z, out);
      scale = Math.max(scale, Math.hypot(out[0]!, out[1]!));
      expect(Math.abs(out[2]!), `P=(${x},${y},${z}) w=${out[2]}`).toBeLessThanOrEqual(1e-14);
    }
    expect(scale, 'the tangential velocity on the ground is not zero').toBeGreaterThan(1e-3);
  });

  it('the whole solved disc lattice with ground has w_z = 0 on z = -R', () => {
    const R = 0.35;
    const lattice = buildDiscLattice({ radiusM: R, spanCount: 10, chordCount: 5, ground: true });
    const sol = solveLattice(lattice, new Float64Array(lattice.panelCount));
    for (const [x, y, z] of groundPoints(-R)) {
      if (Math.abs(y) < 0.01 && Math.abs(x) < 0.1) continue; // the contact point itself is on the lattice
      latticeVelocity(lattice, sol.gamma, x, y, z, out);
      expect(Math.abs(out[2]!), `P=(${x},${y},${z}) w=${out[2]}`).toBeLessThanOrEqual(1e-13);
    }
  });

  it('reproduces the influence matrix: y velocity at control point i from ring j alone (planar vs 3-D kernels)', () => {
    for (const ground of [false, true]) {
      const lattice = buildDiscLattice({ radiusM: 0.3, spanCount: 6, chordCount: 3, ground });
      const n = lattice.panelCount;
      const unit = new Float64Array(n);
      for (let j = 0; j < n; j++) {
        unit.fill(0);
        unit[j] = 1;
        for (let i = 0; i < n; i++) {
          latticeVelocity(lattice, unit, lattice.controlX[i]!, 0, lattice.controlZ[i]!, out);
          const a = lattice.influence[i * n + j]!;
          const tol = 1e-12 * Math.max(1, Math.abs(a));
          expect(
            Math.abs(out[1]! - a),
            `ground=${ground} i=${i} j=${j} got=${out[1]} A=${a} tol=${tol}`,
          ).toBeLessThanOrEqual(tol);
          expect(
            Math.abs(out[0]!) + Math.abs(out[2]!),
            'in-plane velocity of a planar lattice',
          ).toBeLessThanOrEqual(1e-12);
        }
      }
    }
  });

  it('checks its arguments', () => {
    const lattice = rectangularLattice(1, 1, 1, 1, 0, Number.NaN);
    expect(() => latticeVelocity(lattice, new Float64Array(2), 0, 0, 0, out)).toThrow(/gamma.length=2/);
    expect(() => latticeVelocity(lattice, new Float64Array(1), 0, 0, 0, new Float64Array(1))).toThrow(
      /out.length=1/,
    );
  });
});
