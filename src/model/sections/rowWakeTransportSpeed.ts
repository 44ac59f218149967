import { PLANE_WAKE_HALF_VALUE_CONSTANT } from './planeWakeDeficit';

/** integral of exp(-ln 2 eta^2) d eta over the real line: sqrt(pi / ln 2). */
const GAUSSIAN_WIDTH = Math.sqrt(Math.PI / Math.LN2);

/**
 * The speed at which the merged wake of a row of equal bodies crossing the same air (a wheel's spokes at
 * one radius) carries momentum off the row's plane by its own spreading, as the through-flow of an
 * actuator-disc balance (cageSwirlFraction) would:
 * the row pushes its momentum into a layer that widens as it entrains still air on both sides.
 *
 * A row of drag length Cd L per spacing s has, at distance x along the row, the accumulated drag length
 * Cd L x / s; Schlichting's plane far wake (planeWakeDeficit: half-value width 0.25 (x Cd d)^(1/2), Gaussian
 * profile) then has the half-value width b = 0.25 x (Cd L / s)^(1/2), growing linearly, and a centre-line
 * deficit fraction delta that does not change with x (spokeRowDrag). The momentum per unit area of the
 * plane that the layer holds, rho (delta u) b sqrt(pi / ln 2), so grows at the rate
 * rho (delta u) sqrt(pi / ln 2) 0.25 (Cd L / s)^(1/2) u. Written as two faces each passing a through-flow
 * U_w that leaves with the centre-line deficit delta u (2 rho U_w delta u: the form of the actuator-disc
 * balance of cageSwirlFraction, air passing the disc once and leaving with twice the disc's value):
 *
 *   U_w = (1/2) 0.25 sqrt(pi / ln 2) (Cd L / s)^(1/2) u ~ 0.266 (Cd L / s)^(1/2) u
 *
 * derived here from Schlichting's constants (H. Schlichting, Boundary-Layer Theory, the plane wake).
 *
 * @param dragLengthM Cd L of one body (m, >= 0)
 * @param spacingM s, the distance between successive bodies along the row (m, > 0)
 * @param speedMps u, the speed at which the row crosses the air (m/s, >= 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function rowWakeTransportSpeed(dragLengthM: number, spacingM: number, speedMps: number): number {
  if (!(dragLengthM >= 0) || !Number.isFinite(dragLengthM)) {
    throw new RangeError(`dragLengthM=${dragLengthM}: must be finite and >= 0`);
  }
  if (!(spacingM > 0) || !Number.isFinite(spacingM)) {
    throw new RangeError(`spacingM=${spacingM}: must be finite and > 0`);
  }
  if (!(speedMps >= 0) || !Number.isFinite(speedMps)) {
    throw new RangeError(`speedMps=${speedMps}: must be finite and >= 0`);
  }
  return 0.5 * PLANE_WAKE_HALF_VALUE_CONSTANT * GAUSSIAN_WIDTH * Math.sqrt(dragLengthM / spacingM) * speedMps;
}
