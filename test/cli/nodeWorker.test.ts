import { describe, expect, it } from 'vitest';
import { nodeWorkerSpawner } from '../../src/cli/nodeWorker';
import { runSweep } from '../../src/compute/engine/runSweep';
import { type SpawnWorker, WorkerPool } from '../../src/compute/engine/workerPool';
import { smallSweep } from '../compute/engine/fixtures';

// Real Node worker_threads running the TypeScript worker entry (through tsx). Start-up is ~1 s each.
describe('solver pool on Node worker threads', () => {
  const cases = smallSweep([0, 1], [0.04]);

  it('gives identical results with 1 and 2 workers, and survives a worker killed mid-sweep', async () => {
    const one = new WorkerPool(nodeWorkerSpawner(), 1);
    const a = await runSweep(one, cases);
    one.close();
    expect(a.failedCount).toBe(0);

    // Kill the first worker as soon as it is handed its first job.
    const real = nodeWorkerSpawner();
    let spawned = 0;
    const killing: SpawnWorker = () => {
      const handle = real();
      spawned++;
      if (spawned !== 1) return handle;
      let first = true;
      const api = new Proxy(handle.api, {
        get(target, prop, receiver) {
          if (prop === 'solveJob' && first) {
            first = false;
            return (job: unknown) => {
              handle.terminate();
              return (target.solveJob as (j: unknown) => unknown)(job);
            };
          }
          return Reflect.get(target, prop, receiver);
        },
      });
      return { ...handle, api };
    };
    const two = new WorkerPool(killing, 2);
    const b = await runSweep(two, cases, { jobsPerWorker: 2 });
    two.close();
    expect(b.workersReplaced).toBe(1);
    expect(b.failedCount).toBe(0);
    expect(b.solutions).toEqual(a.solutions);
  }, 120_000);
});
