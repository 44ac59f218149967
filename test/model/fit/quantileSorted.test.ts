import { describe, expect, it } from 'vitest';
import { quantileSorted } from '../../../src/model/fit/quantileSorted';

describe('quantileSorted', () => {
  it('follows Hyndman & Fan definition 7 (exact, 2 epsilon)', () => {
    // References: NumPy documentation of numpy.percentile (default 'linear'): percentile of
    // [[10, 7, 4], [3, 2, 1]] at 50 is 3.5; R documentation of quantile (type 7): quantile(1:4, 0.25) = 1.75.
    const cases: [number[], number, number][] = [
      [[1, 2, 3, 4, 7, 10], 0.5, 3.5],
      [[1, 2, 3, 4], 0.25, 1.75],
      [[1, 2, 3, 4], 0, 1],
      [[1, 2, 3, 4], 1, 4],
      [[5], 0.3, 5],
    ];
    for (const [data, p, exp] of cases) {
      const got = quantileSorted(Float64Array.from(data), p);
      const tol = 2 * Number.EPSILON * Math.abs(exp);
      expect(
        Math.abs(got - exp),
        `data=${data} p=${p} got=${got} expected=${exp} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });
  it('rejects empty data and p outside [0, 1]', () => {
    expect(() => quantileSorted([], 0.5)).toThrow(/empty/);
    expect(() => quantileSorted([1], 1.5)).toThrow(/p=1.5/);
  });
});
