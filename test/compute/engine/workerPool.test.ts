import { describe, expect, it } from 'vitest';
import type { JobResult, SolveJob } from '../../../src/compute/engine/protocol';
import { type WorkerHandle, WorkerPool } from '../../../src/compute/engine/workerPool';

/**
 * Fake workers without the model: each solveJob waits until the test finishes it, so the test sees which
 * jobs each worker holds at each moment. A worker given a job in `killers` dies (its `failed` rejects)
 * as soon as it reaches that job, as a real worker that crashes in it would; jobs queued behind it never run.
 */
function fakeWorkers(killers: ReadonlySet<number> = new Set()) {
  const held: number[][] = [];
  const pending = new Map<number, () => void>();
  const spawn = (): WorkerHandle => {
    const slot = held.length;
    const mine: number[] = [];
    held.push(mine);
    let die: (error: Error) => void = () => undefined;
    const failed = new Promise<never>((_, reject) => {
      die = reject;
    });
    failed.catch(() => undefined);
    let dead = false;
    const api = {
      ping: async () => 'pong',
      solveJob: (job: SolveJob) =>
        new Promise<JobResult>((resolve) => {
          mine.push(job.jobId);
          // The worker solves its jobs one after another: a job that kills it ends the ones behind it.
          if (killers.has(job.jobId) && mine[0] === job.jobId) {
            dead = true;
            setTimeout(() => die(new Error(`worker ${slot} died in job ${job.jobId}`)), 1);
            return;
          }
          pending.set(job.jobId, () => {
            if (dead) return;
            mine.splice(mine.indexOf(job.jobId), 1);
            resolve({ jobId: job.jobId } as unknown as JobResult);
            // The next job the worker holds starts now; a killer among them kills it.
            const next = mine[0];
            if (next !== undefined && killers.has(next)) {
              dead = true;
              setTimeout(() => die(new Error(`worker ${slot} died in job ${next}`)), 1);
            }
          });
        }),
    } as unknown as WorkerHandle['api'];
    return { api, failed, terminate: () => undefined };
  };
  const finish = (jobId: number) => {
    const f = pending.get(jobId);
    if (!f) throw new Error(`job ${jobId} is not held by a live worker`);
    pending.delete(jobId);
    f();
  };
  return { spawn, held, finish, pending };
}

const jobsOf = (n: number): SolveJob[] => Array.from({ length: n }, (_, jobId) => ({ jobId, cases: [] }));
const tick = () => new Promise((ok) => setTimeout(ok, 5));

/** A run of `count` jobs on `pool`, with the ids of the jobs done and failed as they land. */
function runLogged(pool: WorkerPool, count: number) {
  const done: number[] = [];
  const failed: number[] = [];
  const run = pool.run(jobsOf(count), {
    onJobDone: (job) => done.push(job.jobId),
    onJobFailed: (job) => failed.push(job.jobId),
  });
  return { run, done, failed };
}

/** Finish every job the fake workers hold, tick after tick, until `stop()` (at most 50 ticks). */
async function finishAll(fake: ReturnType<typeof fakeWorkers>, stop: () => boolean): Promise<void> {
  for (let i = 0; i < 50 && !stop(); i++) {
    await tick();
    for (const id of [...fake.pending.keys()]) fake.finish(id);
  }
}

describe('WorkerPool dealing (invariants of the pool, no model)', () => {
  it('keeps a second job queued in each worker while more jobs wait than workers, none at the end', async () => {
    const fake = fakeWorkers();
    const pool = new WorkerPool(fake.spawn, 2);
    const done: number[] = [];
    const run = pool.run(jobsOf(6), { onJobDone: (job) => done.push(job.jobId) });
    await tick();
    // Each worker holds the job it solves and the next one, so it never waits for this thread.
    expect(fake.held).toEqual([
      [0, 1],
      [2, 3],
    ]);
    fake.finish(0);
    await tick();
    expect(fake.held[0]).toEqual([1, 4]);
    fake.finish(1);
    await tick();
    // One job waits for two workers: worker 0's second lane leaves it to whichever worker frees first.
    expect(fake.held[0]).toEqual([4]);
    fake.finish(2);
    await tick();
    expect(fake.held[1]).toEqual([3, 5]);
    for (const id of [3, 4, 5]) fake.finish(id);
    const summary = await run;
    expect(summary.cancelled).toBe(false);
    expect([...done].sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('holds up to three jobs per worker while many wait, and every job lands once', async () => {
    const fake = fakeWorkers();
    const pool = new WorkerPool(fake.spawn, 2);
    const done: number[] = [];
    const run = pool.run(jobsOf(20), { onJobDone: (job) => done.push(job.jobId) });
    await tick();
    expect(fake.held).toEqual([
      [0, 1, 2],
      [3, 4, 5],
    ]);
    for (let i = 0; i < 100 && done.length < 20; i++) {
      for (const id of [...fake.pending.keys()]) fake.finish(id);
      await tick();
      // Never more than three at once, and never queued jobs in one worker while the other is empty.
      for (const h of fake.held) expect(h.length).toBeLessThanOrEqual(3);
      if (fake.held.some((h) => h.length === 0))
        for (const h of fake.held) expect(h.length).toBeLessThanOrEqual(1);
    }
    await run;
    expect([...done].sort((a, b) => a - b)).toEqual(Array.from({ length: 20 }, (_, i) => i));
  });

  it('deals a job put back late (its worker died) even when the other lanes have ended', async () => {
    // Job 3 waits behind job 2 in the second worker and kills it when reached, after every other job
    // has been dealt: the lanes that could take it have ended, so the lane that puts it back takes it.
    const fake = fakeWorkers(new Set([3]));
    const { run, done, failed } = runLogged(new WorkerPool(fake.spawn, 2), 6);
    // Every other job first (job 2 held back), so the first worker's lanes end on an empty queue.
    for (let i = 0; i < 50 && done.length < 4; i++) {
      await tick();
      // Each worker ends the job it solves (the first it holds), never one queued behind it.
      for (const held of fake.held) if (held[0] !== undefined && held[0] !== 2) fake.finish(held[0]);
    }
    expect([...done].sort((a, b) => a - b)).toEqual([0, 1, 4, 5]);
    fake.finish(2);
    let ended = false;
    void run.then(() => {
      ended = true;
    });
    await finishAll(fake, () => ended);
    expect(ended, 'the run ended').toBe(true);
    expect(failed).toEqual([3]);
    expect([...done].sort((a, b) => a - b)).toEqual([0, 1, 2, 4, 5]);
  });

  it('charges a crash to the job that ran, not to the one queued behind it', async () => {
    // Job 0 kills every worker that reaches it; job 1 sits behind it in the first worker each time.
    const fake = fakeWorkers(new Set([0]));
    const { run, done, failed } = runLogged(new WorkerPool(fake.spawn, 1), 4);
    await finishAll(fake, () => done.length + failed.length >= 4);
    const summary = await run;
    expect(failed).toEqual([0]);
    expect([...done].sort((a, b) => a - b)).toEqual([1, 2, 3]);
    expect(summary.workersReplaced).toBe(2);
  });
});
