import { describe, expect, it } from 'vitest';
import { luFactor } from '../../../src/model/numeric/luFactor';
import { luSolve } from '../../../src/model/numeric/luSolve';
import { luWorkspace } from '../../../src/model/numeric/luWorkspace';
import { matVec, norm2, seededMatrix, seededUniform } from './seeded';

const EPS = Number.EPSILON;

/** Rebuilds P A from the packed factors: L U, then undoes the interchanges in reverse order. */
function reconstruct(lu: Float64Array, n: number, pivots: Int32Array): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      const kMax = Math.min(i, j);
      for (let k = 0; k <= kMax; k++) {
        const l = k === i ? 1 : lu[i * n + k]!;
        s += l * lu[k * n + j]!;
      }
      out[i * n + j] = s;
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    const p = pivots[k]!;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = out[k * n + j]!;
        out[k * n + j] = out[p * n + j]!;
        out[p * n + j] = t;
      }
    }
  }
  return out;
}

/** Unblocked right-looking LU with partial pivoting, row by row (Golub & Van Loan alg. 3.4.1). */
function unblockedLu(a: Float64Array, n: number, pivots: Int32Array): void {
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]!) > Math.abs(a[p * n + k]!)) p = i;
    pivots[k] = p;
    for (let j = 0; j < n; j++) {
      const t = a[k * n + j]!;
      a[k * n + j] = a[p * n + j]!;
      a[p * n + j] = t;
    }
    for (let i = k + 1; i < n; i++) {
      const l = a[i * n + k]! / a[k * n + k]!;
      a[i * n + k] = l;
      for (let j = k + 1; j < n; j++) a[i * n + j]! -= l * a[k * n + j]!;
    }
  }
}

describe('luFactor', () => {
  it('solves the textbook 3x3 system (Strang, Introduction to Linear Algebra, ch. 2 elimination example, from memory)', () => {
    // 2u + v + w = 5, 4u - 6v = -2, -2u + 7v + 2w = 9  ->  u = 1, v = 1, w = 2.
    const a = Float64Array.from([2, 1, 1, 4, -6, 0, -2, 7, 2]);
    const b = Float64Array.from([5, -2, 9]);
    const pivots = new Int32Array(3);
    luFactor(a, 3, pivots);
    luSolve(a, 3, pivots, b);
    const expected = [1, 1, 2];
    const tol = 16 * EPS;
    for (let i = 0; i < 3; i++) {
      const err = Math.abs(b[i]! - expected[i]!);
      expect(err, `x[${i}] got=${b[i]} expected=${expected[i]} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
    // Partial pivoting picks the largest |a_i0| = 4 (row 1) first.
    expect(pivots[0], `pivots[0] got=${pivots[0]} expected=1`).toBe(1);
  });

  it('needs pivoting for a zero leading entry (permutation matrix, exact)', () => {
    const a = Float64Array.from([0, 1, 1, 0]);
    const b = Float64Array.from([3, 7]);
    const pivots = new Int32Array(2);
    luFactor(a, 2, pivots);
    luSolve(a, 2, pivots, b);
    expect(b[0], `x0 got=${b[0]} expected=7`).toBe(7);
    expect(b[1], `x1 got=${b[1]} expected=3`).toBe(3);
  });

  it('reproduces P A = L U across block boundaries (relative error within 1e3 n eps)', () => {
    for (const n of [1, 2, 7, 8, 9, 31, 32, 33, 47, 48, 49, 65, 97, 130, 161]) {
      const a = seededMatrix(n, 1000 + n, 0);
      const lu = Float64Array.from(a);
      const pivots = new Int32Array(n);
      luFactor(lu, n, pivots);
      const pa = reconstruct(lu, n, pivots);
      let err = 0;
      let scale = 0;
      for (let i = 0; i < n * n; i++) {
        err = Math.max(err, Math.abs(pa[i]! - a[i]!));
        scale = Math.max(scale, Math.abs(a[i]!));
      }
      const tol = 1e3 * n * EPS * scale;
      expect(err, `n=${n} max|LU - PA| got=${err} expected=0 tol=${tol}`).toBeLessThanOrEqual(tol);
      for (let k = 0; k < n; k++) {
        for (let i = k + 1; i < n; i++) {
          // Partial pivoting bounds the multipliers: |l_ik| <= 1 (Golub & Van Loan sec. 3.4.3).
          expect(Math.abs(lu[i * n + k]!), `n=${n} |l[${i},${k}]|`).toBeLessThanOrEqual(1);
        }
      }
    }
  });

  it('solves random well-conditioned systems: ||Ax - b|| / ||b|| within 1e3 n eps', () => {
    for (const n of [5, 48, 100, 200]) {
      const a = seededMatrix(n, 7 * n + 3, 0.5 * Math.sqrt(n));
      const xTrue = seededMatrix(1, 99 + n, 0).subarray(0, 1);
      const x0 = new Float64Array(n);
      for (let i = 0; i < n; i++) x0[i] = Math.sin(i + xTrue[0]!);
      const b = matVec(a, n, x0);
      const lu = Float64Array.from(a);
      const pivots = new Int32Array(n);
      luFactor(lu, n, pivots);
      const x = luSolve(lu, n, pivots, Float64Array.from(b));
      const r = matVec(a, n, x);
      for (let i = 0; i < n; i++) r[i]! -= b[i]!;
      const rel = norm2(r) / norm2(b);
      const tol = 1e3 * n * EPS;
      expect(rel, `n=${n} residual got=${rel} expected=0 tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });

  it('recovers exactly representable factors bit for bit across block boundaries (invariant, tolerance 0)', () => {
    // A = L U with L unit lower triangular, |l_ij| in {0, 1/4, 1/2} < 1, and U with a power-of-two
    // diagonal (+-8 or +-16) and small integers above it. Every product and partial sum is a dyadic
    // rational far inside 53 bits, so elimination is exact in any summation order, and partial
    // pivoting picks the diagonal (|l| < 1 below it): the factors come back exactly, no interchange.
    const n = 100;
    const next = seededUniform(4242);
    const l = new Float64Array(n * n);
    const u = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      l[i * n + i] = 1;
      for (let j = 0; j < i; j++) l[i * n + j] = [0, 0.25, -0.25, 0.5, -0.5][Math.floor(next() * 5)]!;
      u[i * n + i] = [8, -8, 16, -16][Math.floor(next() * 4)]!;
      for (let j = i + 1; j < n; j++) u[i * n + j] = Math.floor(next() * 9) - 4;
    }
    const a = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        let s = 0;
        for (let k = 0; k <= Math.min(i, j); k++) s += l[i * n + k]! * u[k * n + j]!;
        a[i * n + j] = s;
      }
    }
    const pivots = new Int32Array(n);
    luFactor(a, n, pivots);
    for (let i = 0; i < n; i++) {
      expect(pivots[i], `pivots[${i}] got=${pivots[i]} expected=${i}`).toBe(i);
      for (let j = 0; j < n; j++) {
        const expected = j < i ? l[i * n + j]! : u[i * n + j]!;
        const got = a[i * n + j]!;
        expect(
          Math.abs(got - expected),
          `n=${n} factor[${i},${j}] got=${got} expected=${expected} tol=0`,
        ).toBe(0);
      }
    }
  });

  it('matches the unblocked algorithm (Golub & Van Loan alg. 3.4.1): same pivots, factors within n eps max|A| / min|u_kk|', () => {
    // Blocking only reorders the sums of the Schur complements, so the factors agree to rounding:
    // U within n eps max|A|, L within that divided by the smallest pivot |u_kk| (observed: at most
    // 0.054 of that for n = 33, 100, 288).
    for (const n of [33, 100, 288]) {
      const a = seededMatrix(n, 31 * n + 5, 0.5 * Math.sqrt(n));
      const blocked = Float64Array.from(a);
      const reference = Float64Array.from(a);
      const pBlocked = new Int32Array(n);
      const pReference = new Int32Array(n);
      luFactor(blocked, n, pBlocked);
      unblockedLu(reference, n, pReference);
      let scale = 0;
      for (const v of a) scale = Math.max(scale, Math.abs(v));
      let minPivot = Number.POSITIVE_INFINITY;
      for (let k = 0; k < n; k++) minPivot = Math.min(minPivot, Math.abs(reference[k * n + k]!));
      const tolU = n * EPS * scale;
      const tolL = tolU / minPivot;
      for (let k = 0; k < n; k++) {
        expect(pBlocked[k], `n=${n} pivots[${k}] got=${pBlocked[k]} expected=${pReference[k]}`).toBe(
          pReference[k],
        );
      }
      // The worst entry relative to its tolerance, reported with its place.
      let worst = { excess: 0, i: 0, j: 0, tol: tolU };
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          const tol = j < i ? tolL : tolU;
          const excess = Math.abs(blocked[i * n + j]! - reference[i * n + j]!) / tol;
          if (excess > worst.excess) worst = { excess, i, j, tol };
        }
      }
      const { i, j, tol } = worst;
      const got = blocked[i * n + j]!;
      const expected = reference[i * n + j]!;
      expect(
        Math.abs(got - expected),
        `n=${n} worst factor[${i},${j}] got=${got} expected=${expected} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('throws a clear error for a singular matrix', () => {
    const a = Float64Array.from([1, 2, 3, 2, 4, 6, 1, 0, 1]); // row 2 = 2 row 1
    expect(() => luFactor(a, 3, new Int32Array(3))).toThrow(/singular/);
    const z = new Float64Array(4);
    expect(() => luFactor(z, 2, new Int32Array(2))).toThrow(/singular/);
  });

  it('checks its arguments', () => {
    expect(() => luFactor(new Float64Array(3), 2, new Int32Array(2))).toThrow(/a.length=3/);
    expect(() => luFactor(new Float64Array(4), 2, new Int32Array(1))).toThrow(/pivots.length=1/);
    expect(() => luFactor(new Float64Array(4), 0, new Int32Array(1))).toThrow(/n=0/);
    expect(() => luFactor(Float64Array.from([1, Number.NaN, 0, 1]), 2, new Int32Array(2))).toThrow(
      /singular|finite/,
    );
  });

  it("factorises luWorkspace's matrix where it lies to the bits of a copy's factors and pivots (tolerance 0)", () => {
    for (const n of [16, 45, 97, 288]) {
      const work = luWorkspace(n);
      if (work === null) return; // no WebAssembly SIMD here: luFactor runs TypeScript on any array
      const a = seededMatrix(n, 7 * n + 1, 0.5);
      const copy = Float64Array.from(a);
      const copyPivots = new Int32Array(n);
      luFactor(copy, n, copyPivots);
      work.set(a);
      const pivots = new Int32Array(n);
      luFactor(work, n, pivots);
      expect(pivots).toEqual(copyPivots);
      expect(Buffer.from(work.buffer, 0, 8 * n * n).equals(Buffer.from(copy.buffer))).toBe(true);
      // And solves from there: the bits of the copy's solution.
      const b = Float64Array.from({ length: n }, (_, i) => Math.sin(i + 1));
      const x = luSolve(work, n, pivots, Float64Array.from(b));
      expect(x).toEqual(luSolve(copy, n, copyPivots, Float64Array.from(b)));
    }
    expect(luWorkspace(8)).toBeNull(); // below the kernel's order luFactor keeps to TypeScript
    const work = luWorkspace(20);
    if (work === null) return;
    const offset = new Float64Array(work.buffer, 8, 16 * 16);
    expect(() => luFactor(offset, 16, new Int32Array(16))).toThrow(/luWorkspace/);
  });
});
