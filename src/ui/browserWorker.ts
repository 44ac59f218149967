/**
 * The page's Web Workers, wrapped by comlink: the pool's solver workers (workers/solver.worker.ts: the
 * sweeps and the tasks, the data panel's too). `failed` rejects when a worker reports an uncaught error
 * or cannot load, or when `crash()` stops it (the page's test hook for a worker dying mid-sweep, and the
 * watchdog's way to stop a hung one: terminate() alone would leave a call waiting forever, as a real
 * crash does not).
 */
import { type Remote, wrap } from 'comlink';
import type { SolverApi } from '../compute/engine/protocol';
import type { WorkerHandle } from '../compute/engine/workerPool';

export interface BrowserWorkerHandle extends WorkerHandle {
  /** The worker's own interface (`api` may be wrapped, e.g. by the watchdog). */
  readonly rawApi: Remote<SolverApi>;
  /** Stop the worker as if it had crashed: terminate it and reject `failed` (with `reason`). */
  crash(reason?: string): void;
}

function watch(worker: Worker, what: string): { failed: Promise<never>; reject: (error: Error) => void } {
  let reject: (error: Error) => void = () => undefined;
  const failed = new Promise<never>((_, fail) => {
    reject = fail;
    worker.addEventListener('error', (event) => {
      event.preventDefault();
      fail(new Error(`${what} failed: ${event.message || 'could not load or crashed'}`));
    });
    worker.addEventListener('messageerror', () => fail(new Error(`${what} sent an unreadable message`)));
  });
  failed.catch(() => undefined);
  return { failed, reject };
}

export function spawnBrowserWorker(): BrowserWorkerHandle {
  const worker = new Worker(new URL('../../workers/solver.worker.ts', import.meta.url), { type: 'module' });
  const { failed, reject } = watch(worker, 'solver worker');
  const api = wrap<SolverApi>(worker);
  return {
    api,
    rawApi: api,
    failed,
    terminate: () => worker.terminate(),
    crash: (reason = 'solver worker stopped (crashed)') => {
      worker.terminate();
      reject(new Error(reason));
    },
  };
}
