/**
 * One worker for the page's jobs besides the sweeps (a ride, a comparison with data), so that
 * they neither wait for nor slow down the design's sweeps more than the machine must. Latest wins: a
 * request made while one runs replaces any request still waiting, and a superseded answer is dropped.
 * cancel() stops the worker at once (a long calibration) and the next request starts a fresh one.
 */
import type { Remote } from 'comlink';
import type { PageJobsApi } from '../compute/engine/pageJobs';
import { type PageJobsHandle, spawnPageJobsWorker } from './browserWorker';

export type JobCall<T> = (api: Remote<PageJobsApi>) => Promise<T>;

export type JobOutcome<T> =
  | { status: 'done'; value: T }
  | { status: 'failed'; error: string }
  | { status: 'superseded' }
  | { status: 'cancelled' };

interface Pending {
  call: JobCall<unknown>;
  resolve: (outcome: JobOutcome<unknown>) => void;
}

export class JobWorker {
  private handle: PageJobsHandle | null = null;
  private running: Pending | null = null;
  private waiting: Pending | null = null;
  private epoch = 0;

  constructor(private readonly spawn: () => PageJobsHandle = spawnPageJobsWorker) {}

  get busy(): boolean {
    return this.running !== null;
  }

  /** Run a job; resolves with its outcome (never rejects). */
  run<T>(call: JobCall<T>): Promise<JobOutcome<T>> {
    return new Promise((resolve) => {
      const job: Pending = { call, resolve: resolve as (o: JobOutcome<unknown>) => void };
      if (this.running) {
        this.waiting?.resolve({ status: 'superseded' });
        this.waiting = job;
      } else {
        void this.start(job);
      }
    });
  }

  /** Stop the job in progress and drop the waiting one. */
  cancel(): void {
    this.epoch++;
    this.handle?.terminate();
    this.handle = null;
    this.running?.resolve({ status: 'cancelled' });
    this.waiting?.resolve({ status: 'cancelled' });
    this.running = null;
    this.waiting = null;
  }

  private async start(job: Pending): Promise<void> {
    this.running = job;
    const epoch = this.epoch;
    let outcome: JobOutcome<unknown>;
    let crashed = false;
    try {
      this.handle ??= this.spawn();
      const h = this.handle;
      const died = h.failed.catch((error: unknown) => {
        crashed = true;
        throw error;
      });
      const value = await Promise.race([job.call(h.api), died]);
      outcome = { status: 'done', value };
    } catch (error) {
      outcome = { status: 'failed', error: error instanceof Error ? error.message : String(error) };
      if (crashed && epoch === this.epoch) {
        // The worker crashed or could not load: start afresh next time.
        this.handle?.terminate();
        this.handle = null;
      }
    }
    if (epoch !== this.epoch) return; // cancelled meanwhile: already resolved
    this.running = null;
    const next = this.waiting;
    this.waiting = null;
    job.resolve(next ? { status: 'superseded' } : outcome);
    if (next) void this.start(next);
  }
}
