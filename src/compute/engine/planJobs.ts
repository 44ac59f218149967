import { surfaceKey, type WheelInput, wheelRadii } from '../../model/wheel';
import type { SolveJob } from './protocol';

export interface PlanJobsOptions {
  /** Workers the jobs will be dealt to; the plan makes several jobs per worker so they balance. */
  workers: number;
  /** Jobs per worker to aim for (default 8). */
  jobsPerWorker?: number;
}

function caseSurfaceKey(input: WheelInput): string {
  try {
    const p = input.points[0];
    const ratio = p ? p.groundSpeedMps / p.airspeedMps : 1;
    return surfaceKey(input.wheel, wheelRadii(input.wheel), input.options, ratio);
  } catch {
    return '~invalid'; // the worker reports the model's own message for this case
  }
}

/**
 * Group a sweep's cases into jobs so expensive work is done once: cases are ordered by their surface
 * key (lattice geometry first, so a worker's cached influence matrix keeps serving, then the boundary
 * condition, so one factorisation serves every case, yaw angle and speed that share it), cases with equal
 * keys never split across jobs, and whole groups are packed into about `workers x jobsPerWorker` jobs.
 * Deterministic: the same cases give the same jobs.
 */
export function planJobs(cases: readonly WheelInput[], options: PlanJobsOptions): SolveJob[] {
  const { workers, jobsPerWorker = 8 } = options;
  if (!(Number.isInteger(workers) && workers >= 1))
    throw new RangeError(`workers must be an integer >= 1, got ${workers}`);
  const keys = cases.map(caseSurfaceKey);
  const order = cases
    .map((_, i) => i)
    .sort((a, b) => (keys[a]! < keys[b]! ? -1 : keys[a]! > keys[b]! ? 1 : a - b));
  const groups: number[][] = [];
  for (const i of order) {
    const last = groups[groups.length - 1];
    if (last && keys[last[0]!] === keys[i]) last.push(i);
    else groups.push([i]);
  }
  const targetJobs = Math.max(1, workers * jobsPerWorker);
  const groupsPerJob = Math.max(1, Math.ceil(groups.length / targetJobs));
  const jobs: SolveJob[] = [];
  for (let g = 0; g < groups.length; g += groupsPerJob) {
    const members = groups.slice(g, g + groupsPerJob).flat();
    jobs.push({
      jobId: jobs.length,
      cases: members.map((caseIndex) => ({ caseIndex, input: cases[caseIndex]! })),
    });
  }
  return jobs;
}
