/**
 * The study runner: solve the cases of one or more studies in one run on a job runner (a WorkerPool in
 * the browser or in Node, or this thread), and land each case's packed rows in its study's result cube
 * at the case's place. Cases that share a surface are grouped across the studies (planJobs), so a map,
 * a family and a baseline of one wheel reuse each other's factorisations.
 */
import type { JobRunner } from '../engine/jobRunner';
import { runCases, type SweepProgress } from '../engine/runCases';
import { inputKey } from './inputKey';
import type { OutcomeCache } from './outcomeCache';
import type { AxisPick } from './resultCube';
import { type CaseLanded, type StudyResult, studyLanding } from './studyLanding';
import type { StudyPlan } from './studyPlan';

export type { CaseLanded, StudyResult };

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
  /** Each plan's stage (runCases' stageOf: the cases of stage 0 are dealt first, then stage 1...);
   * default: one stage. */
  stages?: readonly number[];
  /** Called once every case of a stage has landed (kept, solved or failed), with the results so far;
   * a stage whose cases are all kept is done before any solve. Not called for a cancelled run's
   * unfinished stages. */
  onStageDone?: (stage: number, results: StudyResult[]) => void;
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
  if (options.stages && options.stages.length !== plans.length)
    throw new RangeError(`stages has ${options.stages.length} entries for ${plans.length} studies`);
  const landing = studyLanding(plans, options.keep ?? true, options.onCase);
  const { results, inputs } = landing;
  // Each planned case's stage, and the cases of each stage still to land.
  const stageOf = landing.studyOf.map((s) => options.stages?.[s] ?? 0);
  const left = new Map<number, number>((options.stages ?? [0]).map((stage) => [stage, 0]));
  for (const stage of stageOf) left.set(stage, left.get(stage)! + 1);
  const landed = (i: number) => {
    const stage = stageOf[i]!;
    const n = left.get(stage)! - 1;
    left.set(stage, n);
    if (n === 0) options.onStageDone?.(stage, results);
  };
  for (const [stage, n] of [...left].sort((a, b) => a[0] - b[0]))
    if (n === 0) options.onStageDone?.(stage, results);
  // Cases kept from an earlier run land now; the rest are solved (and kept).
  const cache = options.cache;
  const keys = cache ? inputs.map(inputKey) : [];
  const toSolve: number[] = [];
  inputs.forEach((_, i) => {
    const hit = cache?.take(keys[i]!, i);
    if (hit) {
      landing.land(hit);
      landed(i);
    } else toSolve.push(i);
  });
  if (toSolve.length === 0) {
    const cancelled = options.signal?.aborted ?? false;
    return { results, cancelled, failedCount: landing.unplannedCount, workersReplaced: 0 };
  }
  const solving = toSolve.length === inputs.length ? inputs : toSolve.map((i) => inputs[i]!);
  const summary = await runCases(runner, solving, {
    ...(options.signal ? { signal: options.signal } : {}),
    ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    ...(options.jobsPerWorker !== undefined ? { jobsPerWorker: options.jobsPerWorker } : {}),
    ...(options.now ? { now: options.now } : {}),
    ...(options.reportStart ? { reportStart: true } : {}),
    ...(options.stages ? { stageOf: toSolve.map((i) => stageOf[i]!) } : {}),
    onOutcome: (o) => {
      const i = toSolve[o.caseIndex]!;
      if (cache && o.ok) cache.keep(keys[i]!, o);
      landing.land({ ...o, caseIndex: i });
      landed(i);
    },
  });
  const failedCount = landing.unplannedCount + summary.failedCount;
  return { results, cancelled: summary.cancelled, failedCount, workersReplaced: summary.workersReplaced };
}
