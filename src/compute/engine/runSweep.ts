import type { WheelInput, WheelSolution } from '../../model/wheel';
import { unpackPoints } from './packPoints';
import { planJobs } from './planJobs';
import type { WorkerPool } from './workerPool';

export interface SweepProgress {
  casesDone: number;
  casesTotal: number;
  pointsDone: number;
  pointsTotal: number;
  elapsedMs: number;
  /** Estimated time left (ms), from the rate so far; NaN before the first job finishes. */
  remainingMs: number;
}

export interface SweepOutcome {
  /** One entry per case, in the order given: the solution, or null where the case failed, was not run,
   * or was not kept (keepSolutions: false). */
  solutions: Array<WheelSolution | null>;
  /** One entry per case: the failure message, or null. */
  errors: Array<string | null>;
  cancelled: boolean;
  failedCount: number;
  workersReplaced: number;
}

export interface RunSweepOptions {
  signal?: AbortSignal;
  onProgress?: (progress: SweepProgress) => void;
  /** Also called with each case as it lands (for streaming displays). */
  onCase?: (caseIndex: number, solution: WheelSolution | null, error: string | null) => void;
  jobsPerWorker?: number;
  now?: () => number;
  /** Keep every solution in the outcome (default true). A caller that streams cases through onCase
   * passes false, so memory stays bounded by the jobs in flight, not by the sweep's size. */
  keepSolutions?: boolean;
}

/**
 * Run a sweep on a worker pool: plan the jobs (planJobs), deal them, and put every result back in its
 * case's place. The numbers do not depend on the number of workers or the order jobs finish in: each
 * case is solved by the same pure code, and results are placed by case index. A cancelled or partly
 * failed sweep keeps every finished case.
 */
export async function runSweep(
  pool: WorkerPool,
  cases: readonly WheelInput[],
  options: RunSweepOptions = {},
): Promise<SweepOutcome> {
  const now = options.now ?? (() => performance.now());
  const keep = options.keepSolutions ?? true;
  const start = now();
  const jobs = planJobs(cases, { workers: pool.size, jobsPerWorker: options.jobsPerWorker });
  const solutions: Array<WheelSolution | null> = new Array(cases.length).fill(null);
  const errors: Array<string | null> = new Array(cases.length).fill(null);
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
  const summary = await pool.run(jobs, {
    signal: options.signal,
    onJobDone: (_job, result) => {
      for (const o of result.outcomes) {
        const solution = o.ok ? { surface: o.surface, points: unpackPoints(o.packed, o.pointCount) } : null;
        if (solution && keep) solutions[o.caseIndex] = solution;
        if (!o.ok) {
          errors[o.caseIndex] = o.error;
          failedCount++;
        }
        casesDone++;
        pointsDone += cases[o.caseIndex]!.points.length;
        options.onCase?.(o.caseIndex, solution, errors[o.caseIndex]!);
      }
      report();
    },
    onJobFailed: (job, error) => {
      for (const { caseIndex } of job.cases) {
        errors[caseIndex] = `worker failed twice on this case's job: ${error}`;
        failedCount++;
        casesDone++;
        pointsDone += cases[caseIndex]!.points.length;
        options.onCase?.(caseIndex, null, errors[caseIndex]!);
      }
      report();
    },
  });
  return {
    solutions,
    errors,
    cancelled: summary.cancelled,
    failedCount,
    workersReplaced: summary.workersReplaced,
  };
}
