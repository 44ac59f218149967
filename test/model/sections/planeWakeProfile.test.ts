import { describe, expect, it } from 'vitest';
import { planeWakeProfile } from '../../../src/model/sections';

describe('planeWakeProfile', () => {
  it("is Schlichting's (1 - |eta|^1.5)^2: 1 on the centreline, 0 at and beyond the edge, integral 0.9", () => {
    // Schlichting, Boundary-Layer Theory, plane wake (from memory); the integral over -1..1 is
    // 2 (1 - 2/2.5 + 1/4) = 0.9 in closed form.
    expect(planeWakeProfile(0)).toBe(1);
    expect(planeWakeProfile(1)).toBe(0);
    expect(planeWakeProfile(-3)).toBe(0);
    expect(planeWakeProfile(-0.3)).toBe(planeWakeProfile(0.3));
    const n = 20000;
    let sum = 0;
    for (let i = 0; i < n; i++) sum += planeWakeProfile(-1 + ((i + 0.5) * 2) / n);
    const got = (sum * 2) / n;
    const expected = 0.9;
    const tol = 1e-6;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('rejects a lateral position that is not finite', () => {
    expect(() => planeWakeProfile(Number.NaN)).toThrow(/eta/);
  });
});
