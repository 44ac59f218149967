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
  /**
   * Each case's stage (0, 1, ...): the jobs of stage 0 are dealt first, then those of stage 1, and so
   * on, each stage planned on its own, in one run, so a worker that finishes its last job of a stage
   * takes the next stage's first job instead of waiting for the other workers (default: one stage).
   */
  stageOf?: readonly number[];
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
  const jobs = stagedJobs(runner, cases, options);
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

/**
 * The run's jobs, stage by stage (stageOf; one stage by default): one job per case in order for a
 * runner that runs in order, else planJobs over each stage's cases, renumbered to one list.
 */
function stagedJobs(runner: JobRunner, cases: readonly WheelInput[], options: RunCasesOptions): SolveJob[] {
  const stageOf = options.stageOf;
  if (stageOf && stageOf.length !== cases.length)
    throw new RangeError(`stageOf has ${stageOf.length} entries for ${cases.length} cases`);
  const stages = [...new Set(stageOf ?? [0])].sort((a, b) => a - b);
  const jobs: SolveJob[] = [];
  for (const stage of stages) {
    const members = cases.map((_, i) => i).filter((i) => (stageOf ? stageOf[i] === stage : true));
    const planned: SolveJob[] = runner.inOrder
      ? members.map((i) => ({ jobId: 0, cases: [{ caseIndex: i, input: cases[i]! }] }))
      : planJobs(
          members.map((i) => cases[i]!),
          { workers: runner.size, jobsPerWorker: options.jobsPerWorker },
        ).map((job) => ({
          jobId: 0,
          cases: job.cases.map(({ caseIndex, input }) => ({ caseIndex: members[caseIndex]!, input })),
        }));
    for (const job of planned) jobs.push({ ...job, jobId: jobs.length });
  }
  return jobs;
}
