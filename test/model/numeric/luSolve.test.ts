import { describe, expect, it } from 'vitest';
import { luFactor } from '../../../src/model/numeric/luFactor';
import { luSolve } from '../../../src/model/numeric/luSolve';

const EPS = Number.EPSILON;

describe('luSolve', () => {
  it('solves a 4x4 symmetric Toeplitz system with a chosen solution (common practice, no source)', () => {
    // A = [[4,3,2,1],[3,4,3,2],[2,3,4,3],[1,2,3,4]] (symmetric Toeplitz, positive definite), x = [1,-1,2,-2].
    const a = Float64Array.from([4, 3, 2, 1, 3, 4, 3, 2, 2, 3, 4, 3, 1, 2, 3, 4]);
    const x = [1, -1, 2, -2];
    const b = new Float64Array(4);
    for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) b[i]! += a[i * 4 + j]! * x[j]!;
    const pivots = new Int32Array(4);
    luFactor(a, 4, pivots);
    const got = luSolve(a, 4, pivots, b);
    expect(got, 'returns the rhs array, overwritten').toBe(b);
    const tol = 64 * EPS;
    for (let i = 0; i < 4; i++) {
      const err = Math.abs(got[i]! - x[i]!);
      expect(err, `x[${i}] got=${got[i]} expected=${x[i]} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });

  it('reuses one factorisation for several right-hand sides (linearity, exact for a scaled rhs)', () => {
    const a = Float64Array.from([3, 1, -1, 2, -4, 1, 1, 1, 5]);
    const pivots = new Int32Array(3);
    luFactor(a, 3, pivots);
    const x1 = luSolve(a, 3, pivots, Float64Array.from([1, 2, 3]));
    const x2 = luSolve(a, 3, pivots, Float64Array.from([2, 4, 6]));
    for (let i = 0; i < 3; i++) {
      const err = Math.abs(x2[i]! - 2 * x1[i]!);
      const tol = 4 * EPS * Math.abs(x2[i]!);
      expect(err, `x2[${i}]=${x2[i]} 2*x1=${2 * x1[i]!} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });

  it('checks its arguments', () => {
    expect(() => luSolve(new Float64Array(4), 2, new Int32Array(2), new Float64Array(1))).toThrow(
      /rhs.length=1/,
    );
    expect(() => luSolve(new Float64Array(3), 2, new Int32Array(2), new Float64Array(2))).toThrow(
      /lu.length=3/,
    );
    expect(() => luSolve(new Float64Array(4), 2, new Int32Array(1), new Float64Array(2))).toThrow(
      /pivots.length=1/,
    );
    expect(() => luSolve(new Float64Array(4), 1.5, new Int32Array(2), new Float64Array(2))).toThrow(/n=1.5/);
  });
});
