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

  it('makes the last jobs smaller, down to one group, and none larger than a uniform split', () => {
    // 126 cases of one surface each (rim depths x cover fractions), as the standard sweep.
    const many = smallSweep(
      Array.from({ length: 21 }, (_, i) => i * 0.05),
      [0.02, 0.035, 0.05, 0.065, 0.08, 0.09],
    );
    for (const workers of [1, 2, 4]) {
      const sizes = planJobs(many, { workers, jobsPerWorker: 8 }).map((j) => j.cases.length);
      const uniform = Math.ceil(many.length / (workers * 8));
      expect(
        sizes.reduce((a, b) => a + b, 0),
        `workers ${workers}: ${sizes}`,
      ).toBe(many.length);
      expect(Math.max(...sizes), `workers ${workers}: ${sizes}`).toBeLessThanOrEqual(uniform);
      expect(sizes.at(-1), `workers ${workers}: ${sizes}`).toBe(1);
      // Non-increasing: the factoring rule only ever shrinks a job.
      for (let k = 1; k < sizes.length; k++) {
        expect(sizes[k], `workers ${workers}: ${sizes}`).toBeLessThanOrEqual(sizes[k - 1]!);
      }
    }
  });

  it('keeps an invalid case (the worker reports its error)', () => {
    const bad = { ...cases[0]!, wheel: { ...cases[0]!.wheel, rimDepthM: 0.5 } };
    const jobs = planJobs([bad, ...cases], { workers: 1 });
    expect(jobs.flatMap((j) => j.cases).some((c) => c.caseIndex === 0)).toBe(true);
  });

  it("deals designs with lattices of their own in the cases' order (results land about in turn)", () => {
    // Every cover fraction and rim depth moves the region circles the lattice follows.
    const order = planJobs(cases, { workers: 2 }).flatMap((j) => j.cases.map((c) => c.caseIndex));
    expect(order).toEqual(cases.map((_, i) => i));
  });

  it('puts the boundary conditions of one lattice geometry next to each other, first come first', () => {
    // Other spoke counts change the boundary condition (surface key) but not the lattice.
    const [a, b] = cases;
    const spokes = (c: (typeof cases)[number], n: number) => ({ ...c, wheel: { ...c.wheel, spokeCount: n } });
    const mixed = [spokes(a!, 24), spokes(b!, 24), spokes(a!, 28), spokes(b!, 28), spokes(a!, 24)];
    const order = planJobs(mixed, { workers: 1, jobsPerWorker: 5 }).flatMap((j) =>
      j.cases.map((c) => c.caseIndex),
    );
    // a/24 with its twin (case 4), a/28, then b's two.
    expect(order).toEqual([0, 4, 2, 1, 3]);
  });
});
