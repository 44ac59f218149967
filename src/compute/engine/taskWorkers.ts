import { proxy } from 'comlink';
import { settleFirst } from './settleFirst';
import type { TaskKind, TaskOf, TaskProgress, TaskResults } from './tasks';
import type { SpawnWorker, WorkerHandle } from './workerHandle';

export interface TaskRunOptions {
  /** Aborting stops the task: a queued task leaves the queue, a running one's worker is stopped. */
  signal?: AbortSignal;
  /** Progress while the task runs; never called once the task has settled. */
  onProgress?: TaskProgress;
  /** A worker that has not answered in this many ms is taken as hung (default: no deadline). */
  deadlineMs?: number;
  /**
   * Tasks with the same affinity go to the worker that last finished one of them when it is free (it
   * holds their state: the data panel's parsed table), else to any free worker (which must then rebuild
   * that state from the task itself: a task never depends on a worker's memory to be answered).
   */
  affinity?: string;
}

export type TaskOutcome<T> =
  | { status: 'done'; value: T }
  | { status: 'failed'; error: string }
  | { status: 'cancelled' };

type Answer = { value: unknown } | { error: string };
type Interrupt = 'hung' | 'stopped' | { crashed: string };

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

/** Each worker's failure as a value, made once per worker (not once per task: `failed` lives as long
 * as the worker, and every reaction attached to it stays until it settles). */
const crashes = new WeakMap<WorkerHandle, Promise<{ crashed: string }>>();
function crashedOf(w: WorkerHandle): Promise<{ crashed: string }> {
  let p = crashes.get(w);
  if (!p) {
    p = w.failed.then(
      () => ({ crashed: 'the background worker stopped' }),
      (error: unknown) => ({ crashed: messageOf(error) }),
    );
    crashes.set(w, p);
  }
  return p;
}

/** Affinities remembered (the data panel keeps two tables per worker: a few dozen is plenty). */
const MAX_HOMES = 32;

interface Queued {
  task: TaskOf<TaskKind>;
  options: TaskRunOptions;
  resolve: (outcome: TaskOutcome<unknown>) => void;
  /** Tries so far: a try whose worker crashed or hung is repeated once on a fresh worker. */
  tries: number;
  /** Set while it runs: stops the try (the abort signal's path). */
  stop: (() => void) | null;
  settled: boolean;
}

/**
 * The pool's task workers (tasks.ts): a few workers of their own, so that a task never waits behind the
 * sweeps nor they behind it. Tasks are dealt first come, first served to a free worker. Every task
 * resolves exactly once with its outcome (never rejects): done; failed (the model's message, or a
 * worker that crashed or hung on two tries, the second on a fresh worker); or cancelled (its signal
 * aborted: the worker running it is stopped and replaced on demand). Progress reaches the caller only
 * while the task is unsettled, so a late progress message (it travels on its own port and may arrive
 * after the answer) can never overwrite what the caller did with the answer.
 */
export class TaskWorkers {
  private readonly slots: Array<WorkerHandle | null>;
  private readonly busy: boolean[];
  private readonly queue: Queued[] = [];
  /** Tries given up as hung (for status lines and tests). */
  hangs = 0;
  /** Affinity -> the worker that last finished a task with it (at most MAX_HOMES, oldest dropped). */
  private readonly homes = new Map<string, WorkerHandle>();

  constructor(
    private readonly spawn: SpawnWorker,
    readonly size: number,
  ) {
    if (!(Number.isInteger(size) && size >= 1))
      throw new RangeError(`task workers must be an integer >= 1, got ${size}`);
    this.slots = new Array<WorkerHandle | null>(size).fill(null);
    this.busy = new Array<boolean>(size).fill(false);
  }

  runTask<K extends TaskKind>(
    task: TaskOf<K>,
    options: TaskRunOptions = {},
  ): Promise<TaskOutcome<TaskResults[K]>> {
    return new Promise((resolve) => {
      const { signal } = options;
      if (signal?.aborted) {
        resolve({ status: 'cancelled' });
        return;
      }
      const q: Queued = { task, options, resolve: () => undefined, tries: 0, stop: null, settled: false };
      const onAbort = () => {
        const at = this.queue.indexOf(q);
        if (at >= 0) this.queue.splice(at, 1);
        q.stop?.();
        settle({ status: 'cancelled' });
      };
      const settle = (outcome: TaskOutcome<unknown>) => {
        if (q.settled) return;
        q.settled = true;
        signal?.removeEventListener('abort', onAbort);
        resolve(outcome as TaskOutcome<TaskResults[K]>);
      };
      q.resolve = settle;
      signal?.addEventListener('abort', onAbort, { once: true });
      this.queue.push(q);
      this.deal();
    });
  }

  /** Drop the queued tasks (cancelled) and stop every task worker (a running task is then reported as
   * crashed and tried once more on a fresh worker, so close only when no task is wanted). */
  close(): void {
    for (const q of this.queue.splice(0)) q.resolve({ status: 'cancelled' });
    for (let slot = 0; slot < this.size; slot++) this.retire(slot, this.slots[slot] ?? null);
  }

  /** Start queued tasks, first come first served, while a worker is free. */
  private deal(): void {
    while (this.queue.length > 0) {
      const slot = this.freeSlotFor(this.queue[0]!);
      if (slot < 0) return;
      void this.start(slot, this.queue.shift()!);
    }
  }

  /** The task's home worker's slot if that is free, else the first free slot, else -1. */
  private freeSlotFor(q: Queued): number {
    const { affinity } = q.options;
    const home = affinity === undefined ? undefined : this.homes.get(affinity);
    const at = home === undefined ? -1 : this.slots.indexOf(home);
    return at >= 0 && !this.busy[at] ? at : this.busy.indexOf(false);
  }

  private setHome(affinity: string, w: WorkerHandle): void {
    this.homes.delete(affinity);
    this.homes.set(affinity, w);
    if (this.homes.size > MAX_HOMES) this.homes.delete(this.homes.keys().next().value!);
  }

  private worker(slot: number): WorkerHandle {
    let w = this.slots[slot];
    if (!w) {
      const spawned = this.spawn();
      // A worker that dies, even idle, leaves its slot at once: the next task gets a fresh one.
      void crashedOf(spawned).then(() => this.retire(slot, spawned));
      this.slots[slot] = spawned;
      w = spawned;
    }
    return w;
  }

  /** Stop a slot's worker and empty the slot, if the slot still holds it (else it was retired). */
  private retire(slot: number, handle: WorkerHandle | null): void {
    if (handle === null || this.slots[slot] !== handle) return;
    handle.terminate();
    this.slots[slot] = null;
    for (const [affinity, home] of this.homes) if (home === handle) this.homes.delete(affinity);
  }

  private async start(slot: number, q: Queued): Promise<void> {
    this.busy[slot] = true;
    q.tries++;
    let w: WorkerHandle | null = null;
    let timer: ReturnType<typeof setTimeout> | undefined;
    let trySettled = false;
    let outcome: TaskOutcome<unknown> | 'retry';
    try {
      w = this.worker(slot);
      const { onProgress, deadlineMs } = q.options;
      const progress = onProgress
        ? proxy((done: number, total: number) => {
            if (!trySettled && !q.settled) onProgress(done, total);
          })
        : undefined;
      const hung = new Promise<'hung'>((resolve) => {
        if (deadlineMs !== undefined && Number.isFinite(deadlineMs))
          timer = setTimeout(() => resolve('hung'), deadlineMs);
      });
      const stopped = new Promise<'stopped'>((resolve) => {
        q.stop = () => resolve('stopped');
      });
      const crashed = crashedOf(w);
      const answer = w.api.runTask(q.task, progress).then(
        (value) => ({ value }),
        (error: unknown) => ({ error: messageOf(error) }),
      );
      const first = await settleFirst<Answer, Interrupt>(answer, [hung, stopped, crashed]);
      if (first === 'stopped') {
        this.retire(slot, w);
        outcome = { status: 'cancelled' };
      } else if (first === 'hung' || 'crashed' in first) {
        // Crashed or hung: a fresh worker next time, and one more try.
        this.retire(slot, w);
        if (first === 'hung') this.hangs++;
        const why =
          first === 'hung'
            ? `the background worker stopped answering (no answer in ${Math.round((deadlineMs ?? 0) / 1000)} s, twice); it was stopped`
            : first.crashed;
        outcome = q.tries < 2 ? 'retry' : { status: 'failed', error: why };
      } else if ('error' in first) {
        // The task's own error (the model refused its input): the worker is fine.
        outcome = { status: 'failed', error: first.error };
      } else {
        outcome = { status: 'done', value: first.value };
        if (q.options.affinity !== undefined) this.setHome(q.options.affinity, w);
      }
    } catch (error) {
      // The worker could not even be spawned.
      if (w) this.retire(slot, w);
      outcome = { status: 'failed', error: messageOf(error) };
    } finally {
      clearTimeout(timer);
      trySettled = true;
      q.stop = null;
    }
    this.busy[slot] = false;
    if (outcome === 'retry' && !q.settled) this.queue.unshift(q);
    else if (outcome !== 'retry') q.resolve(outcome);
    this.deal();
  }
}
