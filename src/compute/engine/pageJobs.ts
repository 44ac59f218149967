/**
 * A comparison with data as one call that never throws (the result carries the messages): conversion,
 * slips, residuals, the model band and, on request, the calibration, the convergence study and the
 * input-uncertainty band (src/compute/compare). The data panel's `dataCompare` task runs the same
 * comparison on a table kept in a task worker (compute/worker/dataTasks.ts); the tasks are in tasks.ts.
 */
import { type CompareRequest, type CompareResult, runComparison } from '../compare/index';

export type { RideRequest, RideResponse } from './tasks';

/** Run a comparison (never throws for bad data: the result carries the messages). */
export function compareJob(request: CompareRequest): CompareResult {
  try {
    return runComparison(request);
  } catch (error) {
    return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
  }
}
