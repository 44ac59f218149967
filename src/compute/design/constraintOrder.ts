/**
 * Feasibility order for constrained minimisation (K. Deb 2000, "An efficient constraint handling method
 * for genetic algorithms", Computer Methods in Applied Mechanics and Engineering 186, 311-338): a
 * feasible point beats an infeasible one; of two feasible points the smaller objective wins; of two
 * infeasible points the smaller total violation wins. Needs no penalty weight. A NaN objective (not
 * computable) loses to any number.
 */

export interface Scored {
  objective: number;
  /** Sum of the limits' relative excesses, max(0, value / limit - 1); 0 when every limit holds. */
  violation: number;
}

/** Relative violation of `value <= limit` (0 when it holds; NaN values violate by 1). */
export function limitViolation(value: number, limit: number): number {
  if (Number.isNaN(value)) return 1;
  return Math.max(0, value / limit - 1);
}

/** True when a is strictly better than b. */
export function constraintBetter(a: Scored, b: Scored): boolean {
  const af = a.violation === 0;
  const bf = b.violation === 0;
  if (af !== bf) return af;
  if (!af && a.violation !== b.violation) return a.violation < b.violation;
  const an = Number.isNaN(a.objective);
  const bn = Number.isNaN(b.objective);
  if (an || bn) return !an && bn;
  return a.objective < b.objective;
}
