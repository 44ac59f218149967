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
 * A case's share of a job's work, in operating points: its points, plus the points one lattice set-up
 * (influence matrix and factorisation) is worth. A rule of thumb from the CLI's profiles of the standard
 * sweep (about 2-5 ms per lattice against 10-15 us per point), not a measured constant of every case.
 */
const CASE_SETUP_POINTS = 200;

/**
 * Group a sweep's cases into jobs so expensive work is done once: cases are ordered by their surface
 * key (lattice geometry first, so a worker's cached influence matrix keeps serving, then the boundary
 * condition, so one factorisation serves every case, yaw angle and speed that share it), cases with equal
 * keys never split across jobs, and whole groups are packed into jobs of at most 1 / (workers x
 * jobsPerWorker) of the work each. Towards the end the jobs get smaller (each at most the work left over
 * 2 x workers, down to one group: "factoring", Hummel, Schonberg & Flynn 1992), so the workers finish
 * together instead of one waiting for the other's last large job. Deterministic: the same cases give the
 * same jobs.
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
  const weightOf = (group: readonly number[]) =>
    group.reduce((w, i) => w + cases[i]!.points.length + CASE_SETUP_POINTS, 0);
  const weights = groups.map(weightOf);
  let remaining = weights.reduce((a, b) => a + b, 0);
  const targetJobs = Math.max(1, workers * jobsPerWorker);
  const groupsPerJob = Math.max(1, Math.ceil(groups.length / targetJobs));
  const capWeight = remaining / targetJobs;
  const jobs: SolveJob[] = [];
  for (let g = 0; g < groups.length; ) {
    // A job takes whole groups up to its weight (at most as many groups as a uniform plan would).
    const limit = Math.min(capWeight, remaining / (2 * workers));
    const members: number[] = [];
    let weight = 0;
    for (let n = 0; g < groups.length && n < groupsPerJob && (n === 0 || weight < limit); n++, g++) {
      members.push(...groups[g]!);
      weight += weights[g]!;
    }
    remaining -= weight;
    jobs.push({
      jobId: jobs.length,
      cases: members.map((caseIndex) => ({ caseIndex, input: cases[caseIndex]! })),
    });
  }
  return jobs;
}
