import type { WheelInput } from '../../model/wheel';
import type { CaseFile } from '../caseFile';
import { airspeedAxis, coverFractionAxis, yawAxis } from './axes';
import { sweepPlacement } from './coverFamilyStudy';
import type { StudyPlan } from './studyPlan';
import { pointsAt, variantInput } from './variantInput';

/** The cover sweep: covering fraction x airspeed x yaw angle. */
export function coverSweepStudy(
  base: WheelInput,
  c: CaseFile,
  fractions: readonly number[],
  speedsMps: readonly number[],
  yawsDeg: readonly number[],
): StudyPlan {
  const points = pointsAt(base, c, speedsMps, yawsDeg);
  const coverPlacement = sweepPlacement(base);
  return {
    name: 'cover sweep',
    caseAxes: [coverFractionAxis(fractions)],
    pointAxes: [airspeedAxis(speedsMps), yawAxis(yawsDeg)],
    inputs: fractions.map((f) => variantInput(base, { coverFraction: f, coverPlacement }, points)),
  };
}
