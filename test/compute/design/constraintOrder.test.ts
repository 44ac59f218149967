import { describe, expect, it } from 'vitest';
import { constraintBetter, limitViolation } from '../../../src/compute/design/constraintOrder';

// Deb 2000, "An efficient constraint handling method for genetic algorithms", the three rules.
describe("constraintBetter (Deb's feasibility rules)", () => {
  it('a feasible point beats an infeasible one, whatever the objectives', () => {
    expect(constraintBetter({ objective: 10, violation: 0 }, { objective: 1, violation: 0.01 })).toBe(true);
    expect(constraintBetter({ objective: 1, violation: 0.01 }, { objective: 10, violation: 0 })).toBe(false);
  });
  it('two feasible points: the smaller objective; two infeasible: the smaller violation', () => {
    expect(constraintBetter({ objective: 1, violation: 0 }, { objective: 2, violation: 0 })).toBe(true);
    expect(constraintBetter({ objective: 9, violation: 0.1 }, { objective: 1, violation: 0.2 })).toBe(true);
  });
  it('strict: a point is never better than itself; NaN objectives lose to numbers', () => {
    const p = { objective: 3, violation: 0 };
    expect(constraintBetter(p, p)).toBe(false);
    expect(constraintBetter({ objective: Number.NaN, violation: 0 }, p)).toBe(false);
    expect(constraintBetter(p, { objective: Number.NaN, violation: 0 })).toBe(true);
  });
  it('limitViolation is the relative excess: 0 within the limit, 0.5 at 1.5 x the limit, 1 for NaN', () => {
    expect(limitViolation(2, 2)).toBe(0);
    expect(limitViolation(3, 2)).toBe(0.5);
    expect(limitViolation(Number.NaN, 2)).toBe(1);
  });
});
