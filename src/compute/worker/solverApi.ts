import { transfer } from 'comlink';
import type { SolverApi } from '../engine/protocol';
import { solveJob, surfaceCache, transferablesOf } from '../engine/solveJob';
import { runTask } from './runTask';

/**
 * The API a solver worker exposes (workers/solver.worker.ts in the browser, solver.node.ts in Node):
 * the sweeps' jobs and the tasks (runTask.ts), results going back with their buffers transferred.
 */
export const solverApi: SolverApi = {
  solveJob: (job) => {
    const result = solveJob(job);
    return transfer(result, transferablesOf(result));
  },
  ping: () => 'ready',
  runTask: (task, onProgress) => runTask(task, onProgress, surfaceCache),
};
