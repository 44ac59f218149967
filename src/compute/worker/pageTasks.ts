/**
 * The task kinds besides the 3D view's field, loaded by a task worker on first use (runTask.ts): a ride
 * through the ride planner (study/rideJob.ts), a design study and the map's ride objectives
 * (engine/studyJobs.ts), and the reference set (validation). Nothing here is new physics: the same
 * functions as `coversweep ride`, `optimise` and `validate`.
 */
export { mapObjectivesJob, studyJob } from '../engine/studyJobs';
export { solveRideJob } from '../study/rideJob';
export { runValidation } from '../validation/runValidation';
