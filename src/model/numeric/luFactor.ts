/**
 * LU factorisation with partial (row) pivoting, in place, of a dense row-major n x n matrix:
 * P A = L U with L unit lower triangular (stored below the diagonal) and U upper triangular.
 *
 * Algorithm: right-looking blocked LU (Golub & Van Loan, Matrix Computations, 4th ed., sec. 3.2.11
 * "block LU"; LAPACK's DGETRF organisation): each block column of width BLOCK is factorised with
 * the unblocked partial-pivoting algorithm (Golub & Van Loan alg. 3.4.1), the block row of U is
 * obtained by a unit-lower triangular solve, and the trailing matrix receives one rank-BLOCK update
 * (a matrix-matrix product, done tile by tile so the block row of U stays in cache, two rows at a
 * time so every loaded U value is used twice).
 *
 * `pivots[k]` is the row swapped with row k at step k (LAPACK convention, 0-based), to be applied
 * in order k = 0..n-1 by `luSolve`. Throws for an exactly singular (or non-finite) matrix.
 */

const BLOCK = 48;
const TILE = 256;

export function luFactor(a: Float64Array, n: number, pivots: Int32Array): void {
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`luFactor: n=${n} must be a positive integer`);
  }
  if (a.length < n * n) {
    throw new RangeError(`luFactor: a.length=${a.length} must be at least n*n=${n * n}`);
  }
  if (pivots.length < n) {
    throw new RangeError(`luFactor: pivots.length=${pivots.length} must be at least n=${n}`);
  }
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(a[i]!)) {
      throw new RangeError(`luFactor: a[${i}]=${a[i]} must be finite`);
    }
  }
  for (let k0 = 0; k0 < n; k0 += BLOCK) {
    const kEnd = Math.min(k0 + BLOCK, n);
    // 1. Unblocked factorisation of the block column (rows k0..n-1, columns k0..kEnd-1).
    for (let k = k0; k < kEnd; k++) {
      let p = k;
      let big = Math.abs(a[k * n + k]!);
      for (let i = k + 1; i < n; i++) {
        const v = Math.abs(a[i * n + k]!);
        if (v > big) {
          big = v;
          p = i;
        }
      }
      if (!(big > 0) || !Number.isFinite(big)) {
        throw new RangeError(
          `luFactor: matrix is singular or not finite: pivot column ${k} has largest |a|=${big} (must be finite and > 0)`,
        );
      }
      pivots[k] = p;
      if (p !== k) {
        const rk = k * n;
        const rp = p * n;
        for (let j = 0; j < n; j++) {
          const t = a[rk + j]!;
          a[rk + j] = a[rp + j]!;
          a[rp + j] = t;
        }
      }
      const rk = k * n;
      const inv = 1 / a[rk + k]!;
      for (let i = k + 1; i < n; i++) {
        const ri = i * n;
        const l = a[ri + k]! * inv;
        a[ri + k] = l;
        if (l !== 0) {
          for (let j = k + 1; j < kEnd; j++) a[ri + j]! -= l * a[rk + j]!;
        }
      }
    }
    if (kEnd === n) break;
    // 2. Block row of U: U12 = L11^-1 A12 (unit lower triangular solve), columns kEnd..n-1.
    for (let k = k0; k < kEnd; k++) {
      const rk = k * n;
      for (let i = k + 1; i < kEnd; i++) {
        const ri = i * n;
        const l = a[ri + k]!;
        if (l === 0) continue;
        for (let j = kEnd; j < n; j++) a[ri + j]! -= l * a[rk + j]!;
      }
    }
    // 3. Trailing update A22 -= L21 U12, tile by tile over columns; two rows of A22 and four rows
    //    of U12 at a time (register blocking: each loaded U12 value serves two rows).
    for (let j0 = kEnd; j0 < n; j0 += TILE) {
      const jEnd = Math.min(j0 + TILE, n);
      let i = kEnd;
      for (; i + 1 < n; i += 2) {
        const ri = i * n;
        const rs = ri + n;
        let p = k0;
        for (; p + 3 < kEnd; p += 4) {
          const a0 = a[ri + p]!;
          const a1 = a[ri + p + 1]!;
          const a2 = a[ri + p + 2]!;
          const a3 = a[ri + p + 3]!;
          const b0 = a[rs + p]!;
          const b1 = a[rs + p + 1]!;
          const b2 = a[rs + p + 2]!;
          const b3 = a[rs + p + 3]!;
          const r0 = p * n;
          const r1 = r0 + n;
          const r2 = r1 + n;
          const r3 = r2 + n;
          for (let j = j0; j < jEnd; j++) {
            const u0 = a[r0 + j]!;
            const u1 = a[r1 + j]!;
            const u2 = a[r2 + j]!;
            const u3 = a[r3 + j]!;
            a[ri + j]! -= a0 * u0 + a1 * u1 + a2 * u2 + a3 * u3;
            a[rs + j]! -= b0 * u0 + b1 * u1 + b2 * u2 + b3 * u3;
          }
        }
        for (; p < kEnd; p++) {
          const la = a[ri + p]!;
          const lb = a[rs + p]!;
          const rp = p * n;
          for (let j = j0; j < jEnd; j++) {
            const u = a[rp + j]!;
            a[ri + j]! -= la * u;
            a[rs + j]! -= lb * u;
          }
        }
      }
      for (; i < n; i++) {
        const ri = i * n;
        for (let p = k0; p < kEnd; p++) {
          const l = a[ri + p]!;
          const rp = p * n;
          for (let j = j0; j < jEnd; j++) a[ri + j]! -= l * a[rp + j]!;
        }
      }
    }
  }
}
