import type { TaskKind, TaskOf, TaskProgress, TaskResults } from './tasks';
import type { TaskOutcome, TaskRunOptions } from './taskWorkers';

/** What a channel runs its tasks on: a WorkerPool (its task workers). */
export interface TaskRunner {
  runTask<K extends TaskKind>(
    task: TaskOf<K>,
    options?: TaskRunOptions,
  ): Promise<TaskOutcome<TaskResults[K]>>;
}

/** A channel's outcome: the runner's, or superseded (a later task of the same channel took over). */
export type ChannelOutcome<T> = TaskOutcome<T> | { status: 'superseded' };

export interface ChannelRunOptions {
  onProgress?: TaskProgress;
  deadlineMs?: number;
  /** Passed on to the runner (TaskRunOptions.affinity: the worker holding the task's state). */
  affinity?: string;
}

interface Entry {
  task: TaskOf<TaskKind>;
  options: ChannelRunOptions;
  resolve: (outcome: ChannelOutcome<unknown>) => void;
  abort: AbortController;
}

/**
 * One client's tasks on a pool, latest wins (a ride panel, the design study, the map's ride
 * objectives, the 3D view). At most one of its tasks runs and one waits: a task asked for while one runs
 * replaces the waiting one (which resolves superseded at once), and the running one, when it ends with a
 * later one waiting, resolves superseded too and the later one starts. cancel() stops the running task
 * (its worker is stopped) and drops the waiting one; both resolve cancelled.
 *
 * By construction, for the client: every run resolves exactly once; "superseded" means a later run of
 * this channel exists and will itself resolve, so the client may simply drop a superseded answer; and a
 * run's progress is passed on only while it is the channel's newest run and unsettled, so a progress
 * message that arrives late (after the answer, or after a newer run began) is never shown.
 */
export class TaskChannel {
  private running: Entry | null = null;
  private waiting: Entry | null = null;

  constructor(private readonly runner: TaskRunner) {}

  get busy(): boolean {
    return this.running !== null;
  }

  run<K extends TaskKind>(
    task: TaskOf<K>,
    options: ChannelRunOptions = {},
  ): Promise<ChannelOutcome<TaskResults[K]>> {
    return new Promise((resolve) => {
      const entry: Entry = {
        task,
        options,
        resolve: resolve as (outcome: ChannelOutcome<unknown>) => void,
        abort: new AbortController(),
      };
      if (this.running) {
        this.waiting?.resolve({ status: 'superseded' });
        this.waiting = entry;
      } else {
        void this.start(entry);
      }
    });
  }

  /** Stop the running task and drop the waiting one (both resolve cancelled). */
  cancel(): void {
    const { running, waiting } = this;
    this.running = null;
    this.waiting = null;
    waiting?.resolve({ status: 'cancelled' });
    if (running) {
      running.abort.abort();
      running.resolve({ status: 'cancelled' });
    }
  }

  private async start(entry: Entry): Promise<void> {
    this.running = entry;
    const { onProgress, deadlineMs, affinity } = entry.options;
    const outcome = await this.runner.runTask(entry.task, {
      signal: entry.abort.signal,
      ...(onProgress
        ? {
            onProgress: (done: number, total: number) => {
              if (this.running === entry && this.waiting === null) onProgress(done, total);
            },
          }
        : {}),
      ...(deadlineMs !== undefined ? { deadlineMs } : {}),
      ...(affinity !== undefined ? { affinity } : {}),
    });
    if (this.running !== entry) return; // cancelled meanwhile: already resolved
    const next = this.waiting;
    this.running = null;
    this.waiting = null;
    entry.resolve(next ? { status: 'superseded' } : outcome);
    if (next) void this.start(next);
  }
}
