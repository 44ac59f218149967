/**
 * A watchdog for the page's solver workers. A worker that throws or closes is already noticed (its
 * `failed` promise rejects and the pool replaces it and retries the job once); one stuck in a loop says
 * nothing, so each job gets a deadline scaled by its size. Past it, the worker is stopped as if it had
 * crashed: the pool replaces it and retries the job once on a fresh worker, and reports the job if it
 * hangs again. The listener (the page) says so in the status line.
 *
 * The deadline is generous on purpose (a slow or busy machine must never see a healthy job killed):
 * 20 s plus ten times a pessimistic estimate of the job's work: the lattice factorisation (n^3 / 3
 * flops for n panels, Golub & Van Loan, Matrix Computations, LU cost) at 10^8 flop/s, three lattices
 * when a grid-convergence estimate is asked for, and 5 ms per operating point.
 */
import type { Remote } from 'comlink';
import type { SolveJob, SolverApi } from '../compute/engine/protocol';
import type { BrowserWorkerHandle } from './browserWorker';

export const WATCHDOG_BASE_MS = 20_000;
const FLOPS_PER_S = 1e8;
const MS_PER_POINT = 5;

/** The deadline (ms) of a solver job: 20 s plus ten times its estimated work. */
export function jobDeadlineMs(job: SolveJob): number {
  let estimateMs = 0;
  for (const c of job.cases) {
    const o = c.input.options;
    const panels = Math.max(1, o.latticeSpanCount * o.latticeChordCount);
    const lattices = o.gridConvergence ? 3 : 1;
    estimateMs += (1000 * lattices * panels ** 3) / 3 / FLOPS_PER_S + MS_PER_POINT * c.input.points.length;
  }
  return WATCHDOG_BASE_MS + 10 * estimateMs;
}

export interface HangReport {
  /** Designs in the job that got no answer. */
  cases: number;
  deadlineMs: number;
}

type HangListener = (report: HangReport) => void;
let listener: HangListener = () => undefined;

/** The page's listener for hung workers (one: the app's status line). */
export function onWorkerHang(fn: HangListener): void {
  listener = fn;
}

/** The deadline of a worker's jobs, overridden for one worker by the test hook. */
const overrides = new WeakMap<BrowserWorkerHandle, number>();
export function overrideDeadline(h: BrowserWorkerHandle, ms: number): void {
  overrides.set(h, ms);
}

/** Put a deadline on every solver job sent to `h` (its `api.solveJob` is wrapped; the rest unchanged). */
export function watchSolver(h: BrowserWorkerHandle): void {
  const raw = h.api;
  // A worker stopped on purpose (a cancelled run, a replaced worker) is not hung: its timers go too.
  const timers = new Set<ReturnType<typeof setTimeout>>();
  const terminate = h.terminate;
  h.terminate = () => {
    for (const t of timers) clearTimeout(t);
    timers.clear();
    terminate();
  };
  const watched = {
    ping: () => raw.ping(),
    runTask: (...args: Parameters<SolverApi['runTask']>) => raw.runTask(...args),
    solveJob: (job: SolveJob) =>
      new Promise((resolve, reject) => {
        const deadlineMs = overrides.get(h) ?? jobDeadlineMs(job);
        const timer = setTimeout(() => {
          timers.delete(timer);
          listener({ cases: job.cases.length, deadlineMs });
          h.crash(
            `solver worker stopped answering (no answer in ${Math.round(deadlineMs / 1000)} s for a job of ${job.cases.length} design${job.cases.length === 1 ? '' : 's'})`,
          );
        }, deadlineMs);
        timers.add(timer);
        const done = () => {
          clearTimeout(timer);
          timers.delete(timer);
        };
        raw.solveJob(job).then(
          (value) => {
            done();
            resolve(value);
          },
          (error: unknown) => {
            done();
            reject(error);
          },
        );
      }),
  };
  h.api = watched as unknown as Remote<SolverApi>;
}
