import { describe, expect, it } from 'vitest';
import {
  attainableEdgeThrust,
  attainableEdgeThrustAt,
  roundEdgeSuctionLimit,
} from '../../../src/model/wheel/attainableEdgeThrust';

describe('roundEdgeSuctionLimit', () => {
  it("is a subcritical cylinder's minimum pressure -1.2 and the supercritical -2.4", () => {
    // Reference: Achenbach 1968, J. Fluid Mech. 34:625, pressure distributions on a circular cylinder
    // (from memory): Cp_min ~ -1.2 subcritical, ~ -2.4 supercritical. Tolerance: the reading, 0.2.
    expect(Math.abs(roundEdgeSuctionLimit(3e4) - 1.2)).toBeLessThanOrEqual(0.2);
    expect(Math.abs(roundEdgeSuctionLimit(1e6) - 2.4)).toBeLessThanOrEqual(0.2);
    const mid = roundEdgeSuctionLimit(3e5);
    expect(mid > 1.2 && mid < 2.4, `mid=${mid}`).toBe(true);
    expect(() => roundEdgeSuctionLimit(0)).toThrow(RangeError);
  });
});

describe('attainableEdgeThrust', () => {
  it('integrates -Cp q r (cos^2 b cos^2 L + sin^2 b) along the whole front edge of a disc', () => {
    // Whole edge z in [-R, R]: integral of (1 - z^2/R^2) dz = 4R/3 and of dz = 2R (calculus).
    const q = 100;
    const r = 0.0125;
    const R = 0.33;
    const lim = 1.2;
    for (const b of [0, 0.2, 0.4]) {
      const got = attainableEdgeThrust(q, b, r, R, -R, R, lim);
      const exp = lim * q * r * (Math.cos(b) ** 2 * ((4 * R) / 3) + Math.sin(b) ** 2 * 2 * R);
      expect(Math.abs(got - exp), `beta=${b} got=${got} expected=${exp}`).toBeLessThanOrEqual(1e-13 * exp);
    }
  });

  it('is additive over strips (invariant) and checks its arguments', () => {
    const whole = attainableEdgeThrust(50, 0.3, 0.01, 0.3, -0.3, 0.3, 1);
    const parts =
      attainableEdgeThrust(50, 0.3, 0.01, 0.3, -0.3, -0.1, 1) +
      attainableEdgeThrust(50, 0.3, 0.01, 0.3, -0.1, 0.2, 1) +
      attainableEdgeThrust(50, 0.3, 0.01, 0.3, 0.2, 0.3, 1);
    expect(Math.abs(whole - parts)).toBeLessThanOrEqual(1e-14 * whole);
    expect(() => attainableEdgeThrust(-1, 0, 0.01, 0.3, 0, 0.1, 1)).toThrow(RangeError);
    expect(() => attainableEdgeThrust(1, 0, 0.01, 0.3, 0.2, 0.1, 1)).toThrow(RangeError);
    expect(() => attainableEdgeThrust(1, 0, 0, 0.3, 0, 0.1, 1)).toThrow(RangeError);
  });

  it('attainableEdgeThrustAt, given cos and sin of the yaw, gives the bits of attainableEdgeThrust', () => {
    // The form a point's strips share (cos and sin taken once per point): exact equality, and the same checks.
    for (const yaw of [0, 0.1, -0.35, 0.52]) {
      for (const [z0, z1] of [
        [-0.3, -0.25],
        [-0.05, 0.02],
        [0.2, 0.3],
      ] as const) {
        const got = attainableEdgeThrustAt(88, Math.cos(yaw), Math.sin(yaw), 0.0125, 0.3, z0, z1, 1.2);
        const expected = attainableEdgeThrust(88, yaw, 0.0125, 0.3, z0, z1, 1.2);
        expect(
          Object.is(got, expected),
          `yaw=${yaw} [${z0}, ${z1}] got=${got} expected=${expected} tol=0`,
        ).toBe(true);
      }
    }
    expect(() => attainableEdgeThrustAt(1, 1, 0, 0.01, 0.3, 0.2, 0.1, 1)).toThrow(RangeError);
  });
});
