import { lanczosGamma } from './lanczosGamma';

/**
 * Mean of a Weibull wind-speed distribution, c Gamma(1 + 1/k) (Justus et al. 1978, J. Appl. Meteorol. 17).
 *
 * @throws RangeError when shapeK is not > 0 or scaleMps is not >= 0.
 */
export function weibullMean(shapeK: number, scaleMps: number): number {
  if (!(shapeK > 0) || !Number.isFinite(shapeK))
    throw new RangeError(`shapeK=${shapeK}: must be finite and > 0`);
  if (!(scaleMps >= 0) || !Number.isFinite(scaleMps)) {
    throw new RangeError(`scaleMps=${scaleMps}: must be finite and >= 0`);
  }
  return scaleMps * lanczosGamma(1 + 1 / shapeK);
}
