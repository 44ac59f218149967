import { martinAeroPowerW } from './martinAeroPowerW';
import { martinBearingPowerW } from './martinBearingPowerW';
import { martinGravityPowerW } from './martinGravityPowerW';
import { martinKineticPowerW } from './martinKineticPowerW';
import { martinRollingPowerW } from './martinRollingPowerW';

/** Inputs of the Martin et al. 1998 model over one interval (SI). */
export interface MartinInput {
  /** Mean ground speed over the interval (m/s). */
  groundSpeedMps: number;
  /** Air velocity tangent to the path (ground speed + head-wind component, m/s). */
  airVelocityAlongMps: number;
  rhoKgPerM3: number;
  /** Drag area of rider and bike (m^2). */
  cdaM2: number;
  /** Rotational drag area of the wheels' spokes F_W (m^2); Martin et al.: 0.0044. */
  wheelRotationAreaM2: number;
  crr: number;
  /** Rider and bike mass (kg). */
  massKg: number;
  /** Rise over run. */
  gradient: number;
  gravityMps2: number;
  /** Both wheels' moment of inertia (kg m^2) and radius (m); Martin et al.: 0.14 and 0.311. */
  wheelInertiaKgM2: number;
  wheelRadiusM: number;
  /** Speeds at the interval's ends and its duration, for the kinetic-energy term. */
  initialSpeedMps: number;
  finalSpeedMps: number;
  intervalS: number;
  /** Chain (drivetrain) efficiency E_C; Martin et al.: 0.976. */
  drivetrainEfficiency: number;
}

export interface MartinPower {
  aeroW: number;
  rollingW: number;
  bearingW: number;
  gravityW: number;
  kineticW: number;
  /** Power delivered to the wheels (sum of the terms). */
  netW: number;
  /** Power at the pedals, netW / E_C. */
  totalW: number;
}

/**
 * The cycling power model of Martin, Milliken, Cobb, McFadden & Coggan 1998, "Validation of a
 * mathematical model for road cycling power", J. Appl. Biomech. 14, 276-291 (eq. 8):
 * P_TOT = (P_AT + P_RR + P_WB + P_PE + P_KE) / E_C.
 *
 * @throws RangeError when drivetrainEfficiency is not in (0, 1], or from the terms' own checks.
 */
export function martinPower(input: MartinInput): MartinPower {
  const e = input.drivetrainEfficiency;
  if (!(e > 0 && e <= 1)) throw new RangeError(`drivetrainEfficiency=${e}: must be within (0, 1]`);
  const v = input.groundSpeedMps;
  const aeroW = martinAeroPowerW(
    v,
    input.airVelocityAlongMps,
    input.rhoKgPerM3,
    input.cdaM2,
    input.wheelRotationAreaM2,
  );
  const rollingW = martinRollingPowerW(v, input.massKg, input.crr, input.gradient, input.gravityMps2);
  const bearingW = martinBearingPowerW(v);
  const gravityW = martinGravityPowerW(v, input.massKg, input.gradient, input.gravityMps2);
  const kineticW = martinKineticPowerW(
    input.massKg,
    input.wheelInertiaKgM2,
    input.wheelRadiusM,
    input.initialSpeedMps,
    input.finalSpeedMps,
    input.intervalS,
  );
  const netW = aeroW + rollingW + bearingW + gravityW + kineticW;
  return { aeroW, rollingW, bearingW, gravityW, kineticW, netW, totalW: netW / e };
}
