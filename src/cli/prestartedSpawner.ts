import type { SpawnWorker, WorkerHandle } from '../compute/engine/workerPool';

export interface PrestartedSpawner {
  /** Hands out the workers started ahead first, then spawns new ones. */
  spawn: SpawnWorker;
  /** Ends the workers started ahead that were never handed out, but the first `keep` (default 0). */
  release: (keep?: number) => void;
}

/**
 * Start `count` workers now, before they are needed, so their start-up (a thread, its modules, the
 * WebAssembly kernel) overlaps the main thread's own work, such as reading and expanding a plan file.
 * A worker that dies before it is handed out fails its first job, which the pool retries on a fresh one.
 */
export function prestartedSpawner(spawn: SpawnWorker, count: number): PrestartedSpawner {
  if (!(Number.isInteger(count) && count >= 0))
    throw new RangeError(`prestartedSpawner: count must be an integer >= 0, got ${count}`);
  const ready: WorkerHandle[] = [];
  for (let i = 0; i < count; i++) {
    const handle = spawn();
    // A failure before the pool takes the worker must not become an unhandled rejection.
    handle.failed.catch(() => undefined);
    ready.push(handle);
  }
  return {
    spawn: () => ready.shift() ?? spawn(),
    release: (keep = 0) => {
      for (const handle of ready.splice(keep)) handle.terminate();
    },
  };
}
