/**
 * Nelder-Mead simplex search (J. A. Nelder & R. Mead 1965, "A simplex method for function minimization",
 * Computer Journal 7, 308-313), in the form of J. C. Lagarias, J. A. Reeds, M. H. Wright & P. E. Wright
 * 1998, "Convergence properties of the Nelder-Mead simplex method in low dimensions", SIAM J. Optim. 9,
 * 112-147: reflection 1, expansion 2, contraction 1/2 (outside and inside), shrink 1/2, with their
 * tie-breaking (a new vertex goes after the vertices it ties with).
 *
 * The method only ever compares values, never does arithmetic on them, so it takes a strict order
 * (`better`) instead of numbers: a constrained problem can use a feasibility order (constraintOrder.ts).
 * Variables live in the unit box [0, 1]^n: every trial point is projected onto it (clamped) before it
 * is evaluated. Deterministic: no random numbers.
 */

export interface NelderMeadOptions {
  /** Edge of the initial simplex along each axis (in box units). */
  step: number;
  /** Stop when every vertex lies within this distance (max norm, box units) of the best. */
  xTolerance: number;
  /** Stop after this many evaluations. */
  maxEvaluations: number;
}

export interface NelderMeadResult<T> {
  x: Float64Array;
  value: T;
  evaluations: number;
  /** True when the simplex shrank below xTolerance (false: stopped by the evaluation budget). */
  converged: boolean;
}

interface Vertex<T> {
  x: Float64Array;
  value: T;
}

function clampToBox(x: Float64Array): Float64Array {
  for (let i = 0; i < x.length; i++) x[i] = Math.min(1, Math.max(0, x[i]!));
  return x;
}

/**
 * Minimise over the unit box from `start` (projected onto the box).
 *
 * @throws RangeError when start is empty or outside finite numbers, or an option is out of range.
 */
export function nelderMead<T>(
  start: Float64Array,
  evaluate: (x: Float64Array) => T,
  better: (a: T, b: T) => boolean,
  options: NelderMeadOptions,
): NelderMeadResult<T> {
  const n = start.length;
  if (n < 1 || !start.every(Number.isFinite)) {
    throw new RangeError(`start=[${[...start].join(', ')}]: must hold at least one finite number`);
  }
  if (!(options.step > 0 && options.step <= 1))
    throw new RangeError(`options.step=${options.step}: must be in (0, 1]`);
  if (!(options.xTolerance > 0))
    throw new RangeError(`options.xTolerance=${options.xTolerance}: must be > 0`);
  if (!(Number.isInteger(options.maxEvaluations) && options.maxEvaluations >= n + 1)) {
    throw new RangeError(`options.maxEvaluations=${options.maxEvaluations}: must be an integer >= ${n + 1}`);
  }
  let evaluations = 0;
  const at = (x: Float64Array): Vertex<T> => {
    evaluations++;
    return { x, value: evaluate(x) };
  };
  const x0 = clampToBox(Float64Array.from(start));
  const simplex: Vertex<T>[] = [at(x0)];
  for (let i = 0; i < n; i++) {
    const x = Float64Array.from(x0);
    x[i] = x0[i]! + options.step <= 1 ? x0[i]! + options.step : x0[i]! - options.step;
    simplex.push(at(clampToBox(x)));
  }
  // Stable insertion order: a vertex goes after every vertex it does not beat (Lagarias et al.'s rule).
  const sortSimplex = () => {
    for (let i = 1; i < simplex.length; i++) {
      const v = simplex[i]!;
      let j = i - 1;
      while (j >= 0 && better(v.value, simplex[j]!.value)) {
        simplex[j + 1] = simplex[j]!;
        j--;
      }
      simplex[j + 1] = v;
    }
  };
  const point = (c: Float64Array, toward: Float64Array, t: number) => {
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) x[i] = c[i]! + t * (toward[i]! - c[i]!);
    return clampToBox(x);
  };
  const size = () => {
    let s = 0;
    const b = simplex[0]!.x;
    for (let k = 1; k <= n; k++)
      for (let i = 0; i < n; i++) s = Math.max(s, Math.abs(simplex[k]!.x[i]! - b[i]!));
    return s;
  };
  sortSimplex();
  let converged = size() <= options.xTolerance;
  while (!converged && evaluations + 2 <= options.maxEvaluations) {
    const worst = simplex[n]!;
    const centroid = new Float64Array(n);
    for (let k = 0; k < n; k++) for (let i = 0; i < n; i++) centroid[i]! += simplex[k]!.x[i]! / n;
    const r = at(point(centroid, worst.x, -1));
    let accepted: Vertex<T> | null = null;
    if (better(r.value, simplex[0]!.value)) {
      const e = at(point(centroid, worst.x, -2));
      accepted = better(e.value, r.value) ? e : r;
    } else if (better(r.value, simplex[n - 1]!.value)) {
      accepted = r;
    } else if (better(r.value, worst.value)) {
      const c = at(point(centroid, worst.x, -0.5));
      if (!better(r.value, c.value)) accepted = c;
    } else {
      const c = at(point(centroid, worst.x, 0.5));
      if (better(c.value, worst.value)) accepted = c;
    }
    if (accepted !== null) {
      simplex[n] = accepted;
    } else {
      // Shrink toward the best vertex.
      const best = simplex[0]!.x;
      for (let k = 1; k <= n && evaluations < options.maxEvaluations; k++) {
        simplex[k] = at(point(best, simplex[k]!.x, 0.5));
      }
    }
    sortSimplex();
    converged = size() <= options.xTolerance;
  }
  return { x: simplex[0]!.x, value: simplex[0]!.value, evaluations, converged };
}
