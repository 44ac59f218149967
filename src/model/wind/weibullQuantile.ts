/**
 * Quantile (inverse cumulative distribution) of the two-parameter Weibull distribution of wind speed,
 *   F(u) = 1 - exp(-(u / c)^k)  =>  u_p = c (-ln(1 - p))^(1/k)
 * (Justus et al. 1978, J. Appl. Meteorol. 17; the standard wind-energy description, e.g. IEC 61400-1).
 * The Rayleigh distribution is the case k = 2.
 *
 * @throws RangeError when p is outside [0, 1), shapeK is not > 0, or scaleMps is not >= 0.
 */
export function weibullQuantile(p: number, shapeK: number, scaleMps: number): number {
  if (!(p >= 0 && p < 1)) throw new RangeError(`p=${p}: must be a probability in [0, 1)`);
  if (!(shapeK > 0) || !Number.isFinite(shapeK))
    throw new RangeError(`shapeK=${shapeK}: must be finite and > 0`);
  if (!(scaleMps >= 0) || !Number.isFinite(scaleMps)) {
    throw new RangeError(`scaleMps=${scaleMps}: must be finite and >= 0`);
  }
  return scaleMps * (-Math.log1p(-p)) ** (1 / shapeK);
}
