import type { JobRunner, PoolRunOptions, PoolRunSummary } from './jobRunner';
import type { JobResult, SolveJob } from './protocol';
import { solveJob } from './solveJob';

/**
 * Runs jobs in this thread, one by one in the order given (the command line's small sweeps, where a
 * worker's start-up would cost more than it saves), through the same solveJob a worker runs. It gives
 * the event loop a turn at least every `yieldEveryMs` so signals and output get through, and stops
 * between jobs when the signal is aborted.
 */
export class InProcessRunner implements JobRunner {
  readonly size = 1;
  readonly inOrder = true;

  constructor(
    private readonly solve: (job: SolveJob) => JobResult = solveJob,
    private readonly yieldEveryMs = 50,
  ) {}

  async run(jobs: readonly SolveJob[], options: PoolRunOptions = {}): Promise<PoolRunSummary> {
    const { signal } = options;
    let lastYield = Date.now();
    for (const job of jobs) {
      if (signal?.aborted) return { cancelled: true, workersReplaced: 0 };
      let result: JobResult;
      try {
        result = this.solve(job);
      } catch (error) {
        options.onJobFailed?.(job, error instanceof Error ? error.message : String(error));
        continue;
      }
      options.onJobDone?.(job, result);
      if (Date.now() - lastYield >= this.yieldEveryMs) {
        await new Promise<void>((resolve) => setTimeout(resolve, 0));
        lastYield = Date.now();
      }
    }
    return { cancelled: signal?.aborted ?? false, workersReplaced: 0 };
  }
}
