import { describe, expect, it } from 'vitest';
import type { WheelYawCurve } from '../../../src/model/ride/types';
import { windAveragedWheelLoads } from '../../../src/model/ride/windAveragedWheelLoads';
import { windDirectionNodes } from '../../../src/model/wind/windDirectionNodes';
import { windSpeedNodes } from '../../../src/model/wind/windSpeedNodes';
import { windStates } from '../../../src/model/wind/windStates';

/** A wheel whose axial force coefficient does not depend on yaw: F = cdA q at every yaw. */
function constantCurve(cdaM2: number, rho: number, vRef: number): WheelYawCurve {
  const n = 91;
  const yawRad = Float64Array.from({ length: n }, (_, i) => (i * Math.PI) / 2 / (n - 1));
  const q = 0.5 * rho * vRef * vRef;
  return {
    yawRad,
    axialN: new Float64Array(n).fill(cdaM2 * q),
    sideN: Float64Array.from(yawRad, (b) => 40 * Math.sin(b)),
    rollMomentNm: new Float64Array(n),
    steeringMomentNm: new Float64Array(n),
    axleTorqueNm: new Float64Array(n),
    referenceAirspeedMps: vRef,
    outerRadiusM: 0.334,
  };
}

describe('windAveragedWheelLoads', () => {
  it('SAE J1252 identity: a yaw-independent coefficient averages to (1 + (w/v)^2) times itself over uniform directions (SAE J1252, 1981)', () => {
    const rho = 1.2;
    for (const [v, w] of [
      [10, 3],
      [12, 5],
      [8, 2],
    ] as const) {
      const cda = 0.01;
      const curve = constantCurve(cda, rho, v);
      const states = windStates(
        windSpeedNodes({ kind: 'fixed', speedMps: w }, 1),
        windDirectionNodes({ kind: 'uniform' }, 72),
      );
      const got = windAveragedWheelLoads(curve, v, states, 1, rho);
      const exp = cda * (1 + (w / v) ** 2);
      const tol = 1e-12; // relative; the trapezoidal rule is exact for the degree-1 trigonometric polynomial
      expect(
        Math.abs(got.cdaM2 - exp) / exp,
        `v=${v} w=${w} got=${got.cdaM2} expected=${exp} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      expect(
        Math.abs(got.sideN),
        `v=${v} w=${w} mean signed side=${got.sideN}, expected 0 by symmetry`,
      ).toBeLessThanOrEqual(1e-9);
      expect(got.mirroredFraction).toBe(0);
      // The largest |yaw| reached is below arcsin(w/v) (wind-triangle geometry).
      const maxYaw = Math.max(...got.yawAbsRad);
      expect(maxYaw, `max yaw=${maxYaw} limit=${Math.asin(w / v)}`).toBeLessThanOrEqual(
        Math.asin(w / v) + 1e-12,
      );
    }
  });

  it('the shielding share scales the axial force and a head wind adds its dynamic pressure (definition)', () => {
    const curve = constantCurve(0.01, 1.2, 10);
    const states = windStates(
      windSpeedNodes({ kind: 'fixed', speedMps: 2 }, 1),
      windDirectionNodes({ kind: 'fixed', fromRad: 0 }, 1),
    );
    const got = windAveragedWheelLoads(curve, 10, states, 0.75, 1.2);
    const exp = 0.75 * 0.01 * 0.5 * 1.2 * 144;
    expect(Math.abs(got.axialN - exp), `got=${got.axialN} expected=${exp}`).toBeLessThanOrEqual(1e-12);
  });

  it('a tail wind faster than the rider puts the air behind the wheel: flagged as mirrored', () => {
    const curve = constantCurve(0.01, 1.2, 10);
    const states = windStates(
      windSpeedNodes({ kind: 'fixed', speedMps: 12 }, 1),
      windDirectionNodes({ kind: 'fixed', fromRad: Math.PI }, 1),
    );
    const got = windAveragedWheelLoads(curve, 10, states, 1, 1.2);
    expect(got.mirroredFraction).toBe(1);
    expect(got.axialN, 'air from behind pushes the wheel forward').toBeLessThan(0);
  });

  it('rejects a zero ground speed, naming it', () => {
    const curve = constantCurve(0.01, 1.2, 10);
    const states = windStates(
      windSpeedNodes({ kind: 'fixed', speedMps: 1 }, 1),
      windDirectionNodes({ kind: 'uniform' }, 4),
    );
    expect(() => windAveragedWheelLoads(curve, 0, states, 1, 1.2)).toThrow(/groundSpeedMps=0/);
  });
});
