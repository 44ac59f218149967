/**
 * Turbulent flat plate from the leading edge, Prandtl's 1/7-power-law result for the mean skin-friction
 * coefficient of one side: C_f = 0.074 Re^(-1/5), stated for 5e5 < Re < 1e7 (Schlichting, Boundary-Layer
 * Theory, ch. 21, "Prandtl's one-fifth law").
 */

/**
 * Mean fully turbulent skin-friction coefficient (one side), 1/7-power law.
 * @throws RangeError when reynolds is not finite and > 0.
 */
export function turbulentFlatPlateFriction(reynolds: number): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  return 0.074 * reynolds ** -0.2;
}
