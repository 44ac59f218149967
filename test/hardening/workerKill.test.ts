/**
 * Worker faults on Node (issue 7): a solver worker thread terminated while it is solving (not before
 * it starts) is replaced, its job retried on a fresh worker, and the sweep completes with the same
 * numbers as an undisturbed run. (test/cli/nodeWorker.test.ts kills a worker as it is handed a job.)
 */
import { describe, expect, it } from 'vitest';
import { nodeWorkerSpawner } from '../../src/cli/nodeWorker';
import { runSweep } from '../../src/compute/engine/runSweep';
import { type SpawnWorker, WorkerPool } from '../../src/compute/engine/workerPool';
import { smallSweep } from '../compute/engine/fixtures';

describe('a worker killed mid-job (Node worker threads)', () => {
  it('is replaced, the job retried, and the numbers equal an undisturbed run', async () => {
    // Denser lattices so a job runs long enough (well over the 150 ms below) to be killed in the middle
    // of it, also with the WebAssembly LU and influence kernels (a 48 x 20 lattice now solves in well
    // under 150 ms).
    const cases = smallSweep([0, 0.5, 1], [0.04]).map((c) => ({
      ...c,
      options: { ...c.options, latticeSpanCount: 64, latticeChordCount: 28 },
    }));
    const real = nodeWorkerSpawner();
    const undisturbed = new WorkerPool(real, 1);
    const a = await runSweep(undisturbed, cases);
    undisturbed.close();
    expect(a.failedCount).toBe(0);

    let spawned = 0;
    let killedWhileBusy = false;
    const killing: SpawnWorker = () => {
      const handle = real();
      spawned++;
      if (spawned !== 1) return handle;
      const api = new Proxy(handle.api, {
        get(target, prop, receiver) {
          if (prop === 'solveJob') {
            return (job: unknown) => {
              const pending = (target.solveJob as (j: unknown) => Promise<unknown>)(job);
              let done = false;
              pending.then(
                () => {
                  done = true;
                },
                () => undefined,
              );
              // Kill it once the job has been running for a while (if it is still running).
              setTimeout(() => {
                if (!done) {
                  killedWhileBusy = true;
                  handle.terminate();
                }
              }, 150);
              return pending;
            };
          }
          return Reflect.get(target, prop, receiver);
        },
      });
      return { ...handle, api };
    };
    const pool = new WorkerPool(killing, 2);
    await pool.warm();
    const b = await runSweep(pool, cases, { jobsPerWorker: 1 });
    pool.close();
    expect(killedWhileBusy, 'the first worker was killed while solving').toBe(true);
    expect(b.workersReplaced).toBe(1);
    expect(b.failedCount).toBe(0);
    expect(b.solutions).toEqual(a.solutions);
  }, 120_000);
});
