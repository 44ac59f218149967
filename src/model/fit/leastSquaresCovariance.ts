/**
 * Asymptotic covariance of least-squares parameters, C = s^2 (J^T J)^-1 with s^2 = SSE / (m - p),
 * p the number of free parameters (Bates & Watts 1988, Nonlinear Regression Analysis and Its
 * Applications, sec. 2.3.1; the form NIST StRD certifies its standard deviations with). Parameters
 * flagged `fixed` (e.g. held on a bound) are left out of the fit's p and get NaN rows and columns.
 * The inverse is by Cholesky factorisation (Golub & Van Loan, Matrix Computations, alg. 4.2.1).
 */
export interface LeastSquaresCovariance {
  /** n x n, row-major; NaN where undefined. */
  covariance: Float64Array;
  /** Standard errors sqrt(C_jj); NaN for fixed parameters or when J^T J is singular. */
  standardErrors: Float64Array;
  /** Degrees of freedom m - p. */
  dof: number;
  /** Residual variance s^2 = SSE / dof (NaN when dof <= 0). */
  residualVariance: number;
  /** False when J^T J of the free parameters is singular (a parameter not determined by the data). */
  determined: boolean;
}

/**
 * @param jacobian row-major m x n at the solution.
 * @throws RangeError when the sizes disagree or sumOfSquares is negative.
 */
export function leastSquaresCovariance(
  jacobian: Float64Array,
  m: number,
  n: number,
  sumOfSquares: number,
  fixed: readonly boolean[] = [],
): LeastSquaresCovariance {
  if (!Number.isInteger(m) || !Number.isInteger(n) || m < 1 || n < 1 || jacobian.length !== m * n) {
    throw new RangeError(
      `jacobian.length=${jacobian.length}, m=${m}, n=${n}: must satisfy length = m n with m, n >= 1`,
    );
  }
  if (!(sumOfSquares >= 0)) throw new RangeError(`sumOfSquares=${sumOfSquares}: must be >= 0`);
  const idx: number[] = [];
  for (let j = 0; j < n; j++) if (!fixed[j]) idx.push(j);
  const p = idx.length;
  const dof = m - p;
  const s2 = dof > 0 ? sumOfSquares / dof : Number.NaN;
  const covariance = new Float64Array(n * n).fill(Number.NaN);
  const standardErrors = new Float64Array(n).fill(Number.NaN);
  if (p === 0) return { covariance, standardErrors, dof, residualVariance: s2, determined: true };
  // Scale columns to unit norm before factorising (improves conditioning; undone afterwards).
  const scale = new Float64Array(p);
  const a = new Float64Array(p * p);
  for (let u = 0; u < p; u++) {
    for (let v = 0; v <= u; v++) {
      let s = 0;
      for (let i = 0; i < m; i++) s += jacobian[i * n + idx[u]!]! * jacobian[i * n + idx[v]!]!;
      a[u * p + v] = s;
      a[v * p + u] = s;
    }
  }
  for (let u = 0; u < p; u++) scale[u] = Math.sqrt(a[u * p + u]!) || 1;
  for (let u = 0; u < p; u++)
    for (let v = 0; v < p; v++) a[u * p + v] = a[u * p + v]! / (scale[u]! * scale[v]!);
  const l = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    let d = a[j * p + j]!;
    for (let k = 0; k < j; k++) d -= l[j * p + k]! * l[j * p + k]!;
    if (!(d > 1e-14)) return { covariance, standardErrors, dof, residualVariance: s2, determined: false };
    const ljj = Math.sqrt(d);
    l[j * p + j] = ljj;
    for (let i = j + 1; i < p; i++) {
      let s = a[i * p + j]!;
      for (let k = 0; k < j; k++) s -= l[i * p + k]! * l[j * p + k]!;
      l[i * p + j] = s / ljj;
    }
  }
  // Inverse column by column: solve L L^T x = e_c.
  const col = new Float64Array(p);
  for (let c = 0; c < p; c++) {
    for (let i = 0; i < p; i++) {
      let s = i === c ? 1 : 0;
      for (let k = 0; k < i; k++) s -= l[i * p + k]! * col[k]!;
      col[i] = s / l[i * p + i]!;
    }
    for (let i = p - 1; i >= 0; i--) {
      let s = col[i]!;
      for (let k = i + 1; k < p; k++) s -= l[k * p + i]! * col[k]!;
      col[i] = s / l[i * p + i]!;
    }
    for (let i = 0; i < p; i++) {
      covariance[idx[i]! * n + idx[c]!] = (s2 * col[i]!) / (scale[i]! * scale[c]!);
    }
  }
  for (let u = 0; u < p; u++) standardErrors[idx[u]!] = Math.sqrt(covariance[idx[u]! * n + idx[u]!]!);
  return { covariance, standardErrors, dof, residualVariance: s2, determined: true };
}
