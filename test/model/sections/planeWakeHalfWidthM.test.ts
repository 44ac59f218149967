import { describe, expect, it } from 'vitest';
import { planeWakeHalfWidthM, planeWakeProfile } from '../../../src/model/sections';

describe('planeWakeHalfWidthM', () => {
  it("gives Schlichting's half-value width b_1/2 = 0.25 (x Cd d)^(1/2) at the profile's half-deficit point", () => {
    // Schlichting, Boundary-Layer Theory, plane wake (from memory): b = 0.57 (x Cd d)^(1/2) and the
    // width where the deficit is half its centreline value b_1/2 = 0.25 (x Cd d)^(1/2). The profile
    // (1 - eta^1.5)^2 = 1/2 at eta = (1 - 2^-0.5)^(2/3) = 0.4410, so b_1/2 = 0.2514 (x Cd d)^(1/2).
    const x = 0.3;
    const cdL = 0.0024;
    const b = planeWakeHalfWidthM(x, cdL);
    const etaHalf = (1 - Math.SQRT1_2) ** (2 / 3);
    expect(Math.abs(planeWakeProfile(etaHalf) - 0.5)).toBeLessThan(1e-12);
    const got = (etaHalf * b) / Math.sqrt(x * cdL);
    const expected = 0.25;
    const tol = 0.01;
    expect(
      Math.abs(got / expected - 1),
      `got=${got} expected=${expected} tol(rel)=${tol}`,
    ).toBeLessThanOrEqual(tol);
  });

  it('rejects a distance or drag length that is not finite and > 0', () => {
    expect(() => planeWakeHalfWidthM(-1, 1)).toThrow(/distanceM/);
    expect(() => planeWakeHalfWidthM(1, Number.POSITIVE_INFINITY)).toThrow(/dragLengthM/);
  });
});
