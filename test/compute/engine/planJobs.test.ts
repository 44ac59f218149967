import { describe, expect, it } from 'vitest';
import { planJobs } from '../../../src/compute/engine/planJobs';
import { surfaceKey, wheelRadii } from '../../../src/model/wheel';
import { smallSweep } from './fixtures';

describe('planJobs', () => {
  const cases = smallSweep([0, 0.25, 0.5, 0.75, 1], [0.03, 0.05, 0.07]);
  // Duplicate boundary conditions: same wheel, other air density (a case-level change).
  const withTwins = [
    ...cases,
    ...cases.map((c) => ({ ...c, points: c.points.map((p) => ({ ...p, rhoKgPerM3: 1.1 })) })),
  ];

  it('puts every case in exactly one job, deterministically', () => {
    const jobs = planJobs(withTwins, { workers: 2 });
    const seen = jobs.flatMap((j) => j.cases.map((c) => c.caseIndex)).sort((a, b) => a - b);
    expect(seen).toEqual(withTwins.map((_, i) => i));
    expect(planJobs(withTwins, { workers: 2 })).toEqual(jobs);
  });

  it('never splits cases that share a boundary condition (one factorisation serves them)', () => {
    const jobs = planJobs(withTwins, { workers: 4, jobsPerWorker: 8 });
    const jobOfKey = new Map<string, number>();
    for (const job of jobs) {
      for (const { input } of job.cases) {
        const key = surfaceKey(input.wheel, wheelRadii(input.wheel), input.options, 1);
        const prior = jobOfKey.get(key);
        if (prior !== undefined) expect(prior, `key ${key} split across jobs`).toBe(job.jobId);
        jobOfKey.set(key, job.jobId);
      }
    }
    expect(jobOfKey.size).toBe(cases.length);
  });

  it('makes several jobs per worker so the pool balances', () => {
    expect(planJobs(withTwins, { workers: 2, jobsPerWorker: 4 }).length).toBeGreaterThanOrEqual(8);
  });

  it('keeps an invalid case (the worker reports its error)', () => {
    const bad = { ...cases[0]!, wheel: { ...cases[0]!.wheel, rimDepthM: 0.5 } };
    const jobs = planJobs([bad, ...cases], { workers: 1 });
    expect(jobs.flatMap((j) => j.cases).some((c) => c.caseIndex === 0)).toBe(true);
  });
});
