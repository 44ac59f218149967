import type { JobRunner, PoolRunOptions, PoolRunSummary } from './jobRunner';
import type { JobResult, SolveJob } from './protocol';
import { settleFirst } from './settleFirst';
import type { TaskKind, TaskOf, TaskResults } from './tasks';
import { type TaskOutcome, type TaskRunOptions, TaskWorkers } from './taskWorkers';
import type { SpawnWorker, WorkerHandle } from './workerHandle';

export interface PoolOptions {
  /** Workers kept for tasks (tasks.ts), apart from the sweep workers (default 1). */
  taskWorkers?: number;
  /** Spawns the task workers (default: the pool's spawn function). */
  spawnTask?: SpawnWorker;
}

export type { PoolRunOptions, PoolRunSummary, SpawnWorker, TaskOutcome, TaskRunOptions, WorkerHandle };

/**
 * A fixed-size pool of solver workers, free of environment code. Jobs are dealt dynamically (a free
 * worker takes the next job), so uneven jobs balance. A worker that dies or throws is replaced and its
 * job retried once on a fresh worker; a job that fails twice is reported through onJobFailed and the run
 * goes on. Cancelling stops dealing and terminates busy workers at once (they are respawned on the next
 * run): every finished job has already been delivered through onJobDone.
 *
 * Tasks (runTask: the 3D view's field, a ride, a design study, the map's ride objectives, the reference
 * set) run on the pool's task workers (taskWorkers.ts), spawned on first use, so they neither wait for
 * the sweeps nor hold them up. A client that wants only its latest task runs them through a
 * TaskChannel (taskChannel.ts).
 */
export class WorkerPool implements JobRunner {
  private readonly workers: Array<WorkerHandle | null>;
  /** The task workers (runTask). */
  readonly tasks: TaskWorkers;

  constructor(
    private readonly spawn: SpawnWorker,
    readonly size: number,
    options: PoolOptions = {},
  ) {
    if (!(Number.isInteger(size) && size >= 1))
      throw new RangeError(`pool size must be an integer >= 1, got ${size}`);
    this.workers = new Array<WorkerHandle | null>(size).fill(null);
    this.tasks = new TaskWorkers(options.spawnTask ?? spawn, options.taskWorkers ?? 1);
  }

  /** Run one task on a task worker; resolves with its outcome, never rejects (taskWorkers.ts). */
  runTask<K extends TaskKind>(
    task: TaskOf<K>,
    options: TaskRunOptions = {},
  ): Promise<TaskOutcome<TaskResults[K]>> {
    return this.tasks.runTask(task, options);
  }

  private worker(slot: number): WorkerHandle {
    let w = this.workers[slot];
    if (!w) {
      w = this.spawn();
      // A failure with nobody waiting must not become an unhandled rejection.
      w.failed.catch(() => undefined);
      this.workers[slot] = w;
    }
    return w;
  }

  /** Retire a slot's worker, but only if it is still `handle`: a later run may already have put a
   * fresh worker there (a cancelled run's lanes end after the next run started). */
  private replace(slot: number, handle: WorkerHandle | null = this.workers[slot] ?? null): void {
    if (handle === null || this.workers[slot] !== handle) {
      handle?.terminate();
      return;
    }
    handle.terminate();
    this.workers[slot] = null;
  }

  /** Start every worker and wait until each answers (so timings exclude start-up). */
  async warm(): Promise<void> {
    await Promise.all(this.workers.map((_, slot) => this.worker(slot).api.ping()));
  }

  /** The run in progress, if any: a new run waits for it to end (a cancelled one ends at once). */
  private current: Promise<unknown> = Promise.resolve();

  /**
   * Deal `jobs` to the workers. Runs are serialised: a run started while another is still ending
   * waits for it, so the two never share or retire each other's workers.
   */
  run(jobs: readonly SolveJob[], options: PoolRunOptions = {}): Promise<PoolRunSummary> {
    const next = this.current.then(
      () => this.runNow(jobs, options),
      () => this.runNow(jobs, options),
    );
    this.current = next.catch(() => undefined);
    return next;
  }

  private async runNow(jobs: readonly SolveJob[], options: PoolRunOptions): Promise<PoolRunSummary> {
    const { signal } = options;
    const queue: Array<{ job: SolveJob; attempt: number }> = jobs.map((job) => ({ job, attempt: 0 }));
    let replaced = 0;
    let cancelled = signal?.aborted ?? false;
    let wakeCancel: () => void = () => undefined;
    const cancelPromise = new Promise<'cancelled'>((resolve) => {
      wakeCancel = () => resolve('cancelled');
    });
    const onAbort = () => {
      cancelled = true;
      wakeCancel();
    };
    signal?.addEventListener('abort', onAbort, { once: true });

    const lane = async (slot: number): Promise<void> => {
      while (!cancelled) {
        const next = queue.shift();
        if (!next) return;
        const w = this.worker(slot);
        let outcome: JobResult | 'cancelled' | Error;
        try {
          outcome = await settleFirst<JobResult, 'cancelled'>(w.api.solveJob(next.job), [
            w.failed,
            cancelPromise,
          ]);
        } catch (err) {
          outcome = err instanceof Error ? err : new Error(String(err));
        }
        if (outcome === 'cancelled') {
          this.replace(slot, w);
          return;
        }
        if (outcome instanceof Error) {
          this.replace(slot, w);
          replaced++;
          if (next.attempt === 0) queue.push({ job: next.job, attempt: 1 });
          else options.onJobFailed?.(next.job, outcome.message || 'worker failed');
          continue;
        }
        options.onJobDone?.(next.job, outcome);
      }
    };
    try {
      if (!cancelled) await Promise.all(this.workers.map((_, slot) => lane(slot)));
    } finally {
      signal?.removeEventListener('abort', onAbort);
    }
    return { cancelled, workersReplaced: replaced };
  }

  /** Stop every worker, the task workers too. The pool can be used again: workers are respawned on demand. */
  close(): void {
    for (let slot = 0; slot < this.workers.length; slot++) this.replace(slot);
    this.tasks.close();
  }
}
