import type { WheelInput } from '../../model/wheel';
import {
  CURVE_YAW_STEP_DEG,
  evaluateRide,
  type RideCurves,
  type RideDocument,
  type RideFile,
  rideCases,
  rideCurveInput,
  rideCurveOf,
  rideReferenceSpeed,
} from '../ride/index';
import { AXIS, airspeedAxis, yawAxis } from './axes';
import type { StudyResult } from './runStudies';
import { solveStudiesHere } from './studyLanding';
import type { StudyPlan } from './studyPlan';

/** The ride study's wheels, in the order of its case axis. */
export const RIDE_WHEELS = ['design', 'baseline'] as const;

/** A ride's study, with what its yaw curves need besides the model's results. */
export interface RideStudyPlan extends StudyPlan {
  /** Ground speed = airspeed of both curves (m/s): the ride's speed, or its still-air speed at power. */
  referenceSpeedMps: number;
  referenceSpeedCapped: boolean;
  rhoKgPerM3: number;
}

/**
 * A ride's jobs: the design and the baseline wheel (case axis `wheel`) over the ride's yaw curve, 0..90
 * degrees every CURVE_YAW_STEP_DEG at the ride's reference speed (point axes airspeed x yaw). Every
 * figure of the ride (its legs, wind states, course segments and gusts) reads these two curves, scaled
 * by dynamic pressure (evaluateRide), so these are all the model points a ride needs.
 */
export function rideStudy(ride: RideFile): RideStudyPlan {
  const cases = rideCases(ride);
  const ref = rideReferenceSpeed(ride, cases.rhoKgPerM3);
  const inputs = [rideCurveInput(cases.design, ref.speedMps), rideCurveInput(cases.baseline, ref.speedMps)];
  const yawsDeg = inputs[0]!.points.map((_, i) => i * CURVE_YAW_STEP_DEG);
  return {
    name: 'ride',
    caseAxes: [{ name: AXIS.wheel, unit: '', values: RIDE_WHEELS }],
    pointAxes: [airspeedAxis([ref.speedMps]), yawAxis(yawsDeg)],
    inputs,
    referenceSpeedMps: ref.speedMps,
    referenceSpeedCapped: ref.capped,
    rhoKgPerM3: cases.rhoKgPerM3,
  };
}

/**
 * The ride's yaw curves from its study's result (runStudies), the same bits as solving them in place
 * (rideCurves). A wheel the model refused throws its message as a RangeError.
 */
export function rideCurvesOf(result: StudyResult): RideCurves {
  const plan = result.plan as RideStudyPlan;
  for (const error of result.errors) if (error) throw new RangeError(error);
  const curve = (k: number) => {
    if (!result.cube || result.landed[k] !== 1)
      throw new RangeError(`ride: the ${RIDE_WHEELS[k]} wheel's yaw curve was not solved`);
    return rideCurveOf(plan.inputs[k] as WheelInput, result.cube.pick({ [AXIS.wheel]: k }).points());
  };
  return {
    design: curve(0),
    baseline: curve(1),
    referenceSpeedMps: plan.referenceSpeedMps,
    rhoKgPerM3: plan.rhoKgPerM3,
    referenceSpeedCapped: plan.referenceSpeedCapped,
  };
}

/** A ride solved here and now through its study (`coversweep ride`): the same document as solveRide. */
export function solveRideStudy(ride: RideFile): RideDocument {
  return evaluateRide(ride, rideCurvesOf(solveStudiesHere([rideStudy(ride)])[0]!));
}
