import type { WheelInput } from '../../model/wheel';
import type { JobRunner } from './jobRunner';
import { planJobs } from './planJobs';
import type { CaseOutcome, SolveJob } from './protocol';

export interface SweepProgress {
  casesDone: number;
  casesTotal: number;
  pointsDone: number;
  pointsTotal: number;
  elapsedMs: number;
  /** Estimated time left (ms), from the rate so far; NaN before the first job finishes. */
  remainingMs: number;
}

export interface RunCasesOptions {
  signal?: AbortSignal;
  /** Called after every finished job (and at the start, with nothing done, when reportStart is set). */
  onProgress?: (progress: SweepProgress) => void;
  reportStart?: boolean;
  /** Each case as it lands, solved or failed, whatever order the jobs finish in. */
  onOutcome?: (outcome: CaseOutcome) => void;
  jobsPerWorker?: number;
  now?: () => number;
}

export interface RunCasesSummary {
  cancelled: boolean;
  failedCount: number;
  workersReplaced: number;
}

/**
 * Solve model inputs on a job runner: plan the jobs (planJobs groups cases that share a surface; a
 * runner that runs in order gets one job per case, in order), deal them, and hand every case's outcome
 * back by its index. The numbers do not depend on the runner, the number of workers or the order jobs
 * finish in: each case is solved by the same pure code. A cancelled or partly failed run has delivered
 * every finished case.
 */
export async function runCases(
  runner: JobRunner,
  cases: readonly WheelInput[],
  options: RunCasesOptions = {},
): Promise<RunCasesSummary> {
  const now = options.now ?? (() => performance.now());
  const start = now();
  const jobs: SolveJob[] = runner.inOrder
    ? cases.map((input, caseIndex) => ({ jobId: caseIndex, cases: [{ caseIndex, input }] }))
    : planJobs(cases, { workers: runner.size, jobsPerWorker: options.jobsPerWorker });
  const pointsTotal = cases.reduce((n, c) => n + c.points.length, 0);
  let casesDone = 0;
  let pointsDone = 0;
  let failedCount = 0;
  const report = () => {
    const elapsedMs = now() - start;
    const remainingMs = pointsDone > 0 ? (elapsedMs * (pointsTotal - pointsDone)) / pointsDone : Number.NaN;
    options.onProgress?.({
      casesDone,
      casesTotal: cases.length,
      pointsDone,
      pointsTotal,
      elapsedMs,
      remainingMs,
    });
  };
  const land = (outcome: CaseOutcome) => {
    if (!outcome.ok) failedCount++;
    casesDone++;
    pointsDone += cases[outcome.caseIndex]!.points.length;
    options.onOutcome?.(outcome);
  };
  if (options.reportStart) report();
  const summary = await runner.run(jobs, {
    signal: options.signal,
    onJobDone: (_job, result) => {
      for (const o of result.outcomes) land(o);
      report();
    },
    onJobFailed: (job, error) => {
      for (const { caseIndex } of job.cases) {
        land({ caseIndex, ok: false, error: `worker failed twice on this case's job: ${error}` });
      }
      report();
    },
  });
  return { cancelled: summary.cancelled, failedCount, workersReplaced: summary.workersReplaced };
}
