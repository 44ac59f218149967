import { describe, expect, it } from 'vitest';
import { apparentWind } from '../../../src/model/wind/apparentWind';

const EPS = Number.EPSILON;
const DEG = Math.PI / 180;

describe('apparentWind', () => {
  it('head wind adds to the ground speed at zero yaw (wind triangle, exact)', () => {
    const got = apparentWind(10, 3, 0);
    const tol = 4 * EPS * 13;
    expect(
      Math.abs(got.airspeedMps - 13),
      `v=10 w=3 psi=0 got=${got.airspeedMps} expected=13 tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
    expect(got.yawRad, `got yaw=${got.yawRad} expected=0`).toBe(0);
  });

  it('a wind from the right at 90 deg gives yaw atan(w/v) > 0 and airspeed sqrt(v^2 + w^2) (wind triangle, exact)', () => {
    const v = 12;
    const w = 5;
    const got = apparentWind(v, w, 90 * DEG);
    const expV = 13;
    const expYaw = Math.atan2(5, 12);
    const tol = 8 * EPS * 13;
    expect(
      Math.abs(got.airspeedMps - expV),
      `got=${got.airspeedMps} expected=${expV} tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
    expect(
      Math.abs(got.yawRad - expYaw),
      `got=${got.yawRad} expected=${expYaw} tol=${8 * EPS}`,
    ).toBeLessThanOrEqual(8 * EPS);
    const left = apparentWind(v, w, -90 * DEG);
    expect(left.yawRad, `wind from the left: got yaw=${left.yawRad}, expected < 0`).toBeLessThan(0);
  });

  it('the largest yaw for a wind slower than the rider is arcsin(w/v), met at cos(psi) = -w/v (SAE J1252 wind-averaging geometry; wind triangle)', () => {
    for (const [v, w] of [
      [10, 3],
      [8, 6],
      [15, 1],
    ] as const) {
      const exp = Math.asin(w / v);
      const at = apparentWind(v, w, Math.acos(-w / v));
      const tolExact = 16 * EPS;
      expect(
        Math.abs(at.yawRad - exp),
        `v=${v} w=${w} got=${at.yawRad} expected=${exp} tol=${tolExact}`,
      ).toBeLessThanOrEqual(tolExact);
      // No direction exceeds it (scan of 36000 directions).
      let max = 0;
      const out = { airspeedMps: 0, yawRad: 0 };
      for (let k = 0; k < 36000; k++)
        max = Math.max(max, apparentWind(v, w, (k * 2 * Math.PI) / 36000, out).yawRad);
      const tolScan = 1e-6;
      expect(
        max - exp,
        `v=${v} w=${w} scanned max=${max} expected=${exp} tol=${tolScan}`,
      ).toBeLessThanOrEqual(tolScan);
      expect(
        exp - max,
        `v=${v} w=${w} scanned max=${max} expected=${exp} tol=${tolScan}`,
      ).toBeLessThanOrEqual(tolScan);
    }
  });

  it('rejects a negative speed, naming it', () => {
    expect(() => apparentWind(-1, 2, 0)).toThrow(/groundSpeedMps=-1/);
    expect(() => apparentWind(1, Number.NaN, 0)).toThrow(/windSpeedMps=NaN/);
  });
});
