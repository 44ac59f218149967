import { describe, expect, it } from 'vitest';
import { logGamma } from '../../../src/model/fit/logGamma';

describe('logGamma', () => {
  it('matches exact gamma values (relative 1e-13)', () => {
    // Reference: Gamma(n) = (n-1)!, Gamma(1/2) = sqrt(pi), Gamma(3/2) = sqrt(pi)/2 (Abramowitz & Stegun 6.1.6, 6.1.8).
    const cases: [number, number][] = [
      [1, 0],
      [2, 0],
      [0.5, 0.5 * Math.log(Math.PI)],
      [1.5, Math.log(Math.sqrt(Math.PI) / 2)],
      [5, Math.log(24)],
      [10, Math.log(362880)],
      [21, Math.log(2432902008176640000)],
      [0.1, Math.log(9.513507698668732)], // Gamma(0.1), A&S table 6.1 via Gamma(1.1)/0.1 = 0.95135076987/0.1
    ];
    for (const [x, exp] of cases) {
      const got = logGamma(x);
      const tol = 1e-13 * Math.max(1, Math.abs(exp));
      expect(Math.abs(got - exp), `x=${x} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(
        x === 0.1 ? 1e-10 : tol,
      );
    }
  });
  it('rejects x <= 0', () => {
    expect(() => logGamma(0)).toThrow(/x=0/);
    expect(() => logGamma(Number.NaN)).toThrow(/x=NaN/);
  });
});
