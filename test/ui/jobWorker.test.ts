// The page's background-job runner (src/ui/jobWorker.ts) with fake workers: a job whose worker stops
// answering past its deadline is retried once on a fresh worker, and reported when it hangs again.
// (Deadlines here are a few ms: the runner is given them; the page's own are tens of seconds.)
import { describe, expect, it } from 'vitest';
import type { PageJobsHandle } from '../../src/ui/browserWorker';
import { JobWorker } from '../../src/ui/jobWorker';

/** A fake worker whose `ping` answers, or never answers when `hangs`. */
function fakeSpawn(hangs: (n: number) => boolean) {
  let spawned = 0;
  let terminated = 0;
  const spawn = (): PageJobsHandle => {
    const n = ++spawned;
    return {
      api: { ping: () => (hangs(n) ? new Promise(() => undefined) : Promise.resolve(`ready ${n}`)) } as never,
      failed: new Promise<never>(() => undefined),
      terminate: () => {
        terminated++;
      },
    };
  };
  return { spawn, counts: () => ({ spawned, terminated }) };
}

describe('JobWorker deadlines', () => {
  it('retries a hung job once on a fresh worker', async () => {
    const f = fakeSpawn((n) => n === 1);
    const w = new JobWorker(f.spawn);
    const out = await w.run((api) => api.ping() as Promise<string>, 30);
    expect(out).toEqual({ status: 'done', value: 'ready 2' });
    expect(w.hangs).toBe(1);
    expect(f.counts()).toEqual({ spawned: 2, terminated: 1 });
  });

  it('reports a job that hangs twice, naming the deadline', async () => {
    const f = fakeSpawn(() => true);
    const w = new JobWorker(f.spawn);
    const out = await w.run((api) => api.ping() as Promise<string>, 20);
    expect(out.status).toBe('failed');
    expect(out.status === 'failed' && out.error).toMatch(/stopped answering \(no answer in 0 s, twice\)/);
    expect(w.hangs).toBe(2);
    // The next job starts on a fresh worker.
    expect(f.counts().terminated).toBe(2);
  });

  it('leaves a job without a deadline alone', async () => {
    const f = fakeSpawn(() => false);
    const w = new JobWorker(f.spawn);
    expect(await w.run((api) => api.ping() as Promise<string>)).toEqual({ status: 'done', value: 'ready 1' });
    expect(w.hangs).toBe(0);
  });
});
