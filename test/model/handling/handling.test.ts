import { describe, expect, it } from 'vitest';
import { gustImpulse } from '../../../src/model/handling/gustImpulse';
import { groundTrailM } from '../../../src/model/handling/index';
import { leanAngleRad } from '../../../src/model/handling/leanAngleRad';
import { steeringFeatures } from '../../../src/model/handling/steeringFeatures';

const DEG = Math.PI / 180;

describe('leanAngleRad', () => {
  it('reduces to steady cornering, tan(phi) = v^2 / (g r), for the centrifugal force at the centre of mass (Cossalter, Motorcycle Dynamics, sec. 4.1; from memory)', () => {
    const m = 80;
    const h = 1.0;
    const g = 9.80665;
    for (const [v, r] of [
      [10, 20],
      [8, 50],
    ] as const) {
      const moment = ((m * v * v) / r) * h;
      const got = leanAngleRad(-moment, m, h, g);
      const exp = Math.atan((v * v) / (g * r));
      expect(
        Math.abs(got - exp),
        `v=${v} r=${r} got=${got} expected=${exp} tol=${4 * Number.EPSILON}`,
      ).toBeLessThanOrEqual(4 * Number.EPSILON);
    }
    // v = 10 m/s on a 20 m radius: 27.0 deg.
    expect(Math.abs(leanAngleRad(400, 80, 1, g) / DEG - 27.0), 'lean 27.0 deg').toBeLessThanOrEqual(0.05);
  });
  it('rejects a zero mass, naming it', () => {
    expect(() => leanAngleRad(1, 0, 1, 9.8)).toThrow(/massKg=0/);
  });
});

describe('gustImpulse', () => {
  it('J = dF t and dv = J / m (impulse-momentum theorem, exact)', () => {
    const got = gustImpulse(20, 3, 80);
    expect(got.impulseNs).toBe(60);
    expect(got.lateralSpeedChangeMps).toBe(0.75);
  });
});

describe('groundTrailM (from src/model/wheel)', () => {
  it('trail = (R cos h - d) / sin h from head angle, wheel radius and offset (bicycle geometry, e.g. Cossalter ch. 1; from memory; hand-worked)', () => {
    // R = 0.334 m, h = 73 deg, d = 0.045 m: (0.334 x 0.2923717 - 0.045) / 0.9563048 = 0.0526521 / 0.9563048 = 0.0550579 m.
    const got = groundTrailM(0.334, { headAngleRad: 73 * DEG, forkOffsetM: 0.045 });
    expect(Math.abs(got - 0.0550579), `got=${got} expected=0.0550579 tol=1e-7`).toBeLessThanOrEqual(1e-7);
    // A vertical steering axis through the hub has no trail (exact).
    expect(Math.abs(groundTrailM(0.334, { headAngleRad: 90 * DEG, forkOffsetM: 0 }))).toBeLessThanOrEqual(
      1e-16,
    );
  });
});

describe('steeringFeatures', () => {
  it('finds the slope of a linear start, the sign change of sin(3 beta) at 60 deg and a step (exact for linear data; screening rule)', () => {
    const n = 91;
    const yaw = Float64Array.from({ length: n }, (_, i) => i * DEG);
    const m = Float64Array.from(yaw, (b) => 0.3 * Math.sin(3 * b));
    const smooth = steeringFeatures(yaw, m);
    // Least squares through the origin over 1..5 deg: sum(b M) / sum(b^2), exact to rounding.
    let sxy = 0;
    let sxx = 0;
    for (let i = 1; i <= 5; i++) {
      sxy += yaw[i]! * m[i]!;
      sxx += yaw[i]! * yaw[i]!;
    }
    const expSlope = sxy / sxx;
    expect(
      Math.abs(smooth.slopeNmPerRad - expSlope),
      `slope=${smooth.slopeNmPerRad} expected=${expSlope} tol=1e-14`,
    ).toBeLessThanOrEqual(1e-14);
    // ...which is within 1 % of the curve's true slope at 0, 0.9 N m/rad.
    expect(
      Math.abs(smooth.slopeNmPerRad - 0.9) / 0.9,
      `slope=${smooth.slopeNmPerRad} vs 0.9`,
    ).toBeLessThanOrEqual(0.01);
    expect(smooth.signChangesRad.length).toBe(1);
    expect(
      Math.abs(smooth.signChangesRad[0]! / DEG - 60),
      `sign change at ${smooth.signChangesRad[0]! / DEG} deg`,
    ).toBeLessThanOrEqual(1e-9);
    expect(smooth.jumpsRad).toEqual([]);
    const lin = steeringFeatures(
      yaw,
      Float64Array.from(yaw, (b) => 2 * b),
    );
    expect(Math.abs(lin.slopeNmPerRad - 2), `linear slope=${lin.slopeNmPerRad}`).toBeLessThanOrEqual(1e-14);
    const stepped = Float64Array.from(m, (v, i) => (i >= 30 ? v + 0.2 : v));
    const jumps = steeringFeatures(yaw, stepped).jumpsRad.map((r) => r / DEG);
    expect(jumps.length, `jumps at ${jumps}`).toBe(1);
    expect(Math.abs(jumps[0]! - 29.5), `jump at ${jumps[0]} deg`).toBeLessThanOrEqual(1e-9);
  });
});
