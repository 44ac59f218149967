import { describe, expect, it } from 'vitest';
import { meanAbsSinusoid } from '../../../src/model/wheel/meanAbsSinusoid';

// Independent check by the composite midpoint rule (periodic integrand, kinks where it changes sign).
function quadrature(a: number, b: number, steps = 200_000): number {
  let sum = 0;
  for (let k = 0; k < steps; k++) sum += Math.abs(a + b * Math.sin(((k + 0.5) * 2 * Math.PI) / steps));
  return sum / steps;
}

describe('meanAbsSinusoid', () => {
  it('equals 2/pi for a = 0, b = 1 (mean of |sin|, elementary calculus)', () => {
    const got = meanAbsSinusoid(0, 1);
    const expected = 2 / Math.PI;
    const tol = 2 * Number.EPSILON;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('equals |a| when |a| >= |b| (no sign change)', () => {
    expect(meanAbsSinusoid(1.5, 1)).toBe(1.5);
    expect(meanAbsSinusoid(-2, 1)).toBe(2);
  });

  it.each([0.1, 0.3, 0.5, 0.8, 0.99])('matches quadrature for a = %f, b = 1', (a) => {
    const got = meanAbsSinusoid(a, 1);
    const expected = quadrature(a, 1);
    const tol = 1e-8;
    expect(Math.abs(got - expected), `a=${a} got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
  });

  it('rejects non-finite input with a RangeError', () => {
    expect(() => meanAbsSinusoid(Number.NaN, 1)).toThrow(RangeError);
  });
});
