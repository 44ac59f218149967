import { type SurfaceCoefficients, solveWheel } from '../../model/wheel';
import { BoundedCache } from './boundedCache';
import { packPoints } from './packPoints';
import type { CaseOutcome, JobResult, SolveJob } from './protocol';

/** Surface solutions kept per worker: a sweep sorted by surface key reuses each one across its cases. */
export const surfaceCache = new BoundedCache<string, SurfaceCoefficients>(64);

/**
 * Solve every case of a job. A case that the model rejects becomes a failed outcome with the model's
 * message; the job itself never throws for bad input.
 */
export function solveJob(job: SolveJob): JobResult {
  const outcomes: CaseOutcome[] = job.cases.map(({ caseIndex, input }) => {
    try {
      const solution = solveWheel(input, surfaceCache);
      return {
        caseIndex,
        ok: true,
        surface: solution.surface,
        pointCount: solution.points.length,
        packed: packPoints(solution.points),
      };
    } catch (err) {
      return { caseIndex, ok: false, error: err instanceof Error ? err.message : String(err) };
    }
  });
  return { jobId: job.jobId, outcomes };
}

/** Buffers a job result can hand over instead of copying. */
export function transferablesOf(result: JobResult): ArrayBuffer[] {
  const buffers: ArrayBuffer[] = [];
  for (const o of result.outcomes) if (o.ok) buffers.push(o.packed.buffer as ArrayBuffer);
  return buffers;
}
