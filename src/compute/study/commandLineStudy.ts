import { caseToModelInput } from '../caseFile';
import type { ExpandedPlan } from '../planFile';
import { AXIS, airspeedAxis, yawAxis } from './axes';
import type { StudyInput, StudyPlan } from './studyPlan';

/**
 * A plan file's study: one case per expanded case (axis "case", in the plan's order), each over the
 * plan's airspeeds x yaw angles (the same for every case: a plan's point lists are never expanded). A
 * case the model cannot even set up keeps its message as its result.
 */
export function commandLineStudy(plan: ExpandedPlan): StudyPlan {
  const first = plan.cases[0]?.caseFile.conditions;
  const inputs: StudyInput[] = plan.cases.map(({ caseFile }) => {
    try {
      return caseToModelInput(caseFile);
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  });
  return {
    name: 'plan',
    caseAxes: [{ name: AXIS.case, unit: '', values: plan.cases.map((c) => c.index) }],
    pointAxes: first ? [airspeedAxis(first.airspeed_mps), yawAxis(first.yaw_deg)] : [],
    inputs,
  };
}
