/**
 * Moment resisting a disc or annulus spinning in still fluid (Schlichting, Boundary-Layer Theory, ch. 5
 * (von Karman's similarity solution, Cochran's numbers) and ch. 21 (turbulent disc)).
 *
 * Local wall shear stress, circumferential:
 *   laminar (von Karman / Cochran, G'(0) = -0.616): tau_l(r) = 0.616 rho nu^(1/2) omega^(3/2) r
 *   turbulent (1/7-power law):                     tau_t(r) = c rho omega^1.8 nu^0.2 r^1.6,
 *   c = 0.0365 * 4.6 / (2 pi), so a full disc turbulent on both sides gives C_M = 0.146 Re^(-1/5).
 * Both-sides full-disc laminar value: C_M = 1.232 pi / sqrt(Re) = 3.870 / sqrt(Re), with
 * Re = omega R^2 / nu and M = C_M rho omega^2 R^5 / 2.
 * The local Reynolds number omega r^2 / nu grows outward: the part inside the transition radius
 * r_t = sqrt(Re_t nu / omega) is laminar, the part outside turbulent (Schlichting gives Re_t ~ 3e5).
 * Moment per side = integral of 2 pi r^2 tau(r) dr, in closed form for each piece. The turbulent law is
 * applied as if turbulent from the centre (no virtual-origin shift), the usual approximation.
 */

export interface RotatingDiscInput {
  omegaRadPerS: number;
  innerRadiusM: number;
  outerRadiusM: number;
  rhoKgPerM3: number;
  muPaS: number;
  /** Wetted faces: 1 or 2. */
  sides: 1 | 2;
  /** Local Reynolds number omega r^2 / nu of transition (default 3e5; Infinity keeps it laminar). */
  transitionReynolds?: number;
}

export interface RotatingDiscTorque {
  /** Moment resisting the rotation, all wetted sides (N m, >= 0). */
  torqueNm: number;
  /** Part of torqueNm carried by the laminar region (N m). */
  laminarTorqueNm: number;
  /** Radius where the local Reynolds number reaches transitionReynolds (m; Infinity when omega is 0). */
  transitionRadiusM: number;
}

const TWO_PI = 2 * Math.PI;
const LAMINAR_SHEAR = 0.616;
const TURBULENT_SHEAR = (0.0365 * 4.6) / TWO_PI;

/**
 * @throws RangeError when an argument breaks its rule (radii 0 <= inner < outer, finite; omega >= 0;
 * rho, mu > 0; sides 1 or 2; transitionReynolds > 0).
 */
export function rotatingDiscTorque({
  omegaRadPerS,
  innerRadiusM,
  outerRadiusM,
  rhoKgPerM3,
  muPaS,
  sides,
  transitionReynolds = 3e5,
}: RotatingDiscInput): RotatingDiscTorque {
  if (!Number.isFinite(omegaRadPerS) || omegaRadPerS < 0) {
    throw new RangeError(`omegaRadPerS=${omegaRadPerS}: must be finite and >= 0`);
  }
  if (!Number.isFinite(innerRadiusM) || innerRadiusM < 0) {
    throw new RangeError(`innerRadiusM=${innerRadiusM}: must be finite and >= 0`);
  }
  if (!Number.isFinite(outerRadiusM) || outerRadiusM <= innerRadiusM) {
    throw new RangeError(`outerRadiusM=${outerRadiusM}: must be finite and > innerRadiusM=${innerRadiusM}`);
  }
  if (!Number.isFinite(rhoKgPerM3) || rhoKgPerM3 <= 0) {
    throw new RangeError(`rhoKgPerM3=${rhoKgPerM3}: must be finite and > 0`);
  }
  if (!Number.isFinite(muPaS) || muPaS <= 0) {
    throw new RangeError(`muPaS=${muPaS}: must be finite and > 0`);
  }
  if (sides !== 1 && sides !== 2) {
    throw new RangeError(`sides=${sides}: must be 1 or 2`);
  }
  if (Number.isNaN(transitionReynolds) || transitionReynolds <= 0) {
    throw new RangeError(`transitionReynolds=${transitionReynolds}: must be > 0 (Infinity for laminar)`);
  }
  if (omegaRadPerS === 0)
    return { torqueNm: 0, laminarTorqueNm: 0, transitionRadiusM: Number.POSITIVE_INFINITY };

  const nu = muPaS / rhoKgPerM3;
  const rt = Math.sqrt((transitionReynolds * nu) / omegaRadPerS);
  const split = Math.min(Math.max(rt, innerRadiusM), outerRadiusM);

  // Laminar piece on [inner, split]: 2 pi k_l (b^4 - a^4) / 4.
  const kl = LAMINAR_SHEAR * rhoKgPerM3 * Math.sqrt(nu) * omegaRadPerS ** 1.5;
  const laminar = (TWO_PI * kl * (split ** 4 - innerRadiusM ** 4)) / 4;
  // Turbulent piece on [split, outer]: 2 pi k_t (b^4.6 - a^4.6) / 4.6.
  const kt = TURBULENT_SHEAR * rhoKgPerM3 * omegaRadPerS ** 1.8 * nu ** 0.2;
  const turbulent = (TWO_PI * kt * (outerRadiusM ** 4.6 - split ** 4.6)) / 4.6;

  return {
    torqueNm: sides * (laminar + turbulent),
    laminarTorqueNm: sides * laminar,
    transitionRadiusM: rt,
  };
}
