/**
 * Prandtl-Schlichting skin-friction law for the turbulent flat plate from the leading edge, mean C_f of
 * one side: C_f = 0.455 / (log10 Re)^2.58, an interpolation of the logarithmic law valid up to Re ~ 1e9
 * (Schlichting, Boundary-Layer Theory, ch. 21).
 */

/**
 * Mean fully turbulent skin-friction coefficient (one side), Prandtl-Schlichting.
 * @throws RangeError when reynolds is not finite or below 1e3 (the log law is meaningless there).
 */
export function prandtlSchlichtingFriction(reynolds: number): number {
  if (!Number.isFinite(reynolds) || reynolds < 1e3) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and >= 1e3 for the turbulent law`);
  }
  return 0.455 / Math.log10(reynolds) ** 2.58;
}
