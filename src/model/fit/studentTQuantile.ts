import { studentTCdf } from './studentTCdf';

/**
 * Quantile (inverse distribution) of Student's t with `dof` degrees of freedom: the t with
 * F(t) = p, found by bracketing and bisection on the monotone CDF of studentTCdf
 * (Abramowitz & Stegun 1964, 26.7.1), to a relative precision of ~1e-14. Used for the two-sided
 * 95% confidence intervals of least-squares parameters, t(0.975, n - p)
 * (e.g. Bates & Watts 1988, Nonlinear Regression Analysis and Its Applications, sec. 2.3).
 * @throws RangeError when p is not in (0, 1) or dof is not finite and > 0.
 */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`p=${p}: must be in (0, 1)`);
  if (!Number.isFinite(dof) || dof <= 0) throw new RangeError(`dof=${dof}: must be finite and > 0`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, dof);
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, dof) < p && hi < 1e300) {
    lo = hi;
    hi *= 2;
  }
  for (let k = 0; k < 2000 && hi - lo > 1e-15 * hi; k++) {
    const mid = 0.5 * (lo + hi);
    if (studentTCdf(mid, dof) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
