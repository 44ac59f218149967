import type { SurfaceSummary, WheelInput } from '../../model/wheel';
import { COLUMN_COUNT } from '../engine/columns';
import type { CaseOutcome } from '../engine/protocol';
import { solveJob } from '../engine/solveJob';
import { ResultCube } from './resultCube';
import { axesSize, checkStudyPlan, isUnplanned, type StudyPlan } from './studyPlan';

export interface StudyResult {
  plan: StudyPlan;
  /** Case axes then point axes, then the columns; rows of failed or unfinished cases are NaN. Null when
   * the run did not keep the numbers (keep: false). */
  cube: ResultCube | null;
  /** Per case cell (row-major over the case axes): the failure message, or null. */
  errors: Array<string | null>;
  /** Per case cell: the lattice surface summary of a solved case, or null. */
  surfaces: Array<SurfaceSummary | null>;
  /** Per case cell: 1 once the case landed (solved or failed), else 0. */
  landed: Uint8Array;
}

export interface CaseLanded {
  /** Which study (its position in the list given) and which case cell of it. */
  study: number;
  caseIndex: number;
  /** The case's own cube (its point axes x columns) over its packed rows, or null if it failed. */
  cube: ResultCube | null;
  surface: SurfaceSummary | null;
  error: string | null;
}

export interface StudyLanding {
  results: StudyResult[];
  /** One list of model inputs over every study (the planned cases), in order. */
  inputs: WheelInput[];
  /** The study (its position in the list given) of each of `inputs`. */
  studyOf: number[];
  /** Cases the planners could not plan (landed already as failed). */
  unplannedCount: number;
  /** Land an outcome of inputs[outcome.caseIndex] in its study's cube. */
  land(outcome: CaseOutcome): void;
}

/**
 * Empty results for some studies (NaN cubes unless keep is false), their planned inputs as one list, and
 * how an outcome lands at its study's case cell (runStudies and solveStudiesHere share it). Unplanned
 * cases land at once, as failed with the planner's message.
 */
export function studyLanding(
  plans: readonly StudyPlan[],
  keep: boolean,
  onCase?: (landed: CaseLanded) => void,
): StudyLanding {
  for (const plan of plans) checkStudyPlan(plan);
  const results: StudyResult[] = plans.map((plan) => {
    const cases = plan.inputs.length;
    const data = keep
      ? new Float64Array(cases * axesSize(plan.pointAxes) * COLUMN_COUNT).fill(Number.NaN)
      : null;
    return {
      plan,
      cube: data ? ResultCube.fromPacked([...plan.caseAxes, ...plan.pointAxes], data) : null,
      errors: new Array<string | null>(cases).fill(null),
      surfaces: new Array<SurfaceSummary | null>(cases).fill(null),
      landed: new Uint8Array(cases),
    };
  });
  // One list of model inputs over every study; each remembers its study and case cell.
  const inputs: WheelInput[] = [];
  const owner: Array<[study: number, caseIndex: number]> = [];
  const unplanned: Array<[study: number, caseIndex: number, error: string]> = [];
  plans.forEach((plan, s) => {
    plan.inputs.forEach((input, k) => {
      if (isUnplanned(input)) unplanned.push([s, k, input.error]);
      else {
        inputs.push(input);
        owner.push([s, k]);
      }
    });
  });
  const landAt = (s: number, k: number, outcome: CaseOutcome | { ok: false; error: string }) => {
    const r = results[s]!;
    r.landed[k] = 1;
    if (!outcome.ok) {
      r.errors[k] = outcome.error;
      onCase?.({ study: s, caseIndex: k, cube: null, surface: null, error: outcome.error });
      return;
    }
    r.surfaces[k] = outcome.surface;
    r.cube?.data.set(outcome.packed, k * outcome.packed.length);
    const caseCube = ResultCube.fromPacked(r.plan.pointAxes, outcome.packed);
    onCase?.({ study: s, caseIndex: k, cube: caseCube, surface: outcome.surface, error: null });
  };
  for (const [s, k, error] of unplanned) landAt(s, k, { ok: false, error });
  return {
    results,
    inputs,
    studyOf: owner.map(([study]) => study),
    unplannedCount: unplanned.length,
    land: (outcome) => {
      const [s, k] = owner[outcome.caseIndex]!;
      landAt(s, k, outcome);
    },
  };
}

/**
 * Solve studies here and now, in this thread, case by case in order (the same solveJob a worker runs,
 * so the same bits as runStudies on any runner): for small studies a synchronous caller needs, such
 * as a ride's two yaw curves.
 */
export function solveStudiesHere(plans: readonly StudyPlan[]): StudyResult[] {
  const landing = studyLanding(plans, true);
  landing.inputs.forEach((input, caseIndex) => {
    for (const outcome of solveJob({ jobId: caseIndex, cases: [{ caseIndex, input }] }).outcomes)
      landing.land(outcome);
  });
  return landing.results;
}
