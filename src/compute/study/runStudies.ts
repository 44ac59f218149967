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
  const landing = studyLanding(plans, options.keep ?? true, options.onCase);
  const { results, inputs } = landing;
  // Cases kept from an earlier run land now; the rest are solved (and kept).
  const cache = options.cache;
  const keys = cache ? inputs.map(inputKey) : [];
  const toSolve: number[] = [];
  inputs.forEach((_, i) => {
    const hit = cache?.take(keys[i]!, i);
    if (hit) landing.land(hit);
    else toSolve.push(i);
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
    onOutcome: (o) => {
      const i = toSolve[o.caseIndex]!;
      if (cache && o.ok) cache.keep(keys[i]!, o);
      landing.land({ ...o, caseIndex: i });
    },
  });
  const failedCount = landing.unplannedCount + summary.failedCount;
  return { results, cancelled: summary.cancelled, failedCount, workersReplaced: summary.workersReplaced };
}
