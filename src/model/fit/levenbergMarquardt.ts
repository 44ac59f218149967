/**
 * Bounded nonlinear least squares, min 1/2 sum r_i(x)^2 subject to lower <= x <= upper, by the
 * Levenberg-Marquardt method (K. Levenberg 1944, Q. Appl. Math. 2, 164-168; D. W. Marquardt 1963,
 * J. SIAM 11, 431-441) with Marquardt's diagonal scaling, (J^T J + mu diag(J^T J)) h = -J^T r, and the
 * damping update of Nielsen (K. Madsen, H. B. Nielsen & O. Tingleff 2004, "Methods for non-linear
 * least squares problems", 2nd ed., DTU, Algorithm 3.16): mu *= max(1/3, 1 - (2 rho - 1)^3) after an
 * accepted step, mu *= nu, nu *= 2 after a rejected one, rho = actual / predicted reduction.
 *
 * Bounds by projection with an active set: a parameter sitting on a bound whose descent direction
 * points outward is held fixed for that step; every trial point is clipped into the box. The Jacobian
 * is by forward differences (backward next to an upper bound) unless one is supplied. Stopping rules
 * follow MINPACK (Moré, Garbow & Hillstrom 1980, ANL-80-74): relative step, relative reduction of the
 * sum of squares, and the cosine between r and the columns of J.
 */
export interface LeastSquaresProblem {
  /** Number of residuals m. */
  residualCount: number;
  /** Writes the m residuals at `params` into `out`. */
  residuals: (params: Float64Array, out: Float64Array) => void;
  /** Optional analytic Jacobian, row-major m x n (d r_i / d x_j). */
  jacobian?: (params: Float64Array, out: Float64Array) => void;
  /** Starting point (clipped into the bounds). */
  initial: ArrayLike<number>;
  /** Bounds (default: unbounded). */
  lower?: ArrayLike<number>;
  upper?: ArrayLike<number>;
}

export interface LeastSquaresOptions {
  maxIterations?: number;
  /** Relative forward-difference step (default sqrt(machine epsilon) ~ 1.5e-8). */
  differenceStep?: number;
  /** Relative step below which the iteration stops (default 1e-10). */
  parameterTolerance?: number;
  /** Relative reduction of the sum of squares below which it stops (default 1e-14). */
  costTolerance?: number;
  /** Cosine between the residual vector and any Jacobian column below which it stops (default 1e-12). */
  gradientTolerance?: number;
}

export interface LeastSquaresResult {
  params: Float64Array;
  residuals: Float64Array;
  /** Jacobian at the solution, row-major m x n. */
  jacobian: Float64Array;
  sumOfSquares: number;
  iterations: number;
  /** Residual evaluations, including those of finite differences. */
  evaluations: number;
  converged: boolean;
  /** Why the iteration stopped. */
  reason: string;
  /** Whether each parameter ended on one of its bounds. */
  atBound: boolean[];
}

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i]! * r[i]!;
  return s;
}

/** Solves the small symmetric positive-definite system M h = b (n x n, row-major) by Cholesky; false if not SPD. */
function choleskySolve(m: Float64Array, b: Float64Array, n: number, h: Float64Array): boolean {
  const l = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    let d = m[j * n + j]!;
    for (let k = 0; k < j; k++) d -= l[j * n + k]! * l[j * n + k]!;
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    l[j * n + j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = m[i * n + j]!;
      for (let k = 0; k < j; k++) s -= l[i * n + k]! * l[j * n + k]!;
      l[i * n + j] = s / ljj;
    }
  }
  for (let i = 0; i < n; i++) {
    let s = b[i]!;
    for (let k = 0; k < i; k++) s -= l[i * n + k]! * h[k]!;
    h[i] = s / l[i * n + i]!;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = h[i]!;
    for (let k = i + 1; k < n; k++) s -= l[k * n + i]! * h[k]!;
    h[i] = s / l[i * n + i]!;
  }
  return true;
}

/**
 * @throws RangeError when the sizes, bounds or start are invalid, or the residuals are not finite at the start.
 */
export function levenbergMarquardt(
  problem: LeastSquaresProblem,
  options: LeastSquaresOptions = {},
): LeastSquaresResult {
  const m = problem.residualCount;
  const n = problem.initial.length;
  if (!Number.isInteger(m) || m < 1) throw new RangeError(`residualCount=${m}: must be a positive integer`);
  if (n < 1) throw new RangeError(`initial: must hold at least one parameter, got ${n}`);
  const maxIterations = options.maxIterations ?? 100;
  const step = options.differenceStep ?? Math.sqrt(Number.EPSILON);
  const xTol = options.parameterTolerance ?? 1e-10;
  const fTol = options.costTolerance ?? 1e-14;
  const gTol = options.gradientTolerance ?? 1e-12;
  if (!(step > 0 && step < 1)) throw new RangeError(`differenceStep=${step}: must be in (0, 1)`);
  const lo = new Float64Array(n);
  const hi = new Float64Array(n);
  const x = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    lo[j] = problem.lower ? problem.lower[j]! : Number.NEGATIVE_INFINITY;
    hi[j] = problem.upper ? problem.upper[j]! : Number.POSITIVE_INFINITY;
    if (Number.isNaN(lo[j]!) || Number.isNaN(hi[j]!) || lo[j]! > hi[j]!) {
      throw new RangeError(
        `bounds of parameter ${j}: lower=${lo[j]} upper=${hi[j]}: must satisfy lower <= upper`,
      );
    }
    const x0 = problem.initial[j]!;
    if (!Number.isFinite(x0)) throw new RangeError(`initial[${j}]=${x0}: must be finite`);
    x[j] = Math.min(hi[j]!, Math.max(lo[j]!, x0));
  }
  // Typical magnitudes for the difference step of parameters that pass through zero.
  const typical = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const width = hi[j]! - lo[j]!;
    typical[j] = Math.abs(x[j]!) > 0 ? Math.abs(x[j]!) : Number.isFinite(width) && width > 0 ? width : 1;
  }

  let evaluations = 0;
  const r = new Float64Array(m);
  const rTrial = new Float64Array(m);
  const rStep = new Float64Array(m);
  const jac = new Float64Array(m * n);
  const xTrial = new Float64Array(n);
  const candidate = new Float64Array(n);
  const evaluate = (at: Float64Array, out: Float64Array) => {
    problem.residuals(at, out);
    evaluations++;
  };
  const jacobianAt = (at: Float64Array, rAt: Float64Array) => {
    if (problem.jacobian) {
      problem.jacobian(at, jac);
      return;
    }
    for (let j = 0; j < n; j++) {
      const xj = at[j]!;
      let h = step * Math.max(Math.abs(xj), typical[j]! * 1e-3);
      if (xj + h > hi[j]!) h = -h;
      xTrial.set(at);
      xTrial[j] = xj + h;
      const hEff = xTrial[j]! - xj;
      evaluate(xTrial, rStep);
      for (let i = 0; i < m; i++) jac[i * n + j] = (rStep[i]! - rAt[i]!) / hEff;
    }
  };

  evaluate(x, r);
  let cost = sumSquares(r);
  if (!Number.isFinite(cost))
    throw new RangeError(`residuals at the start ${Array.from(x).join(', ')}: not finite`);
  jacobianAt(x, r);

  const a = new Float64Array(n * n);
  const g = new Float64Array(n);
  const free: boolean[] = new Array(n).fill(true);
  const freeIndex: number[] = [];
  const sys = new Float64Array(n * n);
  const rhs = new Float64Array(n);
  const hFree = new Float64Array(n);
  const h = new Float64Array(n);
  const normalEquations = () => {
    a.fill(0);
    g.fill(0);
    for (let i = 0; i < m; i++) {
      const ri = r[i]!;
      for (let j = 0; j < n; j++) {
        const jij = jac[i * n + j]!;
        g[j] = g[j]! + jij * ri;
        for (let k = 0; k <= j; k++) a[j * n + k] = a[j * n + k]! + jij * jac[i * n + k]!;
      }
    }
    for (let j = 0; j < n; j++) for (let k = 0; k < j; k++) a[k * n + j] = a[j * n + k]!;
  };
  normalEquations();
  let maxDiag = 0;
  for (let j = 0; j < n; j++) maxDiag = Math.max(maxDiag, a[j * n + j]!);
  let mu = 1e-3;
  let nu = 2;
  let iterations = 0;
  let converged = false;
  let reason = 'maximum iterations reached';

  const gradientSmall = (): boolean => {
    const rNorm = Math.sqrt(cost);
    if (rNorm === 0) return true;
    let worst = 0;
    for (let j = 0; j < n; j++) {
      if (!free[j]) continue;
      const colNorm = Math.sqrt(a[j * n + j]!);
      if (colNorm > 0) worst = Math.max(worst, Math.abs(g[j]!) / (colNorm * rNorm));
    }
    return worst <= gTol;
  };

  while (iterations < maxIterations) {
    iterations++;
    // Active set: parameters on a bound whose descent direction (-g) points outward stay fixed.
    freeIndex.length = 0;
    for (let j = 0; j < n; j++) {
      free[j] = !((x[j]! <= lo[j]! && g[j]! > 0) || (x[j]! >= hi[j]! && g[j]! < 0));
      if (free[j]) freeIndex.push(j);
    }
    if (freeIndex.length === 0 || gradientSmall()) {
      converged = true;
      reason =
        freeIndex.length === 0 ? 'every parameter held at a bound' : 'gradient orthogonal to the residuals';
      break;
    }
    const nf = freeIndex.length;
    for (let p = 0; p < nf; p++) {
      const jp = freeIndex[p]!;
      rhs[p] = -g[jp]!;
      for (let q = 0; q < nf; q++) sys[p * nf + q] = a[jp * n + freeIndex[q]!]!;
      const d = a[jp * n + jp]!;
      sys[p * nf + p] = d + mu * Math.max(d, 1e-12 * maxDiag, Number.MIN_VALUE);
    }
    if (!choleskySolve(sys, rhs, nf, hFree)) {
      mu *= nu;
      nu *= 2;
      continue;
    }
    h.fill(0);
    for (let p = 0; p < nf; p++) h[freeIndex[p]!] = hFree[p]!;
    let small = true;
    for (let j = 0; j < n; j++) {
      xTrial[j] = Math.min(hi[j]!, Math.max(lo[j]!, x[j]! + h[j]!));
      h[j] = xTrial[j]! - x[j]!;
      if (Math.abs(h[j]!) > xTol * (Math.abs(x[j]!) + xTol)) small = false;
    }
    if (small) {
      converged = true;
      reason = 'relative step below the parameter tolerance';
      break;
    }
    // Predicted reduction of the sum of squares from the linear model: |r|^2 - |r + J h|^2.
    let linear = 0;
    for (let i = 0; i < m; i++) {
      let v = r[i]!;
      for (let j = 0; j < n; j++) v += jac[i * n + j]! * h[j]!;
      linear += v * v;
    }
    const predicted = cost - linear;
    candidate.set(xTrial);
    evaluate(candidate, rTrial);
    const costTrial = sumSquares(rTrial);
    const rho = predicted > 0 && Number.isFinite(costTrial) ? (cost - costTrial) / predicted : -1;
    if (rho > 0) {
      const reduction = cost - costTrial;
      x.set(candidate);
      r.set(rTrial);
      const previous = cost;
      cost = costTrial;
      jacobianAt(x, r);
      normalEquations();
      for (let j = 0; j < n; j++) maxDiag = Math.max(maxDiag, a[j * n + j]!);
      mu *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
      nu = 2;
      if (reduction <= fTol * previous && predicted <= fTol * previous) {
        converged = true;
        reason = 'relative reduction of the sum of squares below the cost tolerance';
        break;
      }
    } else {
      mu *= nu;
      nu *= 2;
      if (!Number.isFinite(mu) || mu > 1e30) {
        reason = 'damping grew without finding a better point (at a minimum to working precision)';
        converged = true;
        break;
      }
    }
  }
  const atBound: boolean[] = [];
  for (let j = 0; j < n; j++) atBound.push(x[j]! <= lo[j]! || x[j]! >= hi[j]!);
  return {
    params: x,
    residuals: r,
    jacobian: jac,
    sumOfSquares: cost,
    iterations,
    evaluations,
    converged,
    reason,
    atBound,
  };
}
