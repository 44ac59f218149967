/**
 * Grid convergence index from three systematically refined grids: I. B. Celik, U. Ghia, P. J. Roache,
 * C. J. Freitas, H. Coleman & P. E. Raad (2008), "Procedure for estimation and reporting of uncertainty due
 * to discretization in CFD applications", J. Fluids Eng. 130, 078001 (after Roache 1994).
 *
 * With grid 1 the finest (h1 < h2 < h3): r21 = h2/h1, r32 = h3/h2, e21 = phi2 - phi1, e32 = phi3 - phi2,
 * s = sign(e32/e21). Apparent order p by the fixed-point iteration of Celik's eq. (3):
 *   p = |ln|e32/e21| + q(p)| / ln r21,  q(p) = ln((r21^p - s) / (r32^p - s)).
 * phi_ext21 = (r21^p phi1 - phi2) / (r21^p - 1), e_a21 = |(phi1 - phi2)/phi1|,
 * e_ext21 = |(phi_ext21 - phi1)/phi_ext21|, GCI_fine21 = Fs e_a21 / (r21^p - 1).
 *
 * The absolute value in eq. (3) can hide divergence: for three solutions following phi = phi_ext + C h^p
 * (s = 1) or with alternating sign (s = -1), |e32/e21| = g(p) = r21^p (r32^p - s) / (r21^p - s), increasing in p,
 * so a positive order exists only when |e32/e21| > g(0+) (= ln r32 / ln r21 for s = 1, 1 for s = -1).
 * Otherwise the data do not converge: order, extrapolation and GCI are NaN and status says so. If the
 * fixed-point iteration stalls, the same equation g(p) = |e32/e21| is solved by bisection (g is monotone).
 */

export type ConvergenceStatus =
  | 'monotonic'
  | 'oscillatory'
  /** The three values do not converge (no positive observed order). */
  | 'divergent'
  /** phi1 = phi2 = phi3: converged to machine precision; GCI 0, order undefined. */
  | 'identical'
  /** One difference is zero and the other not, or a phi is not finite: no estimate. */
  | 'indeterminate';

export interface GridConvergenceInput {
  /** Representative cell sizes, finest first: 0 < h1 < h2 < h3. */
  h1: number;
  h2: number;
  h3: number;
  /** Solutions on those grids. */
  phi1: number;
  phi2: number;
  phi3: number;
  /** Factor of safety Fs (default 1.25, Celik et al. for three grids). */
  safetyFactor?: number;
}

export interface GridConvergenceResult {
  status: ConvergenceStatus;
  refinementRatio21: number;
  refinementRatio32: number;
  /** Apparent (observed) order p; NaN unless status is monotonic or oscillatory. */
  observedOrder: number;
  /** Richardson-extrapolated value phi_ext21. */
  extrapolated: number;
  /** phi_ext32, the extrapolation from the two coarser grids. */
  extrapolated32: number;
  /** Approximate relative error e_a21 (fraction). */
  approximateRelativeError21: number;
  /** Extrapolated relative error e_ext21 (fraction). */
  extrapolatedRelativeError21: number;
  /** Fine-grid convergence index GCI_fine21 (fraction). */
  gciRelative: number;
  /** Medium-grid index GCI_medium32 (fraction), for the asymptotic-range check GCI32 ~ r21^p GCI21. */
  gciRelative32: number;
  /** The finest solution phi1. */
  fine: number;
}

const MAX_ITERATIONS = 200;
const ORDER_TOLERANCE = 1e-12;
const MAX_ORDER = 50;

function orderResidual(p: number, r21: number, r32: number, s: number, ratio: number): number {
  // g(p) - ratio, g(p) = r21^p (r32^p - s) / (r21^p - s); evaluated in logs for range.
  const a = r21 ** p;
  const b = r32 ** p;
  return Math.log(a) + Math.log((b - s) / (a - s)) - Math.log(ratio);
}

function solveOrder(r21: number, r32: number, s: number, ratio: number): number {
  const lnR21 = Math.log(r21);
  const lnRatio = Math.log(ratio);
  // Celik's fixed-point iteration, started from the equal-ratio estimate.
  let p = Math.abs(lnRatio) / lnR21;
  for (let k = 0; k < MAX_ITERATIONS; k++) {
    const q = Math.log((r21 ** p - s) / (r32 ** p - s));
    const next = Math.abs(lnRatio + q) / lnR21;
    if (!Number.isFinite(next)) break;
    if (Math.abs(next - p) <= ORDER_TOLERANCE * Math.max(1, next)) {
      return next;
    }
    p = next;
  }
  // Fallback: bisection on the monotone residual over (0, MAX_ORDER].
  let lo = 1e-12;
  let hi = MAX_ORDER;
  if (orderResidual(hi, r21, r32, s, ratio) < 0) return Number.NaN;
  for (let k = 0; k < 200 && hi - lo > ORDER_TOLERANCE * hi; k++) {
    const mid = 0.5 * (lo + hi);
    if (orderResidual(mid, r21, r32, s, ratio) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Celik et al. (2008) three-grid discretisation-error estimate. Never throws on the solution values phi;
 * non-convergent or degenerate data give NaN fields and a status.
 * @throws RangeError when the cell sizes are not finite, positive and strictly increasing (h1 < h2 < h3),
 * or safetyFactor is not finite and >= 1.
 */
export function gridConvergenceIndex({
  h1,
  h2,
  h3,
  phi1,
  phi2,
  phi3,
  safetyFactor = 1.25,
}: GridConvergenceInput): GridConvergenceResult {
  if (!Number.isFinite(h1) || h1 <= 0) throw new RangeError(`h1=${h1}: must be finite and > 0`);
  if (!Number.isFinite(h2) || h2 <= h1) throw new RangeError(`h2=${h2}: must be finite and > h1=${h1}`);
  if (!Number.isFinite(h3) || h3 <= h2) throw new RangeError(`h3=${h3}: must be finite and > h2=${h2}`);
  if (!Number.isFinite(safetyFactor) || safetyFactor < 1) {
    throw new RangeError(`safetyFactor=${safetyFactor}: must be finite and >= 1`);
  }
  const r21 = h2 / h1;
  const r32 = h3 / h2;
  const result: GridConvergenceResult = {
    status: 'indeterminate',
    refinementRatio21: r21,
    refinementRatio32: r32,
    observedOrder: Number.NaN,
    extrapolated: Number.NaN,
    extrapolated32: Number.NaN,
    approximateRelativeError21: Number.NaN,
    extrapolatedRelativeError21: Number.NaN,
    gciRelative: Number.NaN,
    gciRelative32: Number.NaN,
    fine: phi1,
  };
  if (!Number.isFinite(phi1) || !Number.isFinite(phi2) || !Number.isFinite(phi3)) return result;

  const e21 = phi2 - phi1;
  const e32 = phi3 - phi2;
  result.approximateRelativeError21 = phi1 !== 0 ? Math.abs(e21 / phi1) : Number.NaN;
  if (e21 === 0 && e32 === 0) {
    result.status = 'identical';
    result.extrapolated = phi1;
    result.extrapolated32 = phi2;
    result.extrapolatedRelativeError21 = 0;
    result.gciRelative = 0;
    result.gciRelative32 = 0;
    result.approximateRelativeError21 = 0;
    return result;
  }
  if (e21 === 0 || e32 === 0) return result;

  const s = Math.sign(e32 / e21);
  const ratio = Math.abs(e32 / e21);
  // Smallest |e32/e21| a positive order can produce (limit p -> 0+ of g(p)).
  const threshold = s > 0 ? Math.log(r32) / Math.log(r21) : 1;
  if (!(ratio > threshold)) {
    result.status = 'divergent';
    return result;
  }
  const p = solveOrder(r21, r32, s, ratio);
  if (!(p > 0) || !Number.isFinite(p)) {
    result.status = 'divergent';
    return result;
  }
  const a21 = r21 ** p;
  const a32 = r32 ** p;
  const ext21 = (a21 * phi1 - phi2) / (a21 - 1);
  const ext32 = (a32 * phi2 - phi3) / (a32 - 1);
  result.status = s > 0 ? 'monotonic' : 'oscillatory';
  result.observedOrder = p;
  result.extrapolated = ext21;
  result.extrapolated32 = ext32;
  result.extrapolatedRelativeError21 = ext21 !== 0 ? Math.abs((ext21 - phi1) / ext21) : Number.NaN;
  result.gciRelative = (safetyFactor * result.approximateRelativeError21) / (a21 - 1);
  result.gciRelative32 = phi2 !== 0 ? (safetyFactor * Math.abs(e32 / phi2)) / (a32 - 1) : Number.NaN;
  return result;
}
