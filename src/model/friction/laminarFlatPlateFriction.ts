/**
 * Blasius laminar flat plate, mean skin-friction coefficient of one side over a length with Reynolds
 * number Re = U L / nu: C_f = 1.328 / sqrt(Re) (H. Blasius 1908; Schlichting, Boundary-Layer Theory, ch. 7).
 */

/**
 * Mean laminar skin-friction coefficient (one side).
 * @throws RangeError when reynolds is not finite and > 0.
 */
export function laminarFlatPlateFriction(reynolds: number): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  return 1.328 / Math.sqrt(reynolds);
}
