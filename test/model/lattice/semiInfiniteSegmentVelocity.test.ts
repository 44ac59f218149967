import { describe, expect, it } from 'vitest';
import { segmentVelocity } from '../../../src/model/lattice/segmentVelocity';
import { semiInfiniteSegmentVelocity } from '../../../src/model/lattice/semiInfiniteSegmentVelocity';

const EPS = Number.EPSILON;
const out = new Float64Array(3);
const ref = new Float64Array(3);

describe('semiInfiniteSegmentVelocity', () => {
  it('gives Gamma / (4 pi h) abreast of its end (Katz & Plotkin sec. 2.13, half of the infinite line)', () => {
    const gamma = 0.9;
    const h = 0.35;
    semiInfiniteSegmentVelocity(1, 2, 3, -1, 0, 0, 1, 2, 3 + h, gamma, out);
    const expected = gamma / (4 * Math.PI * h);
    const tol = 4 * EPS * expected;
    // e = -x, point at +z from A: e x r = (-x) x (+z) = +y.
    expect(Math.abs(out[1]! - expected), `got=${out[1]} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
    expect(Math.abs(out[0]!) + Math.abs(out[2]!), 'other components').toBe(0);
  });

  it('matches a long finite segment (relative 1e-6, the finite segment missing the far part)', () => {
    const e = [0.6, 0, -0.8];
    const length = 1e7;
    const points = [
      [0.2, 0.3, 0.1],
      [-1, 0.5, 2],
      [3, -0.2, -0.4],
    ];
    for (const [px, py, pz] of points) {
      semiInfiniteSegmentVelocity(0.1, 0, 0.2, e[0]!, e[1]!, e[2]!, px!, py!, pz!, 1.7, out);
      segmentVelocity(0.1, 0, 0.2, 0.1 + length * e[0]!, 0, 0.2 + length * e[2]!, px!, py!, pz!, 1.7, ref);
      for (let c = 0; c < 3; c++) {
        const tol = 1e-6 * Math.hypot(ref[0]!, ref[1]!, ref[2]!);
        expect(
          Math.abs(out[c]! - ref[c]!),
          `P=(${px},${py},${pz}) c=${c} got=${out[c]} expected=${ref[c]} tol=${tol}`,
        ).toBeLessThanOrEqual(tol);
      }
    }
  });

  it('returns zero on its line and rejects a non-unit direction', () => {
    semiInfiniteSegmentVelocity(0, 0, 0, -1, 0, 0, -3, 0, 0, 1, out);
    expect([...out]).toEqual([0, 0, 0]);
    expect(() => semiInfiniteSegmentVelocity(0, 0, 0, 2, 0, 0, 0, 1, 0, 1, out)).toThrow(/\|e\|=2/);
  });
});
