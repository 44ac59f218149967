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

/** Jobs a worker holds at once while the queue is long: the one it solves and the next two (the page's
 * short jobs, 5-20 ms, outlast one queued job behind a 20-45 ms draw of the plots; measured by trace). */
const PREFETCH_DEPTH = 3;

/**
 * A fixed-size pool of solver workers, free of environment code. Jobs are dealt dynamically (a free
 * worker takes the next job), so uneven jobs balance. While more jobs wait than there are workers, each
 * worker also holds the next jobs in its message queue (PREFETCH_DEPTH), so it starts one the moment
 * it ends one, without waiting for this thread to read the answer and send more: on the page, this thread
 * draws while the workers solve, and a long draw left both workers idle (measured in a trace of a
 * tyre-width edit: 30-250 ms per worker). A worker that dies or throws is replaced and its job retried
 * once on a fresh worker (a job queued behind it goes back to the queue, not charged); a job that fails
 * twice is reported through onJobFailed and the run goes on. Cancelling stops dealing and terminates busy
 * workers at once (they are respawned on the next run): every finished job has already been delivered
 * through onJobDone.
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

    // A worker retired by one of its lanes (its job failed) ends the other lane's wait on it: that lane's
    // job goes back to the queue uncharged, as it never ran or was not the one that failed.
    const retiredOf = new Map<
      WorkerHandle,
      { promise: Promise<'retired'>; resolve: () => void; resolved: boolean }
    >();
    const retiredSignal = (w: WorkerHandle): Promise<'retired'> => {
      let r = retiredOf.get(w);
      if (!r) {
        let resolve: () => void = () => undefined;
        const promise = new Promise<'retired'>((ok) => {
          resolve = () => ok('retired');
        });
        r = { promise, resolve, resolved: false };
        retiredOf.set(w, r);
      }
      return r.promise;
    };
    const workerCount = this.workers.length;
    // depth 0 takes every job; lane d > 0 only while more than d jobs per worker wait, so toward the end
    // no worker holds queued jobs while another has none.
    // A lane that puts a job back takes the next one whatever its depth: the other lanes may have ended.
    const lane = async (slot: number, depth: number): Promise<void> => {
      let putBack = false;
      while (!cancelled) {
        if (depth > 0 && !putBack && queue.length <= depth * workerCount) return;
        putBack = false;
        const next = queue.shift();
        if (!next) return;
        const w = this.worker(slot);
        const retired = retiredSignal(w);
        let outcome: JobResult | 'cancelled' | 'retired' | Error;
        try {
          outcome = await settleFirst<JobResult, 'cancelled' | 'retired'>(w.api.solveJob(next.job), [
            w.failed,
            cancelPromise,
            retired,
          ]);
        } catch (err) {
          outcome = err instanceof Error ? err : new Error(String(err));
        }
        if (outcome === 'cancelled') {
          this.replace(slot, w);
          return;
        }
        if (outcome === 'retired' || (outcome instanceof Error && retiredOf.get(w)?.resolved)) {
          queue.unshift(next);
          putBack = true;
          continue;
        }
        if (outcome instanceof Error) {
          const r = retiredOf.get(w)!;
          r.resolved = true;
          r.resolve();
          this.replace(slot, w);
          replaced++;
          if (next.attempt === 0) {
            queue.push({ job: next.job, attempt: 1 });
            putBack = true;
          } else options.onJobFailed?.(next.job, outcome.message || 'worker failed');
          continue;
        }
        options.onJobDone?.(next.job, outcome);
      }
    };
    try {
      if (!cancelled) {
        const lanes: Promise<void>[] = [];
        for (let slot = 0; slot < workerCount; slot++) {
          for (let depth = 0; depth < PREFETCH_DEPTH; depth++) lanes.push(lane(slot, depth));
        }
        await Promise.all(lanes);
      }
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
