import { regularizedIncompleteBeta } from './regularizedIncompleteBeta';

/**
 * Cumulative distribution of Student's t with `dof` degrees of freedom (Abramowitz & Stegun 1964,
 * 26.7.1 with 26.5.27): for t >= 0, F(t) = 1 - I_{dof/(dof+t^2)}(dof/2, 1/2) / 2; F(-t) = 1 - F(t).
 * @throws RangeError when t is NaN or dof is not finite and > 0.
 */
export function studentTCdf(t: number, dof: number): number {
  if (Number.isNaN(t)) throw new RangeError(`t=${t}: must be a number`);
  if (!Number.isFinite(dof) || dof <= 0) throw new RangeError(`dof=${dof}: must be finite and > 0`);
  if (t === Number.POSITIVE_INFINITY) return 1;
  if (t === Number.NEGATIVE_INFINITY) return 0;
  const tail = 0.5 * regularizedIncompleteBeta(dof / (dof + t * t), 0.5 * dof, 0.5);
  return t >= 0 ? 1 - tail : tail;
}
