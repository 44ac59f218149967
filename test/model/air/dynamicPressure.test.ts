import { describe, expect, it } from 'vitest';
import { dynamicPressure } from '../../../src/model/air/dynamicPressure';

describe('dynamicPressure', () => {
  it('is rho V^2 / 2 (exact formula; tolerance 2 epsilon relative)', () => {
    // Reference: Bernoulli's equation, q = rho V^2 / 2 (Anderson, Fundamentals of Aerodynamics).
    // 1.225 kg/m^3 at 50 km/h = 13.888... m/s -> 118.1520 Pa.
    const v = 50 / 3.6;
    const got = dynamicPressure(1.225, v);
    const exp = 0.5 * 1.225 * (50 / 3.6) ** 2;
    const tol = 2 * Number.EPSILON * exp;
    expect(Math.abs(got - exp), `rho=1.225 V=${v} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
    expect(Math.abs(got - 118.152), `got=${got} expected=118.1520 tol=1e-4`).toBeLessThanOrEqual(1e-4);
  });

  it('rejects non-positive density', () => {
    expect(() => dynamicPressure(0, 10)).toThrow(/rhoKgPerM3/);
    expect(() => dynamicPressure(1.2, Number.POSITIVE_INFINITY)).toThrow(/speedMps/);
  });
});
