import type { WheelInput } from '../../model/wheel';
import type { CaseFile } from '../caseFile';
import { airspeedAxis, coverFractionAxis, rimDepthAxis, yawAxis } from './axes';
import { sweepPlacement } from './coverFamilyStudy';
import type { StudyPlan } from './studyPlan';
import { pointsAt, variantInput } from './variantInput';

/** The design map: rim depth x covering fraction, at the given airspeeds and yaw angles. */
export function designMapStudy(
  base: WheelInput,
  c: CaseFile,
  fractions: readonly number[],
  depthsM: readonly number[],
  speedsMps: readonly number[],
  yawsDeg: readonly number[],
): StudyPlan {
  const points = pointsAt(base, c, speedsMps, yawsDeg);
  const coverPlacement = sweepPlacement(base);
  const inputs: WheelInput[] = [];
  for (const rimDepthM of depthsM) {
    for (const coverFraction of fractions) {
      inputs.push(variantInput(base, { coverFraction, coverPlacement, rimDepthM }, points));
    }
  }
  return {
    name: 'design map',
    caseAxes: [rimDepthAxis(depthsM), coverFractionAxis(fractions)],
    pointAxes: [airspeedAxis(speedsMps), yawAxis(yawsDeg)],
    inputs,
  };
}
