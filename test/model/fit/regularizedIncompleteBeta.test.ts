import { describe, expect, it } from 'vitest';
import { regularizedIncompleteBeta } from '../../../src/model/fit/regularizedIncompleteBeta';

describe('regularizedIncompleteBeta', () => {
  it('matches the closed forms I_x(a,1) = x^a, I_x(1,b) = 1-(1-x)^b, I_1/2(a,a) = 1/2 (relative 1e-13)', () => {
    // Reference: Abramowitz & Stegun 26.5.1 definition; closed forms by direct integration and symmetry 26.5.2.
    const cases: [number, number, number, number][] = [
      [0.3, 2.5, 1, 0.3 ** 2.5],
      [0.9, 7, 1, 0.9 ** 7],
      [0.2, 1, 3.5, 1 - 0.8 ** 3.5],
      [0.5, 4.2, 4.2, 0.5],
      [0.5, 0.5, 0.5, 0.5],
      [0.25, 0.5, 0.5, (2 / Math.PI) * Math.asin(0.5)], // arcsine law: I_x(1/2,1/2) = (2/pi) asin(sqrt x)
    ];
    for (const [x, a, b, exp] of cases) {
      const got = regularizedIncompleteBeta(x, a, b);
      const tol = 1e-13 * Math.max(1e-3, Math.abs(exp));
      expect(
        Math.abs(got - exp),
        `x=${x} a=${a} b=${b} got=${got} expected=${exp} tol=${tol}`,
      ).toBeLessThanOrEqual(Math.max(tol, 1e-15));
    }
  });
  it('rejects bad arguments naming them', () => {
    expect(() => regularizedIncompleteBeta(1.2, 1, 1)).toThrow(/x=1.2/);
    expect(() => regularizedIncompleteBeta(0.5, 0, 1)).toThrow(/a=0/);
    expect(() => regularizedIncompleteBeta(0.5, 1, -1)).toThrow(/b=-1/);
  });
});
