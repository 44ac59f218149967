import type { WheelInput } from '../../model/wheel';
import type { CaseFile } from '../caseFile';
import { airspeedAxis, coverFractionAxis, yawAxis } from './axes';
import type { StudyPlan } from './studyPlan';
import { pointsAt, variantInput } from './variantInput';

/** The placement the covering-fraction sweeps use: the design's own, or the rim for explicit radii. */
export function sweepPlacement(base: WheelInput): WheelInput['wheel']['coverPlacement'] {
  return base.wheel.coverPlacement === 'explicit' ? 'rim' : base.wheel.coverPlacement;
}

/** A family: the design at several covering fractions, over its yaw angles at its first airspeed. */
export function coverFamilyStudy(base: WheelInput, c: CaseFile, fractions: readonly number[]): StudyPlan {
  const main = c.conditions.airspeed_mps[0]!;
  const yaws = c.conditions.yaw_deg;
  const points = pointsAt(base, c, [main], yaws);
  const coverPlacement = sweepPlacement(base);
  return {
    name: 'covering-fraction family',
    caseAxes: [coverFractionAxis([...fractions])],
    pointAxes: [airspeedAxis([main]), yawAxis(yaws)],
    inputs: fractions.map((f) => variantInput(base, { coverFraction: f, coverPlacement }, points)),
  };
}
