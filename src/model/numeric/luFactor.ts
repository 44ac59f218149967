/**
 * LU factorisation with partial (row) pivoting, in place, of a dense row-major n x n matrix:
 * P A = L U with L unit lower triangular (stored below the diagonal) and U upper triangular.
 *
 * Algorithm: right-looking blocked LU (Golub & Van Loan, Matrix Computations, 4th ed., sec. 3.2.11
 * "block LU" with the partial pivoting of sec. 3.4; LAPACK's DGETRF organisation, with the panel
 * factorised blocked again as in LAPACK 3.6's recursive DGETRF2). On a column range c0..c1-1:
 *   for each block column k0..kEnd-1 of width `OUTER_BLOCK`:
 *     1. factorise the panel (rows k0..n-1, columns k0..kEnd-1): blocked again with width
 *        `INNER_BLOCK`, whose panels use the unblocked partial-pivoting algorithm (Golub & Van Loan
 *        alg. 3.4.1); every row interchange is applied to whole rows (all n columns) at once;
 *     2. block row of U: U12 = L11^-1 A12, a unit lower triangular solve (alg. 3.1.3, row-oriented,
 *        four rows of U12 per pass over a row);
 *     3. trailing update A22 -= L21 U12 (alg. 1.1.x gaxpy form of a matrix-matrix product): three
 *        rows of A22 at a time against four rows of U12 (12 multipliers held in registers; every U12
 *        value loaded once serves three rows, and each A22 element is loaded and stored once per four
 *        rank-1 terms).
 * Two paths give the same bits: steps 1-3 run in WebAssembly (luKernel.wat: SIMD with two f64 lanes;
 * step 3 keeps a two-row by four-column tile of A22 in registers for the whole block) where it is
 * available, on a copy of the matrix in the kernel's memory, and in plain TypeScript otherwise
 * (`path` = 'typescript' forces it). Every element receives the same IEEE-754 operations in the same
 * order on both paths (groups of four rank-1 terms summed left to right, then subtracted; then the
 * single terms), so the factors and pivots are identical. Plain scalar TypeScript gets its speed from
 * cutting loads and stores per multiply-add (register tiling) and from short panels that stay in
 * cache; measured with `npm run bench` (see README, Performance). A different block size changes the rounding of the
 * factors (summation order), not their accuracy.
 *
 * `pivots[k]` is the row swapped with row k at step k (LAPACK convention, 0-based), to be applied
 * in order k = 0..n-1 by `luSolve`. Throws for an exactly singular (or non-finite) matrix.
 */

import { type LuKernel, luKernel } from './luKernel';
import { LU_WASM_MAX_N, LU_WASM_MIN_N, luPivotsAt, LU_OUTER_BLOCK as OUTER_BLOCK } from './luWorkspace';
import { ensureMemory } from './simdInstance';

const INNER_BLOCK = 8;

export type LuPath = 'auto' | 'typescript' | 'wasm';

export function luFactor(a: Float64Array, n: number, pivots: Int32Array, path: LuPath = 'auto'): void {
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`luFactor: n=${n} must be a positive integer`);
  }
  if (a.length < n * n) {
    throw new RangeError(`luFactor: a.length=${a.length} must be at least n*n=${n * n}`);
  }
  if (pivots.length < n) {
    throw new RangeError(`luFactor: pivots.length=${pivots.length} must be at least n=${n}`);
  }
  if (path !== 'auto' && path !== 'typescript' && path !== 'wasm') {
    throw new RangeError(`luFactor: path=${String(path)} must be 'auto', 'typescript' or 'wasm'`);
  }
  const kernel =
    path === 'typescript' || (path === 'auto' && (n < LU_WASM_MIN_N || n > LU_WASM_MAX_N))
      ? null
      : luKernel();
  if (path === 'wasm' && kernel === null) {
    throw new RangeError("luFactor: path='wasm' but WebAssembly SIMD is not available here");
  }
  // The matrix, then (from byte n n 8 + 64) two rows of multipliers packed by the kernel's update,
  // then the pivots (i32) written by its panel factorisation.
  const pivotsAt = luPivotsAt(n);
  const bytes = pivotsAt + 4 * n;
  // `a` may be the kernel's own matrix (luWorkspace): factorised where it lies, no copy in or out.
  const inPlace = kernel !== null && a.buffer === kernel.memory.buffer;
  if (inPlace && (a.byteOffset !== 0 || kernel.memory.buffer.byteLength < bytes)) {
    throw new RangeError("luFactor: a view of the kernel's memory must be luWorkspace(n)'s");
  }
  if (kernel !== null && !ensureMemory(kernel.memory, bytes) && path === 'wasm') {
    throw new RangeError(`luFactor: path='wasm' but the kernel's memory cannot grow to ${bytes} bytes`);
  }
  if (kernel === null || kernel.memory.buffer.byteLength < bytes) {
    for (let i = 0; i < n * n; i++) if (!Number.isFinite(a[i]!)) throw notFinite(a, i);
    factorColumns(a, n, pivots, 0, n, OUTER_BLOCK, null, 0);
    return;
  }
  const work = inPlace ? a : new Float64Array(kernel.memory.buffer, 0, n * n);
  if (!inPlace) work.set(a.subarray(0, n * n));
  const bad = kernel.firstNonFinite(n * n);
  if (bad >= 0) throw notFinite(a, bad);
  factorColumns(work, n, pivots, 0, n, OUTER_BLOCK, kernel, pivotsAt);
  if (!inPlace) a.set(work);
  pivots.set(new Int32Array(kernel.memory.buffer, pivotsAt, n));
}

function notFinite(a: Float64Array, i: number): RangeError {
  return new RangeError(`luFactor: a[${i}]=${a[i]} must be finite`);
}

function singular(k: number, big: number): RangeError {
  return new RangeError(
    `luFactor: matrix is singular or not finite: pivot column ${k} has largest |a|=${big} (must be finite and > 0)`,
  );
}

/**
 * Blocked LU of columns c0..c1-1 (rows c0..n-1), block width `block` (steps 1-3 above); `kernel`
 * (null: TypeScript) factorises the panels (its pivots from byte `pivotsAt`) and does step 3, with
 * `a` the view of its memory.
 */
function factorColumns(
  a: Float64Array,
  n: number,
  pivots: Int32Array,
  c0: number,
  c1: number,
  block: number,
  kernel: LuKernel | null,
  pivotsAt: number,
): void {
  for (let k0 = c0; k0 < c1; k0 += block) {
    const kEnd = Math.min(k0 + block, c1);
    if (block > INNER_BLOCK) factorColumns(a, n, pivots, k0, kEnd, INNER_BLOCK, kernel, pivotsAt);
    else if (kernel === null) factorPanel(a, n, pivots, k0, kEnd);
    else {
      const k = kernel.panel(n, k0, kEnd, pivotsAt);
      if (k >= 0) throw singular(k, new Float64Array(a.buffer, n * n * 8, 1)[0]!);
    }
    if (kEnd === c1) break;
    solveBlockRow(a, n, k0, kEnd, c1, kernel);
    if (kernel === null || (kEnd - k0) % 4 !== 0) {
      updateTrailing(a, n, k0, kEnd, kEnd, n, kEnd, c1);
    } else {
      kernel.update(n, k0, kEnd, c1);
    }
  }
}

/** Unblocked partial-pivoting LU of columns k0..kEnd-1, rows k0..n-1 (Golub & Van Loan alg. 3.4.1). */
function factorPanel(a: Float64Array, n: number, pivots: Int32Array, k0: number, kEnd: number): void {
  // Largest |a_ik| of the first column; later columns' searches ride along with the elimination
  // (same rows, same order, same strict comparison as a separate pass: the same pivot).
  let p = k0;
  let big = Math.abs(a[k0 * n + k0]!);
  for (let i = k0 + 1; i < n; i++) {
    const v = Math.abs(a[i * n + k0]!);
    if (v > big) {
      big = v;
      p = i;
    }
  }
  for (let k = k0; k < kEnd; k++) {
    if (!(big > 0) || !Number.isFinite(big)) throw singular(k, big);
    pivots[k] = p;
    const rk = k * n;
    if (p !== k) {
      const rp = p * n;
      for (let j = 0; j < n; j++) {
        const t = a[rk + j]!;
        a[rk + j] = a[rp + j]!;
        a[rp + j] = t;
      }
    }
    const inv = 1 / a[rk + k]!;
    const next = k + 1;
    let nextP = next;
    let nextBig = 0;
    for (let i = next; i < n; i++) {
      const ri = i * n;
      const l = a[ri + k]! * inv;
      a[ri + k] = l;
      if (l !== 0) {
        for (let j = next; j < kEnd; j++) a[ri + j]! -= l * a[rk + j]!;
      }
      if (next < kEnd) {
        const v = Math.abs(a[ri + next]!);
        if (i === next || v > nextBig) {
          nextBig = v;
          nextP = i;
        }
      }
    }
    p = nextP;
    big = nextBig;
  }
}

/**
 * U12 = L11^-1 A12 for rows k0..kEnd-1, columns kEnd..c1-1 (unit lower triangular, row by row): in
 * the kernel when given (one call for the whole block row), else here.
 */
function solveBlockRow(
  a: Float64Array,
  n: number,
  k0: number,
  kEnd: number,
  c1: number,
  kernel: LuKernel | null,
): void {
  if (kernel !== null) kernel.blockRow(n, k0, kEnd, c1);
  else for (let i = k0 + 1; i < kEnd; i++) updateRow(a, n, i * n, k0, i, kEnd, c1);
}

/**
 * One row (starting at index ri): a[ri + j] -= sum over p = p0..p1-1 of a[ri + p] a[p n + j], for
 * columns j0..j1-1; p in groups of four summed left to right, then single p.
 */
function updateRow(
  a: Float64Array,
  n: number,
  ri: number,
  p0: number,
  p1: number,
  j0: number,
  j1: number,
): void {
  let p = p0;
  for (; p + 3 < p1; p += 4) {
    const l0 = a[ri + p]!;
    const l1 = a[ri + p + 1]!;
    const l2 = a[ri + p + 2]!;
    const l3 = a[ri + p + 3]!;
    const r0 = p * n;
    const r1 = r0 + n;
    const r2 = r1 + n;
    const r3 = r2 + n;
    for (let j = j0; j < j1; j++) {
      a[ri + j]! -= l0 * a[r0 + j]! + l1 * a[r1 + j]! + l2 * a[r2 + j]! + l3 * a[r3 + j]!;
    }
  }
  for (; p < p1; p++) {
    const l = a[ri + p]!;
    const rp = p * n;
    for (let j = j0; j < j1; j++) a[ri + j]! -= l * a[rp + j]!;
  }
}

/**
 * A22 -= L21 U12 on rows i0..i1-1 and columns j0..j1-1, inner dimension k0..kEnd-1: three rows at a
 * time, p in groups of four, then single p. Every element gets the same operations in the same
 * order whatever the row grouping (the last rows go one by one with the same groups of four), as in
 * luKernel.wat.
 */
function updateTrailing(
  a: Float64Array,
  n: number,
  k0: number,
  kEnd: number,
  i0: number,
  i1: number,
  j0: number,
  j1: number,
): void {
  let i = i0;
  for (; i + 2 < i1; i += 3) {
    const ri = i * n;
    const rs = ri + n;
    const rt = rs + n;
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
      const c0 = a[rt + p]!;
      const c1 = a[rt + p + 1]!;
      const c2 = a[rt + p + 2]!;
      const c3 = a[rt + p + 3]!;
      const r0 = p * n;
      const r1 = r0 + n;
      const r2 = r1 + n;
      const r3 = r2 + n;
      for (let j = j0; j < j1; j++) {
        const u0 = a[r0 + j]!;
        const u1 = a[r1 + j]!;
        const u2 = a[r2 + j]!;
        const u3 = a[r3 + j]!;
        a[ri + j]! -= a0 * u0 + a1 * u1 + a2 * u2 + a3 * u3;
        a[rs + j]! -= b0 * u0 + b1 * u1 + b2 * u2 + b3 * u3;
        a[rt + j]! -= c0 * u0 + c1 * u1 + c2 * u2 + c3 * u3;
      }
    }
    for (; p < kEnd; p++) {
      const la = a[ri + p]!;
      const lb = a[rs + p]!;
      const lc = a[rt + p]!;
      const rp = p * n;
      for (let j = j0; j < j1; j++) {
        const u = a[rp + j]!;
        a[ri + j]! -= la * u;
        a[rs + j]! -= lb * u;
        a[rt + j]! -= lc * u;
      }
    }
  }
  for (; i < i1; i++) updateRow(a, n, i * n, k0, kEnd, j0, j1);
}
