/**
 * The study runner: solve the cases of one or more studies in one run on a job runner (a WorkerPool in
 * the browser or in Node, or this thread), and land each case's packed rows in its study's result cube
 * at the case's place. Cases that share a surface are grouped across the studies (planJobs), so a map,
 * a family and a baseline of one wheel reuse each other's factorisations.
 */
import type { SurfaceSummary, WheelInput } from '../../model/wheel';
import { COLUMN_COUNT } from '../engine/columns';
import type { JobRunner } from '../engine/jobRunner';
import type { CaseOutcome } from '../engine/protocol';
import { runCases, type SweepProgress } from '../engine/runCases';
import { inputKey } from './inputKey';
import type { OutcomeCache } from './outcomeCache';
import { type AxisPick, ResultCube } from './resultCube';
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

export interface RunStudiesOptions {
  signal?: AbortSignal;
  onProgress?: (progress: SweepProgress) => void;
  /** Also report progress once at the start, with nothing done. */
  reportStart?: boolean;
  onCase?: (landed: CaseLanded) => void;
  jobsPerWorker?: number;
  now?: () => number;
  /** Keep the numbers in the studies' cubes (default true); a streaming caller passes false. */
  keep?: boolean;
  /** Solved cases kept across runs: a case whose exact input is kept lands from it (first, before any
   * solve) and is not solved again; every case solved by this run is kept. */
  cache?: OutcomeCache;
}

export interface StudiesOutcome {
  results: StudyResult[];
  cancelled: boolean;
  failedCount: number;
  workersReplaced: number;
}

/** Row-major index of a case cell from one index per case axis. */
export function caseCell(plan: StudyPlan, at: AxisPick): number {
  let k = 0;
  for (const a of plan.caseAxes) {
    const i = at[a.name];
    if (i === undefined) throw new RangeError(`study ${plan.name}: pick the case axis "${a.name}"`);
    k = k * a.values.length + i;
  }
  return k;
}

export async function runStudies(
  runner: JobRunner,
  plans: readonly StudyPlan[],
  options: RunStudiesOptions = {},
): Promise<StudiesOutcome> {
  const keep = options.keep ?? true;
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
  let failedCount = unplanned.length;
  const land = (s: number, k: number, outcome: CaseOutcome | { ok: false; error: string }) => {
    const r = results[s]!;
    r.landed[k] = 1;
    if (!outcome.ok) {
      r.errors[k] = outcome.error;
      options.onCase?.({ study: s, caseIndex: k, cube: null, surface: null, error: outcome.error });
      return;
    }
    r.surfaces[k] = outcome.surface;
    r.cube?.data.set(outcome.packed, k * outcome.packed.length);
    const caseCube = ResultCube.fromPacked(r.plan.pointAxes, outcome.packed);
    options.onCase?.({ study: s, caseIndex: k, cube: caseCube, surface: outcome.surface, error: null });
  };
  for (const [s, k, error] of unplanned) land(s, k, { ok: false, error });
  // Cases kept from an earlier run land now; the rest are solved (and kept).
  const cache = options.cache;
  const keys = cache ? inputs.map(inputKey) : [];
  const toSolve: number[] = [];
  inputs.forEach((_, i) => {
    const hit = cache?.take(keys[i]!, i);
    if (hit) land(owner[i]![0], owner[i]![1], hit);
    else toSolve.push(i);
  });
  if (toSolve.length === 0) {
    return { results, cancelled: options.signal?.aborted ?? false, failedCount, workersReplaced: 0 };
  }
  const solving = toSolve.length === inputs.length ? inputs : toSolve.map((i) => inputs[i]!);
  const summary = await runCases(runner, solving, {
    ...(options.signal ? { signal: options.signal } : {}),
    ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    ...(options.jobsPerWorker !== undefined ? { jobsPerWorker: options.jobsPerWorker } : {}),
    ...(options.now ? { now: options.now } : {}),
    ...(options.reportStart ? { reportStart: true } : {}),
    onOutcome: (o) => {
      const i = toSolve[o.caseIndex]!;
      if (cache && o.ok) cache.keep(keys[i]!, o);
      const [s, k] = owner[i]!;
      land(s, k, o);
    },
  });
  failedCount += summary.failedCount;
  return { results, cancelled: summary.cancelled, failedCount, workersReplaced: summary.workersReplaced };
}
