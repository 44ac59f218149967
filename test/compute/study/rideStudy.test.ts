// The ride planner (src/compute/study/rideStudy.ts) held against the ride's own in-place solve
// (rideCurves, the path `coversweep ride` took before): the same yaw curves and the same ride document,
// bit for bit, in this thread and on pooled workers (structured cloning and packed rows in between);
// a wheel the model refuses comes back as the model's message.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InProcessRunner } from '../../../src/compute/engine/inProcessRunner';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import { evaluateRide, parseRideFile, type RideCurve, rideCurves } from '../../../src/compute/ride/index';
import { rideCurvesOf, rideStudy } from '../../../src/compute/study/rideStudy';
import { runStudies } from '../../../src/compute/study/runStudies';
import { inProcessSpawner } from '../engine/inProcessSpawn';

const ROOT = join(__dirname, '../../..');

function exampleRide() {
  const parsed = parseRideFile(readFileSync(join(ROOT, 'public/examples/ride.json'), 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.value;
}

/** Every float64 of two arrays equal as bits (Object.is: NaN equals NaN, -0 differs from 0). */
function sameBits(what: string, got: Float64Array, expected: Float64Array): void {
  expect(got.length, `${what}: length`).toBe(expected.length);
  for (let i = 0; i < got.length; i++) {
    if (!Object.is(got[i], expected[i]))
      throw new Error(`${what}[${i}]: got ${got[i]}, expected ${expected[i]} (tolerance: none, bit for bit)`);
  }
}

function sameCurve(what: string, got: RideCurve, expected: RideCurve): void {
  for (const key of [
    'yawRad',
    'axialN',
    'sideN',
    'rollMomentNm',
    'steeringMomentNm',
    'axleTorqueNm',
  ] as const)
    sameBits(`${what}.${key}`, got[key], expected[key]);
  expect(got.flags, `${what}.flags`).toEqual(expected.flags);
  expect(got.referenceAirspeedMps).toBe(expected.referenceAirspeedMps);
  expect(got.outerRadiusM).toBe(expected.outerRadiusM);
}

describe('ride planner', () => {
  it('names its axes: wheel (design, baseline) x airspeed (the reference speed) x yaw 0..90 deg', () => {
    const plan = rideStudy(exampleRide());
    expect(plan.caseAxes.map((a) => [a.name, a.values])).toEqual([['wheel', ['design', 'baseline']]]);
    expect(plan.pointAxes.map((a) => [a.name, a.unit, a.values.length])).toEqual([
      ['airspeed', 'm/s', 1],
      ['yaw', 'deg', 91],
    ]);
    expect(plan.pointAxes[1]!.values[90]).toBe(90);
    expect(plan.pointAxes[0]!.values[0]).toBe(plan.referenceSpeedMps);
  });

  it('gives the same curves and ride document as the in-place solve, in this thread and on a pool', async () => {
    for (const ride of [
      exampleRide(),
      { ...exampleRide(), ride: { ...exampleRide().ride, speed_mps: 11 } },
    ]) {
      const direct = rideCurves(ride);
      const pool = new WorkerPool(inProcessSpawner().spawn, 2);
      for (const runner of [new InProcessRunner(), pool]) {
        const out = await runStudies(runner, [rideStudy(ride)]);
        const curves = rideCurvesOf(out.results[0]!);
        sameCurve('design', curves.design, direct.design);
        sameCurve('baseline', curves.baseline, direct.baseline);
        expect(curves.referenceSpeedMps).toBe(direct.referenceSpeedMps);
        expect(curves.rhoKgPerM3).toBe(direct.rhoKgPerM3);
        expect(curves.referenceSpeedCapped).toBe(direct.referenceSpeedCapped);
        expect(evaluateRide(ride, curves)).toEqual(evaluateRide(ride, direct));
      }
      pool.close();
    }
  });

  it("says the model's message when a wheel could not be solved, and refuses a wheel not landed", () => {
    const plan = rideStudy(exampleRide());
    const failed = {
      plan,
      cube: null,
      errors: [null, 'outer_radius_m must be > 0, got -1'],
      surfaces: [null, null],
      landed: Uint8Array.of(1, 1),
    };
    expect(() => rideCurvesOf(failed)).toThrow(/^outer_radius_m must be > 0, got -1$/);
    expect(() => rideCurvesOf({ ...failed, errors: [null, null], landed: Uint8Array.of(0, 0) })).toThrow(
      "ride: the design wheel's yaw curve was not solved",
    );
  });
});
