import { surfaceKey, type WheelInput, wheelRadii } from '../../model/wheel';
import type { SolveJob } from './protocol';

export interface PlanJobsOptions {
  /** Workers the jobs will be dealt to; the plan makes several jobs per worker so they balance. */
  workers: number;
  /** Jobs per worker to aim for (default 8). */
  jobsPerWorker?: number;
}

interface CaseKeys {
  /** The boundary condition's key (surfaceKey): cases with equal keys share one factorisation. */
  surface: string;
  /** The lattice's geometry: cases with equal keys share one influence matrix (a worker's cache). */
  lattice: string;
}

function caseKeys(input: WheelInput): CaseKeys {
  try {
    const p = input.points[0];
    const ratio = p ? p.groundSpeedMps / p.airspeedMps : 1;
    const radii = wheelRadii(input.wheel);
    const { options } = input;
    // What the wheel's lattices are built from (buildWheelLattice's radius, counts, ground and region
    // circles); a fixed lattice does not follow the regions.
    const lattice = [
      radii.outerRadiusM,
      options.ground,
      options.latticeSpanCount,
      options.latticeChordCount,
      options.gridConvergence,
      ...(options.fixedLattice
        ? ['fixed']
        : [radii.rimInnerRadiusM, radii.hubRadiusM, radii.coverInnerRadiusM, radii.coverOuterRadiusM]),
    ].join('|');
    return { surface: surfaceKey(input.wheel, radii, input.options, ratio), lattice };
  } catch {
    // The worker reports the model's own message for this case.
    return { surface: '~invalid', lattice: '~invalid' };
  }
}

/**
 * A case's share of a job's work, in operating points: its points, plus the points one lattice set-up
 * (influence matrix and factorisation) is worth. A rule of thumb from the CLI's profiles of the standard
 * sweep (about 2-5 ms per lattice against 10-15 us per point), not a measured constant of every case.
 */
const CASE_SETUP_POINTS = 200;

/**
 * Group a sweep's cases into jobs so expensive work is done once: cases with equal surface keys (one
 * boundary condition: one factorisation serves every case, yaw angle and speed that share it) form a
 * group that never splits across jobs; groups whose lattices have the same geometry sit next to each
 * other (a worker's cached influence matrix keeps serving them); otherwise groups keep the cases'
 * order (each by its first case), so jobs finish roughly in the order a caller writes results (a
 * command-line sweep holds a case that finishes before its turn, and writes it at its turn). Whole
 * groups are packed into jobs of at most 1 / (workers x jobsPerWorker) of the work each. Towards the end the jobs get smaller (each at most the work left over
 * 2 x workers, down to one group: "factoring", Hummel, Schonberg & Flynn 1992), so the workers finish
 * together instead of one waiting for the other's last large job. Deterministic: the same cases give the
 * same jobs.
 */
export function planJobs(cases: readonly WheelInput[], options: PlanJobsOptions): SolveJob[] {
  const { workers, jobsPerWorker = 8 } = options;
  if (!(Number.isInteger(workers) && workers >= 1))
    throw new RangeError(`workers must be an integer >= 1, got ${workers}`);
  // Groups by surface key, each listed where its first case is; then each lattice geometry's groups
  // together, where the geometry's first case is (a stable sort keeps the cases' order otherwise).
  const byKey = new Map<string, number[]>();
  const latticeRank = new Map<string, number>();
  const groupLattice = new Map<number[], number>();
  cases.forEach((input, i) => {
    const keys = caseKeys(input);
    const group = byKey.get(keys.surface);
    if (group) {
      group.push(i);
      return;
    }
    const created = [i];
    byKey.set(keys.surface, created);
    if (!latticeRank.has(keys.lattice)) latticeRank.set(keys.lattice, latticeRank.size);
    groupLattice.set(created, latticeRank.get(keys.lattice)!);
  });
  const groups = [...byKey.values()].sort((a, b) => groupLattice.get(a)! - groupLattice.get(b)!);
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
