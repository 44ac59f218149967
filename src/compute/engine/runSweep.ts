import type { WheelInput, WheelSolution } from '../../model/wheel';
import type { JobRunner } from './jobRunner';
import { unpackPoints } from './packPoints';
import { runCases, type SweepProgress } from './runCases';

export type { SweepProgress };

export interface SweepOutcome {
  /** One entry per case, in the order given: the solution, or null where the case failed, was not run,
   * or was not kept (keepSolutions: false). */
  solutions: Array<WheelSolution | null>;
  /** One entry per case: the failure message, or null. */
  errors: Array<string | null>;
  cancelled: boolean;
  failedCount: number;
  workersReplaced: number;
}

export interface RunSweepOptions {
  signal?: AbortSignal;
  onProgress?: (progress: SweepProgress) => void;
  /** Also called with each case as it lands (for streaming displays). */
  onCase?: (caseIndex: number, solution: WheelSolution | null, error: string | null) => void;
  jobsPerWorker?: number;
  now?: () => number;
  /** Keep every solution in the outcome (default true). A caller that streams cases through onCase
   * passes false, so memory stays bounded by the jobs in flight, not by the sweep's size. */
  keepSolutions?: boolean;
}

/**
 * Run a list of model inputs of any shapes (runCases) and return each case's solution as model points.
 * Studies with named axes use runStudies (src/compute/study), which keeps the packed numbers in a cube.
 */
export async function runSweep(
  runner: JobRunner,
  cases: readonly WheelInput[],
  options: RunSweepOptions = {},
): Promise<SweepOutcome> {
  const keep = options.keepSolutions ?? true;
  const solutions: Array<WheelSolution | null> = new Array(cases.length).fill(null);
  const errors: Array<string | null> = new Array(cases.length).fill(null);
  const summary = await runCases(runner, cases, {
    ...options,
    onOutcome: (o) => {
      const solution = o.ok ? { surface: o.surface, points: unpackPoints(o.packed, o.pointCount) } : null;
      if (solution && keep) solutions[o.caseIndex] = solution;
      if (!o.ok) errors[o.caseIndex] = o.error;
      options.onCase?.(o.caseIndex, solution, errors[o.caseIndex]!);
    },
  });
  return { solutions, errors, ...summary };
}
