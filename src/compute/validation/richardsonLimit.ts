import { gridConvergenceIndex } from '../../model/convergence/gridConvergenceIndex';

/**
 * Richardson limit of a value on three lattices refined by 2 (span counts n, 2n, 4n), by the Celik et al.
 * (2008) procedure (J. Fluids Eng. 130, 078001; Roache 1994), with the observed order.
 */
export function richardsonLimit(
  coarse: number,
  medium: number,
  fine: number,
  fineSpanCount: number,
): { limit: number; order: number } {
  const h = 1 / fineSpanCount;
  const r = gridConvergenceIndex({ h1: h, h2: 2 * h, h3: 4 * h, phi1: fine, phi2: medium, phi3: coarse });
  return { limit: r.extrapolated, order: r.observedOrder };
}
