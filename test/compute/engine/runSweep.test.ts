import { describe, expect, it } from 'vitest';
import { runSweep } from '../../../src/compute/engine/runSweep';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import { solveWheel } from '../../../src/model/wheel';
import { smallSweep } from './fixtures';
import { inProcessSpawner } from './inProcessSpawn';

// Results must equal case-by-case solves to 1e-12 relative (issue: "planner's grouping and reuse").
function expectSameAsDirect(cases: ReturnType<typeof smallSweep>, solutions: Array<unknown>) {
  cases.forEach((input, i) => {
    const direct = solveWheel(input);
    const got = solutions[i] as typeof direct;
    expect(got, `case ${i} missing`).not.toBeNull();
    direct.points.forEach((p, k) => {
      const q = got.points[k]!;
      for (const key of ['axialN', 'sideN', 'steeringMomentNm', 'axleTorqueNm', 'powerW'] as const) {
        const tol = 1e-12 * Math.max(1, Math.abs(p[key]));
        expect(
          Math.abs(q[key] - p[key]),
          `case ${i} point ${k} ${key}: got ${q[key]} expected ${p[key]}`,
        ).toBeLessThanOrEqual(tol);
      }
    });
  });
}

describe('runSweep on a pool (in-process channel workers)', () => {
  const cases = smallSweep();

  it('equals case-by-case solves, with 1 and with 3 workers identically', async () => {
    const one = new WorkerPool(inProcessSpawner().spawn, 1);
    const three = new WorkerPool(inProcessSpawner().spawn, 3);
    const a = await runSweep(one, cases);
    const b = await runSweep(three, cases, { jobsPerWorker: 3 });
    expect(a.failedCount).toBe(0);
    expectSameAsDirect(cases, a.solutions);
    expect(b.solutions).toEqual(a.solutions);
    one.close();
    three.close();
  });

  it('can stream cases without keeping them (bounded memory), delivering the same numbers', async () => {
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    const streamed: Array<unknown> = new Array(cases.length).fill(null);
    const out = await runSweep(pool, cases, {
      keepSolutions: false,
      onCase: (i, solution) => {
        streamed[i] = solution;
      },
    });
    expect(out.solutions.every((s) => s === null)).toBe(true);
    expectSameAsDirect(cases, streamed);
    pool.close();
  });

  it('reports progress up to the total', async () => {
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    const seen: number[] = [];
    await runSweep(pool, cases, { onProgress: (p) => seen.push(p.casesDone) });
    expect(seen[seen.length - 1]).toBe(cases.length);
    expect([...seen].sort((x, y) => x - y)).toEqual(seen);
    pool.close();
  });

  it('replaces a worker that dies mid-job, retries the job and gets the same numbers', async () => {
    const spawner = inProcessSpawner((n) => n === 2);
    const pool = new WorkerPool(spawner.spawn, 2);
    const out = await runSweep(pool, cases, { jobsPerWorker: 3 });
    expect(out.workersReplaced).toBe(1);
    expect(out.failedCount).toBe(0);
    // The dead worker's slot gets a fresh worker when it takes another job; the retried job may go to the
    // other worker (each holds queued jobs while the queue is long), so 2 or 3 workers were spawned.
    expect(spawner.spawned()).toBeGreaterThanOrEqual(2);
    expectSameAsDirect(cases, out.solutions);
    pool.close();
  });

  it('turns a job that kills its worker twice into failed rows and finishes the rest', async () => {
    const pool = new WorkerPool(inProcessSpawner((_n, jobId) => jobId === 0).spawn, 1);
    const out = await runSweep(pool, cases, { jobsPerWorker: 6 });
    expect(out.failedCount).toBeGreaterThan(0);
    expect(out.failedCount).toBeLessThan(cases.length);
    const failed = out.errors.filter((e) => e !== null);
    expect(failed.every((e) => /worker failed twice/.test(e!))).toBe(true);
    out.solutions.forEach((s, i) => {
      expect(s === null).toBe(out.errors[i] !== null);
    });
    pool.close();
  });

  it('reports a case the model rejects as an error row', async () => {
    const bad = { ...cases[0]!, wheel: { ...cases[0]!.wheel, rimDepthM: 0.5 } };
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    const out = await runSweep(pool, [bad, ...cases]);
    expect(out.errors[0]).toMatch(/rim depth/);
    expect(out.failedCount).toBe(1);
    expect(out.solutions.slice(1).every((s) => s !== null)).toBe(true);
    pool.close();
  });

  it('cancels: stops dealing, keeps every finished case', async () => {
    const pool = new WorkerPool(inProcessSpawner().spawn, 1);
    const controller = new AbortController();
    let landed = 0;
    const out = await runSweep(pool, cases, {
      signal: controller.signal,
      jobsPerWorker: 6,
      onCase: () => {
        landed++;
        if (landed === 1) controller.abort();
      },
    });
    expect(out.cancelled).toBe(true);
    const finished = out.solutions.filter((s) => s !== null).length;
    expect(finished).toBeGreaterThanOrEqual(1);
    expect(finished).toBeLessThan(cases.length);
    pool.close();
  });
});
