import type { WheelInput } from '../../model/wheel';
import { type CaseFile, caseToModelInput } from '../caseFile';
import { airspeedAxis, yawAxis } from './axes';
import type { StudyPlan } from './studyPlan';
import { pointsAt, variantInput } from './variantInput';

/** The baseline wheel (its geometry, steering and model options) as a model input at the design's air. */
export function baselineInput(baseline: CaseFile, design: CaseFile): WheelInput {
  return caseToModelInput({ ...baseline, conditions: design.conditions });
}

/** A baseline at the same airspeeds and yaw angles as one of the design's studies. */
export function baselineStudy(
  name: string,
  baseline: WheelInput,
  design: CaseFile,
  speedsMps: readonly number[],
  yawsDeg: readonly number[],
): StudyPlan {
  return {
    name: `baseline: ${name}`,
    caseAxes: [],
    pointAxes: [airspeedAxis(speedsMps), yawAxis(yawsDeg)],
    inputs: [variantInput(baseline, {}, pointsAt(baseline, design, speedsMps, yawsDeg))],
  };
}
