/**
 * The solver workers, started as soon as the page's script runs (this module is evaluated with
 * main.ts, before the page is built), so that they load while the page builds its controls: the first
 * results wait for a worker, not for the page. Every live worker is tracked for the page's test hook
 * that crashes one mid-sweep.
 */
import { WorkerPool } from '../compute/engine/workerPool';
import { type BrowserWorkerHandle, spawnBrowserWorker } from './browserWorker';

/** When the page's script started (ms after navigation start), for the timings the page reports. */
export const scriptStartMs = performance.now();

export const liveWorkers = new Set<BrowserWorkerHandle>();

/** Spawn a solver worker and track it while it lives. */
export function spawnTracked(): BrowserWorkerHandle {
  const h = spawnBrowserWorker();
  liveWorkers.add(h);
  const terminate = h.terminate;
  h.terminate = () => {
    liveWorkers.delete(h);
    terminate();
  };
  h.failed.catch(() => liveWorkers.delete(h));
  return h;
}

export const poolWorkers: BrowserWorkerHandle[] = [];

/** The sweep pool: up to four workers, one per core. */
export const pool = new WorkerPool(
  () => {
    const h = spawnTracked();
    poolWorkers.push(h);
    return h;
  },
  Math.max(1, Math.min(4, navigator.hardwareConcurrency || 2)),
);

/** When every sweep worker had loaded and answered (ms after navigation start), for the timings. */
export let workersReadyMs = Number.NaN;
export const poolWarm: Promise<void> = pool.warm().then(
  () => {
    workersReadyMs = performance.now();
  },
  () => undefined,
);

/** Test hook: crash one live sweep worker (the most recently started). Returns whether one was live. */
export function crashPoolWorker(): boolean {
  for (let i = poolWorkers.length - 1; i >= 0; i--) {
    const h = poolWorkers[i]!;
    if (liveWorkers.has(h)) {
      h.crash();
      liveWorkers.delete(h);
      return true;
    }
  }
  return false;
}
