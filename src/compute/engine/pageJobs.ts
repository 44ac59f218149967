/**
 * The page's heavier tasks besides sweeps (tasks.ts), run on the pool's task workers (runTask.ts loads
 * this module on a task's first use, so the sweep workers' first bundle stays small):
 *  - a ride: both wheels' yaw curves (the lattice solves; kept per worker and reused while only the
 *    rider, wind or course change) and then the ride's evaluation;
 *  - a comparison with data (compareJob; the data panel runs it with its tables in its own worker,
 *    src/ui/dataJobs.ts): conversion, slips, residuals, the model band and, on request, the
 *    calibration, the convergence study and the input-uncertainty band (src/compute/compare).
 *  - the reference set of the Help tab (src/compute/validation), as `coversweep validate` runs it;
 *  - a design study and the ride objectives over the design map (studyJobs.ts), as `coversweep optimise`.
 * Nothing here is new physics: each calls the same functions as the command line's `ride`, `compare`
 * and `validate`.
 */
import { type CompareRequest, type CompareResult, runComparison } from '../compare/index';
import {
  evaluateRide,
  type RideCurves,
  type RideDocument,
  type RideFile,
  rideCases,
  rideCurves,
  rideReferenceSpeed,
} from '../ride/index';
import { BoundedCache } from './boundedCache';

export { runValidation } from '../validation/runValidation';
export { mapObjectivesJob, studyJob } from './studyJobs';

export interface RideRequest {
  /** A validated ride (validateRide's value). */
  ride: RideFile;
}

export interface RideResponse {
  document: RideDocument;
  curves: RideCurves;
  /** True when the yaw curves came from this worker's cache (no lattice solve). */
  curvesReused: boolean;
}

const curveCache = new BoundedCache<string, RideCurves>(6);

/** What the yaw curves depend on: both wheels as case files (air, steering, model) and the curve speed. */
export function rideCurvesKey(ride: RideFile): string {
  const cases = rideCases(ride);
  const ref = rideReferenceSpeed(ride, cases.rhoKgPerM3);
  return JSON.stringify([cases.design, cases.baseline, ref.speedMps, ref.capped]);
}

/** Solve (or reuse) a ride's yaw curves and evaluate it. Throws RangeError from the model on bad input. */
export function solveRideJob(request: RideRequest): RideResponse {
  const key = rideCurvesKey(request.ride);
  let curves = curveCache.get(key);
  const curvesReused = curves !== undefined;
  if (!curves) {
    curves = rideCurves(request.ride);
    curveCache.set(key, curves);
  }
  return { document: evaluateRide(request.ride, curves), curves, curvesReused };
}

/** Run a comparison (never throws for bad data: the result carries the messages). */
export function compareJob(request: CompareRequest): CompareResult {
  try {
    return runComparison(request);
  } catch (error) {
    return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
  }
}
