import { describe, expect, it } from 'vitest';
import {
  PLANE_WAKE_DEFICIT_CONSTANT,
  PLANE_WAKE_WIDTH_CONSTANT,
  planeWakeDeficit,
} from '../../../src/model/sections';

describe('planeWakeDeficit', () => {
  it("is Schlichting's plane far-wake law u1/U = 0.98 (x / (Cd d))^(-1/2)", () => {
    // Schlichting, Boundary-Layer Theory, plane turbulent wake behind a cylinder (from memory):
    // at x = 100 Cd d the centreline deficit is 0.098 U.
    const got = planeWakeDeficit(0.22, 0.0022);
    const expected = 0.098;
    const tol = 4 * Number.EPSILON;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('carries the momentum deficit of the drag: integral of u1 dy = Cd d U / 2 within 1 %', () => {
    // Momentum balance of a wake (Schlichting; any fluid-mechanics text): D = rho U int u1 dy, so with
    // D = 0.5 rho U^2 Cd d the deficit integrates to Cd d U / 2. Schlichting's two constants and the
    // profile (1 - eta^1.5)^2 (integral 0.9 over -1..1) give 0.98 x 0.57 x 0.9 = 0.5028.
    const got = PLANE_WAKE_DEFICIT_CONSTANT * PLANE_WAKE_WIDTH_CONSTANT * 0.9;
    const expected = 0.5;
    const tol = 0.01;
    expect(
      Math.abs(got / expected - 1),
      `got=${got} expected=${expected} tol(rel)=${tol}`,
    ).toBeLessThanOrEqual(tol);
  });

  it('rejects a distance or drag length that is not finite and > 0', () => {
    expect(() => planeWakeDeficit(0, 1)).toThrow(/distanceM/);
    expect(() => planeWakeDeficit(1, -1)).toThrow(/dragLengthM/);
    expect(() => planeWakeDeficit(Number.NaN, 1)).toThrow(RangeError);
  });
});
