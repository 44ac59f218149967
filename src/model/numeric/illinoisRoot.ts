/**
 * Root of a continuous function g on [lo, hi] with g(lo) <= 0 < g(hi), by the Illinois variant of false
 * position (M. Dowell, P. Jarratt 1971, "A modified regula falsi method for computing the root of an
 * equation", BIT 11, 168-174): the bracket always holds the root, and halving the stale end's value when
 * the same end moves twice gives superlinear convergence (order about 1.44).
 *
 * Returns lo when g(lo) >= 0. Stops when |g| < tolerance or the bracket is narrower than tolerance, or
 * after maxSteps (returning the last estimate).
 *
 * @throws RangeError for a bad bracket, a non-positive tolerance or a g(hi) that is not > 0.
 */
export function illinoisRoot(
  g: (x: number) => number,
  lo: number,
  hi: number,
  tolerance = 1e-12,
  maxSteps = 100,
): number {
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo < hi)) {
    throw new RangeError(`bracket [${lo}, ${hi}]: must be finite with lo < hi`);
  }
  if (!(tolerance > 0)) throw new RangeError(`tolerance=${tolerance}: must be > 0`);
  let a = lo;
  let b = hi;
  let ga = g(a);
  if (ga >= 0) return a;
  let gb = g(b);
  if (!(gb > 0)) throw new RangeError(`g(hi)=${gb} at hi=${hi}: must be > 0 (root not bracketed)`);
  let side = 0;
  let c = a;
  for (let step = 0; step < maxSteps; step++) {
    c = (a * gb - b * ga) / (gb - ga);
    const gc = g(c);
    if (Math.abs(gc) < tolerance || b - a < tolerance) return c;
    if (gc < 0) {
      a = c;
      ga = gc;
      if (side === -1) gb *= 0.5;
      side = -1;
    } else {
      b = c;
      gb = gc;
      if (side === 1) ga *= 0.5;
      side = 1;
    }
  }
  return c;
}
