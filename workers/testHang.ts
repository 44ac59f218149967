/**
 * Browser tests only (the `e2e` build mode): the solver API with one more method, `hangNextJob`, after
 * which the worker's next job loops forever without answering, as a worker stuck in a bug would. The
 * page's watchdog (src/ui/watchdog.ts) must notice, stop it and retry the job on a fresh worker. The
 * production build never includes this file.
 */
import type { SolverApi } from '../src/compute/engine/protocol';

export function withHangHook(api: SolverApi): SolverApi & { hangNextJob(): void } {
  let hang = false;
  return {
    ...api,
    solveJob: (job) => {
      if (hang) {
        const start = Date.now();
        // Busy forever (the clock read keeps the loop from being optimised away).
        while (Date.now() >= start) hang = true;
      }
      return api.solveJob(job);
    },
    hangNextJob: () => {
      hang = true;
    },
  };
}
