import { BoundedCache } from '../engine/boundedCache';
import type { RideRequest, RideResponse } from '../engine/tasks';
import { evaluateRide, type RideCurves, type RideFile, rideCases, rideReferenceSpeed } from '../ride/index';
import { rideCurvesOf, rideStudy } from './rideStudy';
import { solveStudiesHere } from './studyLanding';

/** Yaw curves kept per worker, by what they depend on (rideCurvesKey). */
const curveCache = new BoundedCache<string, RideCurves>(6);

/** What the yaw curves depend on: both wheels as case files (air, steering, model) and the curve speed. */
export function rideCurvesKey(ride: RideFile): string {
  const cases = rideCases(ride);
  const ref = rideReferenceSpeed(ride, cases.rhoKgPerM3);
  return JSON.stringify([cases.design, cases.baseline, ref.speedMps, ref.capped]);
}

/**
 * The page's ride task: the ride's study (rideStudy: both wheels' yaw curves) solved in this worker, or
 * its curves reused while only the rider, wind or course change, and the ride evaluated on them.
 * Throws the model's RangeError on bad input.
 */
export function solveRideJob(request: RideRequest): RideResponse {
  const key = rideCurvesKey(request.ride);
  let curves = curveCache.get(key);
  const curvesReused = curves !== undefined;
  if (!curves) {
    curves = rideCurvesOf(solveStudiesHere([rideStudy(request.ride)])[0]!);
    curveCache.set(key, curves);
  }
  return { document: evaluateRide(request.ride, curves), curves, curvesReused };
}
