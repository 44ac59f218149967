/**
 * Drag coefficient (per unit span, on the diameter) of a smooth 2-D circular cylinder in cross-flow.
 * 1 <= Re <= 2e5 (subcritical): White's curve fit C_d = 1 + 10 Re^(-2/3) (F. M. White, Fluid Mechanics,
 * ch. 7, fit to the data of Fig. 7.16). Known bias of the fit: it sits ~10-16 % below the measured
 * subcritical plateau (~1.15-1.2) for 1e4 < Re < 2e5, and ~10 % above the data near Re 1e3.
 * Re < 1: Lamb's (1911) Oseen-type result C_d = 8 pi / (Re (2.002 - ln Re)) scaled by the constant that
 * makes it meet the fit at Re = 1 (0.876), so the law is continuous and keeps the low-Re trend.
 * Re > 2e5: the drag crisis (C_d falling to ~0.3) depends on roughness and free-stream turbulence and is
 * not modelled; the value is held at the fit's value at 2e5. Callers flag Re outside CYLINDER_RE_RANGE.
 */

/** Reynolds-number range (on the diameter) in which cylinderDrag follows its published fit. */
export const CYLINDER_RE_RANGE: Readonly<{ min: number; max: number }> = Object.freeze({ min: 1, max: 2e5 });

function whiteFit(re: number): number {
  // Re^(-2/3) as 1 / cbrt(Re)^2: the same value, several times faster than a general power (hot loop).
  const c = Math.cbrt(re);
  return 1 + 10 / (c * c);
}

const LAMB_AT_ONE = (8 * Math.PI) / 2.002;
const LAMB_SCALE = whiteFit(1) / LAMB_AT_ONE;

/**
 * @param reynolds V d / nu on the cylinder diameter (> 0)
 * @throws RangeError when reynolds is not finite and > 0.
 */
export function cylinderDrag(reynolds: number): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  if (reynolds < CYLINDER_RE_RANGE.min) {
    return (LAMB_SCALE * 8 * Math.PI) / (reynolds * (2.002 - Math.log(reynolds)));
  }
  return whiteFit(Math.min(reynolds, CYLINDER_RE_RANGE.max));
}
