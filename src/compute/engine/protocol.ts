/**
 * The one message protocol between the sweep planner and the solver workers. Only plain objects and
 * typed arrays cross the boundary; each job result's Float64Array buffer is transferred, not copied.
 */
import type { SurfaceSummary, WheelInput } from '../../model/wheel';
import type { TaskProgress, TaskRequest, TaskResult } from './tasks';

export type * from './tasks';
export type { ViewField, ViewFieldRequest } from './viewFieldTypes';

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

/**
 * What a solver worker offers (workers/ expose exactly this): the sweeps' jobs, and one task (tasks.ts:
 * the 3D view's field, a ride, a design study, the map's ride objectives, the reference set) at a time,
 * with progress through a callback (a comlink proxy across the boundary).
 */
export interface SolverApi {
  solveJob(job: SolveJob): JobResult;
  /** Run one task; resolves with its kind's result (TaskResults). A model's RangeError rejects. */
  runTask(task: TaskRequest, onProgress?: TaskProgress): Promise<TaskResult>;
  /** Answers once the worker has loaded; used to warm a pool. */
  ping(): string;
}
