/**
 * Determinism across worker counts (issue 14, item 3: the pooled sweep writes cases as they arrive and
 * still gives the output in plan order): a plan whose jobs finish out of plan order gives the same
 * bytes, CSV and JSON, in this process and on 1 and 2 worker threads.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { chunkText, writeSweep } from '../../src/cli/main';
import { nodeWorkerSpawner } from '../../src/cli/nodeWorker';
import { WorkerPool } from '../../src/compute/engine/workerPool';
import { expandPlan } from '../../src/compute/planFile';
import { family } from './tally';

const det = family('CLI: determinism across worker counts', 'test/adversarial/determinism.test.ts');
afterAll(() => det.save());

describe('determinism across worker counts', () => {
  it('in process, 1 worker and 2 workers write identical CSV and JSON', async () => {
    const plan = expandPlan({
      wheel: { rim_depth_m: [0.02, 0.05, 0.08], cover: { fraction: [1, 0.5, 0, 0.25, 0.75] } },
      conditions: { airspeed_mps: [8, 13], yaw_deg: [-10, 0, 12] },
      model: { lattice_span: 12, lattice_chord: 6, grid_convergence: false },
    });
    if (!plan.ok) throw new Error(plan.errors.join('\n'));
    const outputs: Record<string, string> = {};
    for (const workers of [0, 1, 2]) {
      const pool = workers > 0 ? new WorkerPool(nodeWorkerSpawner(), workers) : undefined;
      try {
        for (const format of ['csv', 'json'] as const) {
          let text = '';
          await writeSweep(
            plan.value,
            format,
            (t) => {
              text += chunkText(t);
            },
            undefined,
            pool,
          );
          outputs[`${format} ${workers}`] = text;
          det.tried++;
        }
      } finally {
        pool?.close();
      }
    }
    for (const format of ['csv', 'json']) {
      expect(outputs[`${format} 1`] === outputs[`${format} 0`], `${format}: 1 worker = in process`).toBe(
        true,
      );
      expect(outputs[`${format} 2`] === outputs[`${format} 0`], `${format}: 2 workers = in process`).toBe(
        true,
      );
    }
    expect(JSON.parse(outputs['json 2']!).runs.map((r: { index: number }) => r.index)).toEqual(
      Array.from({ length: 15 }, (_, i) => i),
    );
  }, 60_000);
});
