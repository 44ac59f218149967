/**
 * The page's spawn function for the worker pool: a module Web Worker running workers/solver.worker.ts,
 * wrapped by comlink. `failed` rejects when the worker reports an uncaught error or cannot load.
 */
import { wrap } from 'comlink';
import type { SolverApi } from '../compute/engine/protocol';
import type { WorkerHandle } from '../compute/engine/workerPool';

export function spawnBrowserWorker(): WorkerHandle {
  const worker = new Worker(new URL('../../workers/solver.worker.ts', import.meta.url), { type: 'module' });
  const api = wrap<SolverApi>(worker);
  const failed = new Promise<never>((_, reject) => {
    worker.addEventListener('error', (event) => {
      event.preventDefault();
      reject(new Error(`solver worker failed: ${event.message || 'could not load or crashed'}`));
    });
    worker.addEventListener('messageerror', () =>
      reject(new Error('solver worker sent an unreadable message')),
    );
  });
  failed.catch(() => undefined);
  return {
    api,
    failed,
    terminate: () => worker.terminate(),
  };
}
