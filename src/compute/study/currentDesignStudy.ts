import { type CaseFile, caseToModelInput } from '../caseFile';
import { airspeedAxis, yawAxis } from './axes';
import type { StudyPlan } from './studyPlan';

/**
 * The current design exactly as its case file says (what `coversweep solve` computes): one case, its
 * airspeeds x yaw angles. `quick` leaves out the grid-convergence lattices (the same values at about
 * half the cost, without the uncertainty estimate), so the page can show the numbers first.
 */
export function currentDesignStudy(c: CaseFile, quick = false): StudyPlan {
  const input = caseToModelInput(c);
  return {
    name: quick ? 'current design (first pass)' : 'current design',
    caseAxes: [],
    pointAxes: [airspeedAxis(c.conditions.airspeed_mps), yawAxis(c.conditions.yaw_deg)],
    inputs: [quick ? { ...input, options: { ...input.options, gridConvergence: false } } : input],
  };
}
