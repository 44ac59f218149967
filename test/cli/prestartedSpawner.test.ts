import { describe, expect, it } from 'vitest';
import { prestartedSpawner } from '../../src/cli/prestartedSpawner';
import type { SpawnWorker, WorkerHandle } from '../../src/compute/engine/workerPool';

/** Fake handles that record their order of creation and whether they were terminated. */
function fakeSpawn(): { spawn: SpawnWorker; made: Array<{ id: number; ended: boolean }> } {
  const made: Array<{ id: number; ended: boolean }> = [];
  const spawn: SpawnWorker = () => {
    const record = { id: made.length, ended: false };
    made.push(record);
    return {
      api: { id: record.id } as unknown as WorkerHandle['api'],
      failed: new Promise<never>(() => undefined),
      terminate: () => {
        record.ended = true;
      },
    };
  };
  return { spawn, made };
}

const idOf = (h: WorkerHandle) => (h.api as unknown as { id: number }).id;

describe('prestartedSpawner', () => {
  it('starts the workers at once, hands them out first, then spawns new ones', () => {
    const { spawn, made } = fakeSpawn();
    const early = prestartedSpawner(spawn, 2);
    expect(made).toHaveLength(2);
    expect([idOf(early.spawn()), idOf(early.spawn()), idOf(early.spawn())]).toEqual([0, 1, 2]);
    expect(made.map((m) => m.ended)).toEqual([false, false, false]);
  });

  it('release(keep) ends the workers beyond the first `keep` never handed out; release() the rest', () => {
    const { spawn, made } = fakeSpawn();
    const early = prestartedSpawner(spawn, 3);
    early.release(1);
    expect(made.map((m) => m.ended)).toEqual([false, true, true]);
    expect(idOf(early.spawn())).toBe(0);
    early.release();
    expect(made.map((m) => m.ended)).toEqual([false, true, true]);
    const { spawn: spawn2, made: made2 } = fakeSpawn();
    prestartedSpawner(spawn2, 2).release();
    expect(made2.map((m) => m.ended)).toEqual([true, true]);
  });

  it('refuses a count that is not a whole number >= 0', () => {
    expect(() => prestartedSpawner(fakeSpawn().spawn, -1)).toThrow(/count must be an integer >= 0, got -1/);
  });
});
