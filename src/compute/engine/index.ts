export { BoundedCache } from './boundedCache';
export { FLAG_CODES, POINT_COLUMN_COUNT, POINT_COLUMNS, packPoints, unpackPoints } from './packPoints';
export { type PlanJobsOptions, planJobs } from './planJobs';
export type * from './protocol';
export { type RunSweepOptions, runSweep, type SweepOutcome, type SweepProgress } from './runSweep';
export { solveJob, transferablesOf } from './solveJob';
export { type ChannelOutcome, type ChannelRunOptions, TaskChannel, type TaskRunner } from './taskChannel';
export { type TaskOutcome, type TaskRunOptions, TaskWorkers } from './taskWorkers';
export {
  type PoolOptions,
  type PoolRunOptions,
  type PoolRunSummary,
  type SpawnWorker,
  type WorkerHandle,
  WorkerPool,
} from './workerPool';
