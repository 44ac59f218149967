/**
 * The data panel's worker (src/ui/dataJobs.worker.ts: it keeps the parsed table, read from a File in
 * the worker, so it is not a pool task worker; every other background task of the page is a task on the
 * pool, compute/engine/taskChannel.ts, with the same latest-wins rule). Latest wins: a
 * request made while one runs replaces any request still waiting, and a superseded answer is dropped.
 * cancel() stops the worker at once (a long calibration) and the next request starts a fresh one.
 * A job may carry a deadline (ms): a worker that has not answered by then is taken as hung, stopped and
 * replaced, and the job is tried once more on a fresh worker; a second hang is reported as a failure
 * naming the deadline.
 */
import type { Remote } from 'comlink';
import { type PageJobsHandle, type PageWorkerApi, spawnPageJobsWorker } from './browserWorker';

export type JobCall<T> = (api: Remote<PageWorkerApi>) => Promise<T>;

export type JobOutcome<T> =
  | { status: 'done'; value: T }
  | { status: 'failed'; error: string }
  | { status: 'superseded' }
  | { status: 'cancelled' };

interface Pending {
  call: JobCall<unknown>;
  resolve: (outcome: JobOutcome<unknown>) => void;
  deadlineMs: number;
  /** Tries so far (a hung try is repeated once). */
  tries: number;
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

  /** Jobs given up as hung (for the page's status and tests). */
  hangs = 0;

  /** Run a job; resolves with its outcome (never rejects). `deadlineMs`: see the class comment. */
  run<T>(call: JobCall<T>, deadlineMs = Number.POSITIVE_INFINITY): Promise<JobOutcome<T>> {
    return new Promise((resolve) => {
      const job: Pending = {
        call,
        resolve: resolve as (o: JobOutcome<unknown>) => void,
        deadlineMs,
        tries: 0,
      };
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
    let hung = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    job.tries++;
    try {
      this.handle ??= this.spawn();
      const h = this.handle;
      const died = h.failed.catch((error: unknown) => {
        crashed = true;
        throw error;
      });
      const deadline = new Promise<never>((_, reject) => {
        if (Number.isFinite(job.deadlineMs))
          timer = setTimeout(() => {
            hung = true;
            reject(
              new Error(
                `the background worker stopped answering (no answer in ${Math.round(job.deadlineMs / 1000)} s, twice); it was stopped`,
              ),
            );
          }, job.deadlineMs);
      });
      const value = await Promise.race([job.call(h.api), died, deadline]);
      outcome = { status: 'done', value };
    } catch (error) {
      outcome = { status: 'failed', error: error instanceof Error ? error.message : String(error) };
      if ((crashed || hung) && epoch === this.epoch) {
        // The worker crashed, could not load or hung: start afresh next time.
        this.handle?.terminate();
        this.handle = null;
      }
    } finally {
      clearTimeout(timer);
    }
    if (epoch !== this.epoch) return; // cancelled meanwhile: already resolved
    if (hung) {
      this.hangs++;
      if (job.tries < 2 && !this.waiting) {
        void this.start(job);
        return;
      }
    }
    this.running = null;
    const next = this.waiting;
    this.waiting = null;
    job.resolve(next ? { status: 'superseded' } : outcome);
    if (next) void this.start(next);
  }
}
