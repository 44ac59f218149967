import { meanAbsSinusoid } from './meanAbsSinusoid';
import type { WheelGeometry } from './types';

/**
 * Normal-force coefficient x reference length (m) of one spoke section meeting a small through-flow
 * while it moves in the wheel plane.
 * - round: crossflow (independence) principle, normal force per length 0.5 rho Cd d |u| u_n, with the
 *   subcritical 2-D cylinder plateau Cd = 1.2 (Hoerner, Fluid-Dynamic Drag, ch. 3; from memory).
 * - bladed: a thin section at a small incidence u_n/|u|: normal force per length 0.5 rho a0 c |u| u_n,
 *   with a0 = 0.8 x 2 pi, thin-aerofoil slope 2 pi (Anderson, Fundamentals of Aerodynamics) reduced
 *   for low Reynolds number and thickness (common practice, no source).
 */
export const ROUND_SPOKE_CROSSFLOW_CD = 1.2;
export const BLADED_SPOKE_LIFT_SLOPE_PER_RAD = 0.8 * 2 * Math.PI;

export function spokeNormalForceLengthM(wheel: WheelGeometry): number {
  return wheel.spokeSection === 'bladed'
    ? BLADED_SPOKE_LIFT_SLOPE_PER_RAD * wheel.spokeWidthM
    : ROUND_SPOKE_CROSSFLOW_CD * wheel.spokeDiameterM;
}

/**
 * Screen resistance coefficient K of the open spoked annulus at radius r: the time-averaged pressure
 * jump per unit through-flow, Delta p = K (0.5 rho V) u_n, of N spokes sweeping the annulus.
 *
 * Each spoke element meets an in-plane crossflow omega r + V sin(theta) (its own rotation plus the
 * freestream component across it, at zero yaw). By the crossflow principle its normal force per length
 * is 0.5 rho (Cd L) |omega r + V sin theta| u_n, so averaging over the N / (2 pi r) spokes per unit
 * circumference and over a revolution:
 *   K(r) = scale * N (Cd L) / (2 pi r) * <|omega r / V + sin theta|>.
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
