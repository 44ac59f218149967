import { describe, expect, it } from 'vitest';
import { convectWake } from '../../../src/model/flowField/convectWake';
import { trailingVortices } from '../../../src/model/flowField/trailingVortices';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

const EPS = Number.EPSILON;
const R = 0.334;

function solvedDisc() {
  const lattice = buildWheelLattice({
    radiusM: R,
    spanCount: 16,
    chordCount: 8,
    ground: true,
    openAnnuliM: [],
  });
  const { gamma } = solveLattice(lattice, new Float64Array(lattice.panelCount));
  return { lattice, gamma };
}

function run(
  lattice: ReturnType<typeof solvedDisc>['lattice'],
  gamma: Float64Array,
  b: number,
  steps: number,
) {
  const count = lattice.spanCount + 1;
  const points = new Float64Array(3 * count * (steps + 1));
  const offsets = new Uint32Array(count + 1);
  const strength = new Float64Array(count);
  const u = [-10 * Math.cos(b), 10 * Math.sin(b), 0];
  const n = convectWake(lattice, gamma, u, 0.03, steps, points, offsets, strength);
  return { n, points, offsets, strength };
}

describe('convectWake (a one-pass sketch of wake convection; checks are common practice, no source)', () => {
  it('with zero circulation the filaments are straight lines along the freestream from the trailing nodes', () => {
    const { lattice } = solvedDisc();
    const zero = new Float64Array(lattice.panelCount);
    const b = 0.2;
    const steps = 12;
    const { n, points, offsets, strength } = run(lattice, zero, b, steps);
    expect(n).toBe(lattice.spanCount + 1);
    const sx = new Float64Array(n);
    const sz = new Float64Array(n);
    trailingVortices(lattice, zero, sx, sz, new Float64Array(n));
    for (let f = 0; f < n; f++) {
      expect(strength[f]).toBe(0);
      expect(offsets[f + 1]! - offsets[f]!, `filament ${f} length`).toBe(steps + 1);
      for (let k = 0; k <= steps; k++) {
        const o = 3 * (offsets[f]! + k);
        const exp = [sx[f]! - k * 0.03 * Math.cos(b), k * 0.03 * Math.sin(b), sz[f]!];
        for (let j = 0; j < 3; j++) {
          const tol = 16 * EPS * (1 + k);
          expect(
            Math.abs(points[o + j]! - exp[j]!),
            `f=${f} k=${k} j=${j} got=${points[o + j]} exp=${exp[j]}`,
          ).toBeLessThanOrEqual(tol);
        }
      }
    }
  });

  it('the loaded wake starts at the trailing nodes, stays above the ground, mirrors with yaw and the top filament rolls up', () => {
    const { lattice, gamma } = solvedDisc();
    const b = (10 * Math.PI) / 180;
    const steps = 20;
    const pos = run(
      lattice,
      gamma.map((g) => g * 10 * Math.sin(b)),
      b,
      steps,
    );
    const neg = run(
      lattice,
      gamma.map((g) => -g * 10 * Math.sin(b)),
      -b,
      steps,
    );
    const total = pos.offsets[pos.n]!;
    expect(neg.offsets[neg.n]).toBe(total);
    for (let i = 0; i < total; i++) {
      expect(pos.points[3 * i + 2]!, `point ${i}`).toBeGreaterThanOrEqual(-R);
      expect(
        Math.abs(pos.points[3 * i + 1]! + neg.points[3 * i + 1]!),
        `point ${i} y mirrored`,
      ).toBeLessThanOrEqual(64 * EPS);
    }
    for (let f = 0; f < pos.n; f++) {
      expect(pos.strength[f]).toBe(-neg.strength[f]!);
      expect(pos.points[3 * pos.offsets[f]! + 1]).toBe(0);
    }
    // The top filament (the tip vortex) is displaced from its straight path by its neighbours' swirl.
    const top = pos.n - 1;
    const last = 3 * (pos.offsets[top + 1]! - 1);
    const kLast = pos.offsets[top + 1]! - 1 - pos.offsets[top]!;
    const straightZ = R;
    const straightY = kLast * 0.03 * Math.sin(b);
    const moved = Math.hypot(pos.points[last + 1]! - straightY, pos.points[last + 2]! - straightZ);
    expect(moved, `top filament displacement ${moved} m`).toBeGreaterThan(0.005);
  });

  it('names short outputs', () => {
    const { lattice, gamma } = solvedDisc();
    const count = lattice.spanCount + 1;
    expect(() =>
      convectWake(
        lattice,
        gamma,
        [-1, 0, 0],
        0.1,
        4,
        new Float64Array(10),
        new Uint32Array(count + 1),
        new Float64Array(count),
      ),
    ).toThrow(/outPoints.length=10/);
    expect(() =>
      convectWake(
        lattice,
        gamma,
        [-1, 0, 0],
        0.1,
        4,
        new Float64Array(15 * count),
        new Uint32Array(3),
        new Float64Array(count),
      ),
    ).toThrow(/outOffsets.length=3/);
  });
});
