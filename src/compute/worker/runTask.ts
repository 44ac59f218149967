import { transfer } from 'comlink';
import type { SurfaceCoefficients } from '../../model/wheel';
import type { BoundedCache } from '../engine/boundedCache';
import type { TaskProgress, TaskRequest, TaskResult } from '../engine/tasks';
import { viewField, viewFieldTransferables } from '../engine/viewField';

/**
 * Run one task in a solver worker (tasks.ts). The 3D view's field shares the sweeps' surface cache; the
 * other kinds load their code (pageTasks.ts: rides, studies, the reference set; dataTasks.ts: the data
 * panel's tables) on first use, so the worker that starts the page's first sweep stays small. Typed
 * arrays go back transferred.
 */
export async function runTask(
  task: TaskRequest,
  onProgress: TaskProgress | undefined,
  surfaceCache: BoundedCache<string, SurfaceCoefficients>,
): Promise<TaskResult> {
  if (task.kind === 'viewField') {
    const field = viewField(task.request, surfaceCache);
    return transfer(field, viewFieldTransferables(field));
  }
  if (task.kind === 'dataRead' || task.kind === 'dataText' || task.kind === 'dataCompare') {
    const { dataTasks } = await import('./dataTasks');
    if (task.kind === 'dataRead') return dataTasks.readTable(task.ref, task.context);
    if (task.kind === 'dataText') return dataTasks.tableText(task.ref);
    return dataTasks.compareTable(task.request);
  }
  const jobs = await import('./pageTasks');
  switch (task.kind) {
    case 'ride':
      return jobs.solveRideJob(task.request);
    case 'study':
      return jobs.studyJob(task.raw, onProgress);
    case 'mapObjectives':
      return jobs.mapObjectivesJob(task.request, onProgress);
    case 'validate':
      return jobs.runValidation();
  }
}
