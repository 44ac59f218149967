import { describe, expect, it } from 'vitest';
import { groundTrailM, steeringMoment } from '../../../src/model/wheel/steeringAxis';

const deg = Math.PI / 180;

describe('groundTrailM', () => {
  it('reproduces a road bike trail: R 0.334 m, 73 deg, 45 mm offset -> 55.0 mm', () => {
    // Trail = (R cos h - d) / sin h (Cossalter, Motorcycle Dynamics, ch. 1; from memory). By hand:
    // (0.334 * 0.292372 - 0.045) / 0.956305 = (0.0976522 - 0.045) / 0.956305 = 0.0550581 m.
    const got = groundTrailM(0.334, { headAngleRad: 73 * deg, forkOffsetM: 0.045 });
    const expected = 0.0550581;
    const tol = 1e-6;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('is zero offset -> R cot h, and vertical steering axis -> -offset', () => {
    expect(groundTrailM(0.3, { headAngleRad: 70 * deg, forkOffsetM: 0 })).toBeCloseTo(
      0.3 / Math.tan(70 * deg),
      14,
    );
    expect(groundTrailM(0.3, { headAngleRad: 90 * deg, forkOffsetM: 0.04 })).toBeCloseTo(-0.04, 14);
  });
});

describe('steeringMoment', () => {
  it('a side force at the contact point turns the wheel by F x normal trail (trail sin h)', () => {
    // Statics: the axis is at perpendicular distance trail * sin h from the contact point (Cossalter,
    // "normal trail"; from memory). A leftward force behind the axis turns the wheel to the right.
    const R = 0.334;
    const steering = { headAngleRad: 73 * deg, forkOffsetM: 0.045 };
    const fy = 10;
    // Force at (0, 0, -R): moments about the hub M = r x F = (-z F_y, 0, x F_y) = (R F_y, 0, 0).
    const got = steeringMoment(steering, R * fy, 0, fy);
    const expected = -fy * groundTrailM(R, steering) * Math.sin(steering.headAngleRad);
    const tol = 1e-12;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('a side force on the steering axis itself makes no steering moment', () => {
    const steering = { headAngleRad: 72 * deg, forkOffsetM: 0.04 };
    const h = steering.headAngleRad;
    const d = steering.forkOffsetM;
    // A point on the axis: P0 + t a, P0 = -d (sin h, 0, cos h), a = (-cos h, 0, sin h).
    const t = 0.2;
    const x = -d * Math.sin(h) - t * Math.cos(h);
    const z = -d * Math.cos(h) + t * Math.sin(h);
    const fy = 7;
    const got = steeringMoment(steering, -z * fy, x * fy, fy);
    expect(Math.abs(got), `got=${got}`).toBeLessThanOrEqual(1e-14);
  });
});
