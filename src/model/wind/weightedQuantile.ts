/**
 * Weighted quantile: the smallest value v of the sample such that the total weight of values <= v is at
 * least p times the total weight (the inverse of the weighted empirical distribution function;
 * Hyndman & Fan 1996, The American Statistician 50, definition 1, extended to weights).
 *
 * @throws RangeError when lengths differ, the sample is empty, p is outside [0, 1], a weight is negative,
 * or all weights are zero.
 */
export function weightedQuantile(values: Float64Array, weights: Float64Array, p: number): number {
  const n = values.length;
  if (weights.length !== n) {
    throw new RangeError(`weights.length=${weights.length}: must equal values.length=${n}`);
  }
  if (n === 0) throw new RangeError('values: must not be empty');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`p=${p}: must be within [0, 1]`);
  const order = new Array<number>(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const w = weights[i]!;
    if (!(w >= 0) || !Number.isFinite(w)) throw new RangeError(`weights[${i}]=${w}: must be finite and >= 0`);
    order[i] = i;
    total += w;
  }
  if (!(total > 0)) throw new RangeError('weights: must not all be zero');
  order.sort((a, b) => values[a]! - values[b]!);
  const target = p * total * (1 - 1e-12);
  let acc = 0;
  for (let k = 0; k < n; k++) {
    const i = order[k]!;
    acc += weights[i]!;
    if (acc >= target && weights[i]! > 0) return values[i]!;
  }
  return values[order[n - 1]!]!;
}
