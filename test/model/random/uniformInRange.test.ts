import { describe, expect, it } from 'vitest';
import { uniformInRange } from '../../../src/model/random/uniformInRange';

describe('uniformInRange', () => {
  it('maps u linearly onto [lower, upper] (inverse transform; exact to 2 epsilon)', () => {
    // Reference: inverse-transform method for U(a, b), F^-1(u) = a + u (b - a) (Devroye 1986, ch. II.2).
    const cases: [number, number, number, number][] = [
      [0, 1.1, 1.3, 1.1],
      [0.5, 1.1, 1.3, 1.2],
      [0.25, -2, 2, -1],
      [1, 0, 1, 1],
    ];
    for (const [u, a, b, exp] of cases) {
      const got = uniformInRange(u, a, b);
      const tol = 2 * Number.EPSILON * Math.max(1, Math.abs(exp));
      expect(
        Math.abs(got - exp),
        `u=${u} a=${a} b=${b} got=${got} expected=${exp} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });
  it('rejects bad arguments naming them', () => {
    expect(() => uniformInRange(1.5, 0, 1)).toThrow(/u=1.5/);
    expect(() => uniformInRange(0.5, 2, 1)).toThrow(/lower=2/);
  });
});
