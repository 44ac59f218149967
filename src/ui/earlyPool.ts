/**
 * The solver workers, started as soon as the page's script runs (this module is evaluated with
 * main.ts, before the page is built), so that they load while the page builds its controls: the first
 * results wait for a worker, not for the page. Every solver job has a deadline (watchdog.ts): a hung
 * worker is stopped, replaced and its job retried once. Every live worker is tracked for the page's test
 * hooks (browser tests only) that crash or hang one mid-sweep.
 */
import { WorkerPool } from '../compute/engine/workerPool';
import { type BrowserWorkerHandle, spawnBrowserWorker } from './browserWorker';
import { overrideDeadline, watchSolver } from './watchdog';

/** When the page's script started (ms after navigation start), for the timings the page reports. */
export const scriptStartMs = performance.now();
performance.mark('coversweep:script');

export const liveWorkers = new Set<BrowserWorkerHandle>();

/** Spawn a solver worker and track it while it lives. */
export function spawnTracked(): BrowserWorkerHandle {
  const h = spawnBrowserWorker();
  watchSolver(h);
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
/** The task workers started (the live ones among them are in liveWorkers), for the test hook. */
const taskWorkers: BrowserWorkerHandle[] = [];

/** The sweep pool: up to four workers, one per core; and two task workers (the 3D view, ride, study). */
export const pool = new WorkerPool(
  () => {
    const h = spawnTracked();
    poolWorkers.push(h);
    return h;
  },
  Math.max(1, Math.min(4, navigator.hardwareConcurrency || 2)),
  {
    taskWorkers: 2,
    spawnTask: () => {
      const h = spawnTracked();
      taskWorkers.push(h);
      return h;
    },
  },
);

/** When every sweep worker had loaded and answered (ms after navigation start), for the timings. */
export let workersReadyMs = Number.NaN;
export const poolWarm: Promise<void> = pool.warm().then(
  () => {
    workersReadyMs = performance.now();
    performance.mark('coversweep:workers-ready');
  },
  () => undefined,
);

/** The most recently started live sweep worker, if any (for the test hooks). */
function lastLivePoolWorker(): BrowserWorkerHandle | null {
  for (let i = poolWorkers.length - 1; i >= 0; i--) {
    const h = poolWorkers[i]!;
    if (liveWorkers.has(h)) return h;
  }
  return null;
}

/** Test hook: crash one live sweep worker (the most recently started). Returns whether one was live. */
export function crashPoolWorker(): boolean {
  const h = lastLivePoolWorker();
  if (!h) return false;
  h.crash();
  liveWorkers.delete(h);
  return true;
}

/**
 * Test hook: crash every live task worker (the data panel's parsed table goes with it; its next task
 * is read again from the source by a fresh worker). Returns how many were live.
 */
export function crashTaskWorkers(): number {
  let n = 0;
  for (const h of taskWorkers.splice(0)) {
    if (!liveWorkers.has(h)) continue;
    h.crash();
    liveWorkers.delete(h);
    n++;
  }
  return n;
}

/**
 * Test hook: make every live sweep worker hang (loop forever) on its next job, with the watchdog's
 * deadline for them cut to `deadlineMs`. Needs the test build's worker (workers/testHang.ts).
 */
export function hangPoolWorkers(deadlineMs: number): number {
  let n = 0;
  for (const h of poolWorkers) {
    if (!liveWorkers.has(h)) continue;
    overrideDeadline(h, deadlineMs);
    void (h.rawApi as unknown as { hangNextJob(): Promise<void> }).hangNextJob();
    n++;
  }
  return n;
}

/** The page's test hooks on its workers (window.coversweep in the browser tests' build only). */
export function workerTestHooks(): Record<string, unknown> {
  return { crashWorker: crashPoolWorker, crashTaskWorkers, hangWorkers: hangPoolWorkers };
}
