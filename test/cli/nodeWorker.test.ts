import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { nodeWorkerSpawner } from '../../src/cli/nodeWorker';
import { runSweep } from '../../src/compute/engine/runSweep';
import { type SpawnWorker, WorkerPool } from '../../src/compute/engine/workerPool';
import { parseRideFile, solveRide } from '../../src/compute/ride/index';
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

  it('ends an idle worker by itself (exit code 0) and a busy one at once (code 1)', async () => {
    // Node 20 can abort the process when worker.terminate() tears down a thread that V8 is still
    // optimising code for (see nodeWorker.ts): an idle worker leaves its event loop on its own instead.
    const spawn = nodeWorkerSpawner();
    const idle = spawn();
    await idle.api.ping();
    idle.terminate();
    const idleExit = await idle.failed.catch((err: Error) => err.message);
    expect(idleExit, 'idle worker: got this exit, expected code 0').toMatch(/code 0/);

    const busy = spawn();
    await busy.api.ping();
    const [heavy] = smallSweep([0], [0.04]).map((c) => ({
      ...c,
      options: { ...c.options, latticeSpanCount: 48, latticeChordCount: 20 },
    }));
    const job = busy.api.solveJob({ jobId: 1, cases: [{ caseIndex: 0, input: heavy! }] });
    job.catch(() => undefined);
    busy.terminate();
    const busyExit = await busy.failed.catch((err: Error) => err.message);
    expect(busyExit, 'busy worker: got this exit, expected code 1 (terminated)').toMatch(/code 1/);
  }, 60_000);

  it('runs a task (a ride, its code loaded in the worker on first use) with the same numbers as here', async () => {
    const parsed = parseRideFile(
      readFileSync(new URL('../../public/examples/ride.json', import.meta.url), 'utf8'),
    );
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const pool = new WorkerPool(nodeWorkerSpawner(), 1);
    const out = await pool.runTask({ kind: 'ride', request: { ride: parsed.value } });
    pool.close();
    if (out.status !== 'done') throw new Error(JSON.stringify(out));
    expect(out.value.curvesReused).toBe(false);
    expect(out.value.document).toEqual(solveRide(parsed.value));
  }, 60_000);
});
