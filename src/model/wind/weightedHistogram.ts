/**
 * Probability density estimate by a weighted histogram: bins of equal width from 0; bin i collects the
 * weight of values in [i w, (i + 1) w) (the last bin also takes its upper edge); density = bin weight /
 * (total weight x bin width), so the densities integrate to the fraction of weight inside the bins
 * (e.g. Silverman, Density Estimation for Statistics and Data Analysis, 1986, sec. 2.2).
 * Returns the densities (per unit of the values) and the weight fraction above the last bin.
 *
 * @throws RangeError when lengths differ, binWidth is not > 0, binCount is not a positive integer,
 * a value is negative or not finite, or the weights are invalid.
 */
export function weightedHistogram(
  values: Float64Array,
  weights: Float64Array,
  binWidth: number,
  binCount: number,
): { density: Float64Array; fractionAbove: number } {
  const n = values.length;
  if (weights.length !== n)
    throw new RangeError(`weights.length=${weights.length}: must equal values.length=${n}`);
  if (!(binWidth > 0) || !Number.isFinite(binWidth))
    throw new RangeError(`binWidth=${binWidth}: must be finite and > 0`);
  if (!Number.isInteger(binCount) || binCount < 1)
    throw new RangeError(`binCount=${binCount}: must be an integer >= 1`);
  const mass = new Float64Array(binCount);
  let total = 0;
  let above = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    const w = weights[i]!;
    if (!(v >= 0) || !Number.isFinite(v)) throw new RangeError(`values[${i}]=${v}: must be finite and >= 0`);
    if (!(w >= 0) || !Number.isFinite(w)) throw new RangeError(`weights[${i}]=${w}: must be finite and >= 0`);
    total += w;
    let b = Math.floor(v / binWidth);
    if (b === binCount && v === binCount * binWidth) b = binCount - 1;
    if (b >= binCount) above += w;
    else mass[b] = mass[b]! + w;
  }
  if (!(total > 0)) throw new RangeError('weights: must not all be zero');
  const density = new Float64Array(binCount);
  for (let b = 0; b < binCount; b++) density[b] = mass[b]! / (total * binWidth);
  return { density, fractionAbove: above / total };
}
