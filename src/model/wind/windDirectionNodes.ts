/**
 * How wind directions are distributed, relative to the rider's heading (direction the wind comes FROM,
 * rad: 0 head wind, pi/2 from the right, pi tail wind).
 * - 'fixed': one direction.
 * - 'uniform': every direction equally likely (the SAE J1252 wind-averaging assumption).
 * - 'sectors': a wind rose of equal sectors, sector j centred on j 2 pi / n, with given weights.
 */
export type WindDirectionDistribution =
  | { kind: 'fixed'; fromRad: number }
  | { kind: 'uniform' }
  | { kind: 'sectors'; weights: readonly number[] };

/**
 * Quadrature nodes over wind direction. 'uniform' uses `count` equally spaced directions j 2 pi / count
 * of equal weight: the trapezoidal rule on a periodic function, exact for trigonometric polynomials of
 * degree below `count` (Davis & Rabinowitz, Methods of Numerical Integration, sec. 2.9). 'sectors'
 * spreads each sector's weight over `count / n` (at least 1) equally spaced directions inside it.
 * Weights are normalised to sum to 1.
 *
 * @throws RangeError when count is not a positive integer, a weight is negative or not finite, or all are 0.
 */
export function windDirectionNodes(
  distribution: WindDirectionDistribution,
  count: number,
): { fromRad: Float64Array; weights: Float64Array } {
  if (distribution.kind === 'fixed') {
    const d = distribution.fromRad;
    if (!Number.isFinite(d)) throw new RangeError(`distribution.fromRad=${d}: must be finite`);
    return { fromRad: Float64Array.of(d), weights: Float64Array.of(1) };
  }
  if (!Number.isInteger(count) || count < 1) throw new RangeError(`count=${count}: must be an integer >= 1`);
  if (distribution.kind === 'uniform') {
    const fromRad = new Float64Array(count);
    const weights = new Float64Array(count).fill(1 / count);
    for (let j = 0; j < count; j++) fromRad[j] = (2 * Math.PI * j) / count;
    return { fromRad, weights };
  }
  const w = distribution.weights;
  const n = w.length;
  if (n < 1) throw new RangeError('distribution.weights: must list at least one sector weight');
  let total = 0;
  for (let j = 0; j < n; j++) {
    const x = w[j]!;
    if (!(x >= 0) || !Number.isFinite(x)) {
      throw new RangeError(`distribution.weights[${j}]=${x}: must be finite and >= 0`);
    }
    total += x;
  }
  if (!(total > 0)) throw new RangeError('distribution.weights: must not all be zero');
  const per = Math.max(1, Math.round(count / n));
  const width = (2 * Math.PI) / n;
  const fromRad = new Float64Array(n * per);
  const weights = new Float64Array(n * per);
  for (let j = 0; j < n; j++) {
    for (let k = 0; k < per; k++) {
      fromRad[j * per + k] = j * width + ((k + 0.5) / per - 0.5) * width;
      weights[j * per + k] = w[j]! / total / per;
    }
  }
  return { fromRad, weights };
}
