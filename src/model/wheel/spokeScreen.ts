import { standardAtmosphere, sutherlandViscosity } from '../air';
import { spokeRowDrag } from '../sections';
import { meanAbsSinusoid } from './meanAbsSinusoid';
import type { WheelGeometry } from './types';

/**
 * Lift slope of a bladed spoke meeting a small through-flow: a thin section at a small incidence
 * u_n/|u| has normal force per length 0.5 rho a0 c |u| u_n, with a0 = 0.8 x 2 pi, the thin-aerofoil
 * slope 2 pi (Anderson, Fundamentals of Aerodynamics) reduced for low Reynolds number and thickness
 * (common practice, no source). A round spoke has no lift: its normal force is its crossflow drag.
 */
export const BLADED_SPOKE_LIFT_SLOPE_PER_RAD = 0.8 * 2 * Math.PI;

/**
 * Reference condition at which the screen evaluates the section drag law: 40 km/h in ISA sea-level
 * air. The lattice's boundary condition must not depend on airspeed (one factorisation serves every
 * speed of a rotation ratio), so the screen takes the spokes' Reynolds number at this airspeed, the
 * middle of the trade's usual 30-50 km/h test speeds. Over 8-15 m/s the cylinder law moves by about
 * +-3 %, well inside the porosity rule's own uncertainty (`porosity_scale` calibrates it).
 * A calibratable assumption, not a fitted value.
 */
export const SCREEN_REFERENCE_AIRSPEED_MPS = 40 / 3.6;
const SEA_LEVEL = standardAtmosphere(0);
const SCREEN_REFERENCE_NU_M2_PER_S = sutherlandViscosity(SEA_LEVEL.temperatureK) / SEA_LEVEL.densityKgPerM3;
const row = new Float64Array(3);

/**
 * Normal-force coefficient x reference length (m) of one spoke section at radius r, sweeping the
 * annulus in the wake of the spoke ahead, when it meets a small through-flow.
 * - round: crossflow (independence) principle, normal force per length 0.5 rho Cd d |u| u_n, with Cd
 *   the section drag law the spokes' loads use (spokeSectionDrag via spokeRowDrag);
 * - bladed: lift slope x width (BLADED_SPOKE_LIFT_SLOPE_PER_RAD);
 * both times the wake shielding of the spoke ahead at the spacing 2 pi r / N (spokeRowDrag; at small
 * through-flow the spoke sits on its predecessor's wake centreline, and the wake slows its whole
 * relative velocity, through-flow included). Evaluated at the reference condition above, with the
 * spoke's mean crossing speed V_ref <|a + sin theta|>, a = omega r / V.
 */
export function spokeScreenForceLengthM(
  wheel: WheelGeometry,
  radiusM: number,
  rotationToAirspeedRatio: number,
): number {
  if (!(radiusM > 0)) throw new RangeError(`radiusM must be > 0, got ${radiusM}`);
  if (!(wheel.spokeCount > 0)) return 0;
  const round = wheel.spokeSection !== 'bladed';
  const refLength = round ? wheel.spokeDiameterM : wheel.spokeThicknessM;
  const crossing = SCREEN_REFERENCE_AIRSPEED_MPS * meanAbsSinusoid(rotationToAirspeedRatio, 1);
  const spacing = (2 * Math.PI * radiusM) / wheel.spokeCount;
  const thicknessRatio = round ? 1 : wheel.spokeThicknessM / wheel.spokeWidthM;
  spokeRowDrag(round, thicknessRatio, refLength, spacing, crossing, 0, SCREEN_REFERENCE_NU_M2_PER_S, row);
  const shielding = row[1]!;
  return round
    ? row[0]! * refLength * shielding
    : BLADED_SPOKE_LIFT_SLOPE_PER_RAD * wheel.spokeWidthM * shielding;
}

/** The spoke section's fields that set the screen (for the surface cache key). */
export function spokeScreenKey(wheel: WheelGeometry): string {
  return `${wheel.spokeSection}:${wheel.spokeDiameterM}:${wheel.spokeWidthM}:${wheel.spokeThicknessM}`;
}

/**
 * Screen resistance coefficient K of the open spoked annulus at radius r: the time-averaged pressure
 * jump per unit through-flow, Delta p = K (0.5 rho V) u_n, of N spokes sweeping the annulus.
 *
 * Each spoke element meets an in-plane crossflow omega r + V sin(theta) (its own rotation plus the
 * freestream component across it, at zero yaw). By the crossflow principle its normal force per length
 * is 0.5 rho (Cd L) |omega r + V sin theta| u_n, so averaging over the N / (2 pi r) spokes per unit
 * circumference and over a revolution:
 *   K(r) = scale * N (Cd L) / (2 pi r) * <|omega r / V + sin theta|>,
 * with Cd L the shielded normal-force length of spokeScreenForceLengthM (the loads' section law).
 * Linear in u_n because the spokes' own motion, not the through-flow, sets the crossflow speed: this is
 * the linear porous condition of porous-aerofoil theory with a porosity derived from solidity.
 * Derived here from the crossflow principle; `scale` is the calibratable porosity parameter.
 */
export function spokeScreenResistance(
  radiusM: number,
  spokeCount: number,
  normalForceLengthM: number,
  rotationToAirspeedRatio: number,
  scale: number,
): number {
  if (!(radiusM > 0)) throw new RangeError(`radiusM must be > 0, got ${radiusM}`);
  if (!(spokeCount >= 0)) throw new RangeError(`spokeCount must be >= 0, got ${spokeCount}`);
  if (!(scale >= 0)) throw new RangeError(`porosity scale must be >= 0, got ${scale}`);
  const solidityLength = (spokeCount * normalForceLengthM) / (2 * Math.PI * radiusM);
  return scale * solidityLength * meanAbsSinusoid(rotationToAirspeedRatio, 1);
}

/** Openness o = 2 / (K + 2) of a linear screen (0 solid, 1 fully open); see assembleSystem. */
export function screenOpenness(resistance: number): number {
  if (!(resistance >= 0)) throw new RangeError(`screen resistance must be >= 0, got ${resistance}`);
  return 2 / (resistance + 2);
}
