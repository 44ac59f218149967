import type { JobResult, SolveJob } from './protocol';

export interface PoolRunOptions {
  signal?: AbortSignal;
  /** Called after each finished job with the job and its result. */
  onJobDone?: (job: SolveJob, result: JobResult) => void;
  /** Called when a job's worker failed and the job failed its retry too. */
  onJobFailed?: (job: SolveJob, error: string) => void;
}

export interface PoolRunSummary {
  cancelled: boolean;
  /** Workers replaced after a crash during this run. */
  workersReplaced: number;
}

/**
 * What runs a study's jobs: a WorkerPool (workers in the browser or in Node), or the InProcessRunner
 * (this thread, for small command-line sweeps). Results are the same bits either way.
 */
export interface JobRunner {
  /** How many jobs run at once (jobs are planned per worker). */
  readonly size: number;
  /** True when the jobs run one by one in the order given: the planner then keeps the cases' order. */
  readonly inOrder?: boolean;
  run(jobs: readonly SolveJob[], options?: PoolRunOptions): Promise<PoolRunSummary>;
}
