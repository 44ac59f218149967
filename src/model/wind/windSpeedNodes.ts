import { weibullQuantile } from './weibullQuantile';

/** A wind-speed description: one speed, or a Weibull distribution (Rayleigh is shape 2). */
export type WindSpeedDistribution =
  | { kind: 'fixed'; speedMps: number }
  | { kind: 'weibull'; shapeK: number; scaleMps: number };

/**
 * Quadrature nodes for averaging over a wind-speed distribution: `count` equal-probability nodes at the
 * mid-quantiles p_i = (i + 1/2) / count, each of weight 1/count (the midpoint rule in probability,
 * which needs no truncation of the distribution's tail; e.g. Press et al., Numerical Recipes, 3rd ed.,
 * sec. 4.1 and 7.3 on the inverse-transform). A fixed speed gives one node of weight 1.
 * Returns the node speeds (m/s) and weights (summing to 1).
 *
 * @throws RangeError when count is not a positive integer or a parameter is out of range.
 */
export function windSpeedNodes(
  distribution: WindSpeedDistribution,
  count: number,
): { speedsMps: Float64Array; weights: Float64Array } {
  if (distribution.kind === 'fixed') {
    const s = distribution.speedMps;
    if (!(s >= 0) || !Number.isFinite(s))
      throw new RangeError(`distribution.speedMps=${s}: must be finite and >= 0`);
    return { speedsMps: Float64Array.of(s), weights: Float64Array.of(1) };
  }
  if (!Number.isInteger(count) || count < 1) throw new RangeError(`count=${count}: must be an integer >= 1`);
  const speedsMps = new Float64Array(count);
  const weights = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    speedsMps[i] = weibullQuantile((i + 0.5) / count, distribution.shapeK, distribution.scaleMps);
    weights[i] = 1 / count;
  }
  return { speedsMps, weights };
}
