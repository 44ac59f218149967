import { describe, expect, it } from 'vitest';
import { logWindProfileRatio } from '../../../src/model/wind/logWindProfileRatio';

describe('logWindProfileRatio', () => {
  it('reproduces FAO-56 eq. 47, u2 = uz 4.87 / ln(67.8 z - 5.42), for z = 10 m (Allen et al. 1998, FAO Irrigation and Drainage Paper 56; from memory)', () => {
    // FAO-56's form is the log profile with z0 = 1/67.8 m above a displacement height 5.42/67.8 = 0.08 m;
    // 4.87 = ln(67.8 x 2 - 5.42) rounded to 3 digits.
    const d = 5.42 / 67.8;
    const got = logWindProfileRatio(2 - d, 10 - d, 1 / 67.8);
    const exp = 4.87 / Math.log(67.8 * 10 - 5.42);
    const tol = 1e-3; // relative: 4.87 is given to 3 significant digits
    expect(
      Math.abs(got - exp) / exp,
      `z=2 zref=10 got=${got} expected=${exp} tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
  });

  it('is 1 at the reference height and chains between heights (exact)', () => {
    const z0 = 0.03;
    expect(logWindProfileRatio(10, 10, z0)).toBe(1);
    const a = logWindProfileRatio(0.334, 2, z0) * logWindProfileRatio(2, 10, z0);
    const b = logWindProfileRatio(0.334, 10, z0);
    const tol = 8 * Number.EPSILON;
    expect(Math.abs(a - b), `chained=${a} direct=${b} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('gives 0.415 from 10 m to a 0.334 m hub over open terrain, z0 = 0.03 m (hand-worked: ln(11.13)/ln(333.3))', () => {
    const got = logWindProfileRatio(0.334, 10, 0.03);
    const exp = Math.log(0.334 / 0.03) / Math.log(10 / 0.03);
    expect(Math.abs(got - exp), `got=${got} expected=${exp}`).toBeLessThanOrEqual(4 * Number.EPSILON);
    expect(Math.abs(got - 0.4148), `got=${got} expected~0.4148 tol=1e-4`).toBeLessThanOrEqual(1e-4);
  });

  it('rejects a height at or below the roughness length', () => {
    expect(() => logWindProfileRatio(0.01, 10, 0.03)).toThrow(/heightM=0.01/);
    expect(() => logWindProfileRatio(1, 10, 0)).toThrow(/roughnessLengthM=0/);
  });
});
