/**
 * Ride impact of a wheel design against a baseline: parse a ride file, solve the two yaw curves, evaluate.
 * A page can keep `rideCurves(ride)` (the lattice solves) and rerun `evaluateRide(ride, curves)` cheaply.
 */
import { evaluateRide, type RideDocument } from './evaluateRide';
import { rideCurves } from './rideCurves';
import type { RideFile } from './rideFile';

export { RIDE_CAUTIONS } from './cautions';
export {
  evaluateRide,
  type Pair,
  type PowerBreakdown,
  RIDE_NOTES,
  RIDE_QUADRATURE,
  RIDE_RESULT_FORMAT,
  RIDE_RESULT_VERSION,
  type RideDocument,
  type RideSegmentResult,
  type SteeringSummary,
} from './evaluateRide';
export {
  CURVE_YAW_STEP_DEG,
  MAX_RIDE_SPEED_MPS,
  type RideCurve,
  type RideCurves,
  rideCurveInput,
  rideCurveOf,
  rideCurves,
  rideReferenceSpeed,
  rideSetup,
  solveRideCurve,
} from './rideCurves';
export {
  parseRideFile,
  RIDE_DEFAULTS,
  RIDE_FORMAT,
  RIDE_LIMITS,
  RIDE_VERSION,
  type RideCases,
  type RideFile,
  type RideHandling,
  type RideRide,
  type RideRider,
  type RideSegment,
  type RideWind,
  rideCases,
  validateRide,
} from './rideFile';

/** Solve and evaluate a validated ride. */
export function solveRide(ride: RideFile): RideDocument {
  return evaluateRide(ride, rideCurves(ride));
}
