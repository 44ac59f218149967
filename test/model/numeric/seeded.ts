/** Deterministic test data: a 32-bit linear congruential generator (Numerical Recipes' constants). */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

/** A random n x n matrix, entries in [-0.5, 0.5), with `diagonalShift` added to the diagonal. */
export function seededMatrix(n: number, seed: number, diagonalShift: number): Float64Array {
  const next = seededUniform(seed);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) a[i] = next() - 0.5;
  for (let i = 0; i < n; i++) a[i * n + i]! += diagonalShift;
  return a;
}

export function matVec(a: Float64Array, n: number, x: Float64Array): Float64Array {
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += a[i * n + j]! * x[j]!;
    y[i] = s;
  }
  return y;
}

export function norm2(v: Float64Array): number {
  let s = 0;
  for (const x of v) s += x * x;
  return Math.sqrt(s);
}
