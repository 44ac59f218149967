/**
 * The one message protocol between the sweep planner and the solver workers. Only plain objects and
 * typed arrays cross the boundary; each job result's Float64Array buffer is transferred, not copied.
 */
import type { SurfaceSummary, WheelInput } from '../../model/wheel';

/** One case of a sweep: a wheel, its model options and steering, and its operating points. */
export interface SweepCase {
  /** Position of the case in the sweep; results are placed by it, whatever finishes first. */
  caseIndex: number;
  input: WheelInput;
}

export interface SolveJob {
  jobId: number;
  cases: SweepCase[];
}

/** A solved case: its surface summary and its points packed row by row (POINT_COLUMNS). */
export interface SolvedCase {
  caseIndex: number;
  ok: true;
  surface: SurfaceSummary;
  pointCount: number;
  /** pointCount x POINT_COLUMN_COUNT values, row-major. */
  packed: Float64Array;
}

export interface FailedCase {
  caseIndex: number;
  ok: false;
  error: string;
}

export type CaseOutcome = SolvedCase | FailedCase;

export interface JobResult {
  jobId: number;
  outcomes: CaseOutcome[];
}

/** What a solver worker offers (workers/ expose exactly this). */
export interface SolverApi {
  solveJob(job: SolveJob): JobResult;
  /** Answers once the worker has loaded; used to warm a pool. */
  ping(): string;
}
