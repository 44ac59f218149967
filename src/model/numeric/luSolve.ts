/**
 * Solves A x = b in place (b is overwritten by x) from the factors written by `luFactor`:
 * row interchanges in order, forward substitution with the unit lower triangle, back
 * substitution with the upper triangle (Golub & Van Loan, Matrix Computations, 4th ed., sec. 3.1
 * and 3.4.4).
 */
export function luSolve(lu: Float64Array, n: number, pivots: Int32Array, rhs: Float64Array): Float64Array {
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`luSolve: n=${n} must be a positive integer`);
  }
  if (lu.length < n * n) {
    throw new RangeError(`luSolve: lu.length=${lu.length} must be at least n*n=${n * n}`);
  }
  if (pivots.length < n) {
    throw new RangeError(`luSolve: pivots.length=${pivots.length} must be at least n=${n}`);
  }
  if (rhs.length < n) {
    throw new RangeError(`luSolve: rhs.length=${rhs.length} must be at least n=${n}`);
  }
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      const t = rhs[k]!;
      rhs[k] = rhs[p]!;
      rhs[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    const ri = i * n;
    let s = rhs[i]!;
    for (let j = 0; j < i; j++) s -= lu[ri + j]! * rhs[j]!;
    rhs[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * n;
    let s = rhs[i]!;
    for (let j = i + 1; j < n; j++) s -= lu[ri + j]! * rhs[j]!;
    rhs[i] = s / lu[ri + i]!;
  }
  return rhs;
}
