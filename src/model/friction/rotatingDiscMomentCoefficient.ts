/**
 * Moment coefficient of a full disc wetted on both sides, C_M = M / (rho omega^2 R^5 / 2), from the same
 * local shear laws as rotatingDiscTorque (Schlichting, Boundary-Layer Theory: laminar 3.87/sqrt(Re),
 * turbulent 0.146 Re^(-1/5), Re = omega R^2 / nu). With x_t = sqrt(Re_t / Re) the laminar fraction of the
 * radius: C_M = (1.232 pi / sqrt(Re)) min(x_t,1)^4 + 0.146 Re^(-1/5) (1 - min(x_t,1)^4.6).
 */

const LAMINAR = 1.232 * Math.PI;
const TURBULENT = 0.146;

/**
 * @param reynolds omega R^2 / nu (> 0)
 * @param transitionReynolds local Reynolds number of transition (> 0, default 3e5; Infinity = laminar)
 * @throws RangeError when an argument breaks its rule.
 */
export function rotatingDiscMomentCoefficient(reynolds: number, transitionReynolds = 3e5): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  if (Number.isNaN(transitionReynolds) || transitionReynolds <= 0) {
    throw new RangeError(`transitionReynolds=${transitionReynolds}: must be > 0 (Infinity for laminar)`);
  }
  const xt = Math.min(Math.sqrt(transitionReynolds / reynolds), 1);
  return (LAMINAR / Math.sqrt(reynolds)) * xt ** 4 + TURBULENT * reynolds ** -0.2 * (1 - xt ** 4.6);
}
