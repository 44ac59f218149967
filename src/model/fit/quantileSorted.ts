/**
 * Sample quantile of ascending-sorted data by linear interpolation between order statistics,
 * Hyndman & Fan (1996, The American Statistician 50(4), 361-365) definition 7 (the default of R
 * and NumPy): h = (n - 1) p, Q = x[floor h] + (h - floor h)(x[floor h + 1] - x[floor h]).
 * @throws RangeError when the data are empty or p is not in [0, 1].
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('sorted: must hold at least one value, got an empty list');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`p=${p}: must be in [0, 1]`);
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  const a = sorted[lo]!;
  const b = sorted[hi]!;
  return a + (h - lo) * (b - a);
}
