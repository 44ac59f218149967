import { describe, expect, it } from 'vitest';
import { nelderMead } from '../../../src/compute/design/nelderMead';

const less = (a: number, b: number) => a < b;

describe('nelderMead (Nelder & Mead 1965; Lagarias et al. 1998) on the unit box', () => {
  it("Rosenbrock's function (Rosenbrock 1960): minimum 0 at (1, 1); here scaled to the box, x = 4u - 2", () => {
    const f = (u: Float64Array) => {
      const x = 4 * u[0]! - 2;
      const y = 4 * u[1]! - 2;
      return 100 * (y - x * x) ** 2 + (1 - x) ** 2;
    };
    const r = nelderMead(Float64Array.of(0.2, 0.6), f, less, {
      step: 0.1,
      xTolerance: 1e-7,
      maxEvaluations: 2000,
    });
    const got = [4 * r.x[0]! - 2, 4 * r.x[1]! - 2];
    const tol = 1e-4;
    expect(r.converged, `evaluations ${r.evaluations}`).toBe(true);
    expect(Math.abs(got[0]! - 1), `got ${got}, expected (1, 1), tolerance ${tol}`).toBeLessThan(tol);
    expect(Math.abs(got[1]! - 1), `got ${got}, expected (1, 1), tolerance ${tol}`).toBeLessThan(tol);
  });

  it('a minimum outside the box lands on its boundary (projection): (u0 - 2)^2 + (u1 - 0.3)^2 -> (1, 0.3)', () => {
    const f = (u: Float64Array) => (u[0]! - 2) ** 2 + (u[1]! - 0.3) ** 2;
    const r = nelderMead(Float64Array.of(0.5, 0.5), f, less, {
      step: 0.2,
      xTolerance: 1e-8,
      maxEvaluations: 500,
    });
    expect(r.x[0], `got ${r.x[0]}, expected 1 exactly (clamped)`).toBe(1);
    expect(Math.abs(r.x[1]! - 0.3), `got ${r.x[1]}, expected 0.3, tolerance 1e-6`).toBeLessThan(1e-6);
    for (const v of r.x) expect(v >= 0 && v <= 1).toBe(true);
  });

  it('uses only comparisons: a monotone transform of f gives the same path; the budget is kept; deterministic', () => {
    const f = (u: Float64Array) => (u[0]! - 0.7) ** 2 + 3 * (u[1]! - 0.2) ** 2 + 0.5 * u[0]! * u[1]!;
    const seen: string[] = [];
    const seenExp: string[] = [];
    const opts = { step: 0.25, xTolerance: 1e-9, maxEvaluations: 57 };
    const a = nelderMead(
      Float64Array.of(0.1, 0.9),
      (u) => {
        seen.push(u.join());
        return f(u);
      },
      less,
      opts,
    );
    const b = nelderMead(
      Float64Array.of(0.1, 0.9),
      (u) => {
        seenExp.push(u.join());
        return Math.exp(5 * f(u));
      },
      less,
      opts,
    );
    expect(seenExp).toEqual(seen);
    expect(a.evaluations).toBeLessThanOrEqual(57);
    expect(seen.length).toBe(a.evaluations);
    expect(Array.from(b.x)).toEqual(Array.from(a.x));
  });

  it('refuses a bad start or options with RangeError naming the argument', () => {
    expect(() =>
      nelderMead(new Float64Array(0), () => 0, less, { step: 0.1, xTolerance: 1e-3, maxEvaluations: 10 }),
    ).toThrow(/start/);
    expect(() =>
      nelderMead(Float64Array.of(0.5), () => 0, less, { step: 0, xTolerance: 1e-3, maxEvaluations: 10 }),
    ).toThrow(/options.step/);
    expect(() =>
      nelderMead(Float64Array.of(0.5), () => 0, less, { step: 0.1, xTolerance: 1e-3, maxEvaluations: 1 }),
    ).toThrow(/maxEvaluations/);
  });
});
