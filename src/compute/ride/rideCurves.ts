/**
 * The expensive part of a ride: one yaw curve per wheel (0..90 deg every 1 deg) at the ride's reference
 * speed, airspeed = ground speed. Everything else of the ride reads these curves, scaling loads with
 * dynamic pressure (see src/model/ride/wheelYawCurveLoads.ts). Solving the curves separately lets a page
 * keep them while the rider, wind or ride inputs change.
 */
import { sutherlandViscosity } from '../../model/air/index';
import { ridePower } from '../../model/ride/ridePower';
import { speedForPower } from '../../model/ride/speedForPower';
import type { RideSetup, WheelYawCurve } from '../../model/ride/types';
import { solveWheel } from '../../model/wheel/solveWheel';
import type { FlowConditions, PointResult } from '../../model/wheel/types';
import type { WheelInput } from '../../model/wheel/wheelInput';
import { type CaseFile, caseToModelInput } from '../caseFile';
import { celsiusToKelvin, G0_MPS2 } from '../units';
import { type RideFile, rideCases } from './rideFile';

/** One wheel's yaw curve with the model's validity flags at each tabulated yaw. */
export interface RideCurve extends WheelYawCurve {
  /** Flags raised by the model at each yaw of the table (see FLAG_MESSAGES in src/model/wheel). */
  flags: string[][];
}

export interface RideCurves {
  design: RideCurve;
  baseline: RideCurve;
  /** Ground speed = airspeed at which both curves were solved (m/s). */
  referenceSpeedMps: number;
  rhoKgPerM3: number;
  /** True when, at constant power, no steady still-air speed was found below the cap (the cap is used). */
  referenceSpeedCapped: boolean;
}

/** Yaw step of the curves (deg) and the largest ground speed searched at constant power (m/s). */
export const CURVE_YAW_STEP_DEG = 1;
export const MAX_RIDE_SPEED_MPS = 40;
/** Slowest airspeed a ride's curves are solved at: the case files' airspeed floor. */
export const MIN_CURVE_SPEED_MPS = 0.001;
/** Below this steady speed a ride is at a near standstill: the model's airspeed range starts here. */
export const MIN_RIDING_SPEED_MPS = 2;

/** A wheel with no loads at all, for the rider-only estimate of the reference speed. */
function emptyCurve(outerRadiusM: number): WheelYawCurve {
  const yawRad = Float64Array.of(0, Math.PI / 2);
  const zero = () => new Float64Array(2);
  return {
    yawRad,
    axialN: zero(),
    sideN: zero(),
    rollMomentNm: zero(),
    steeringMomentNm: zero(),
    axleTorqueNm: zero(),
    referenceAirspeedMps: 1,
    outerRadiusM,
  };
}

/** The ride's setup for the power model on a given gradient. */
export function rideSetup(ride: RideFile, rhoKgPerM3: number, gradient: number): RideSetup {
  return {
    massKg: ride.rider.mass_kg,
    riderCdaM2: ride.rider.cda_m2,
    crr: ride.rider.crr,
    drivetrainEfficiency: ride.rider.drivetrain_efficiency,
    rhoKgPerM3,
    gradient,
    wheelShield: ride.position === 'front' ? 1 : ride.rear_shield,
    gravityMps2: G0_MPS2,
  };
}

/**
 * The speed at which the curves are solved: the given speed, or at constant power the rider's still-air
 * steady speed on the ride's (length-weighted mean) gradient with the wheel's own loads left out.
 */
export function rideReferenceSpeed(
  ride: RideFile,
  rhoKgPerM3: number,
): { speedMps: number; capped: boolean } {
  if (ride.ride.speed_mps !== undefined) return { speedMps: ride.ride.speed_mps, capped: false };
  const gradient =
    ride.course === undefined
      ? ride.ride.gradient
      : ride.course.reduce((a, s) => a + s.length_m * s.gradient, 0) / ride.ride.distance_m;
  const setup = rideSetup(ride, rhoKgPerM3, gradient);
  const curve = emptyCurve(ride.design.outer_radius_m);
  const v = speedForPower(
    (speed) => ridePower(setup, curve, speed, 0, 0, 0).pedalW,
    ride.ride.power_W!,
    MAX_RIDE_SPEED_MPS,
    0.5,
  );
  // NaN: the power is not reached below the cap. A low power gives a low speed (1 W: about 0.3 m/s),
  // solved as it is (flagged by the model's airspeed range), down to the model's airspeed floor.
  if (!Number.isFinite(v)) return { speedMps: MAX_RIDE_SPEED_MPS, capped: true };
  return { speedMps: Math.max(v, MIN_CURVE_SPEED_MPS), capped: false };
}

/** One wheel's yaw-curve input: its case at yaw 0..90 deg, airspeed = ground speed = speedMps. */
export function rideCurveInput(caseFile: CaseFile, speedMps: number): WheelInput {
  const input = caseToModelInput(caseFile);
  const rho = input.points[0]!.rhoKgPerM3;
  const mu = sutherlandViscosity(celsiusToKelvin(caseFile.conditions.temperature_c));
  const n = Math.round(90 / CURVE_YAW_STEP_DEG) + 1;
  const points: FlowConditions[] = [];
  for (let i = 0; i < n; i++) {
    points.push({
      airspeedMps: speedMps,
      yawRad: i === n - 1 ? Math.PI / 2 : (i * CURVE_YAW_STEP_DEG * Math.PI) / 180,
      groundSpeedMps: speedMps,
      rhoKgPerM3: rho,
      muPaS: mu,
    });
  }
  return { ...input, points };
}

/** A yaw curve from its input (rideCurveInput) and the model's results at the input's points. */
export function rideCurveOf(input: WheelInput, p: readonly PointResult[]): RideCurve {
  if (p.length !== input.points.length)
    throw new RangeError(`yaw curve: ${p.length} results for ${input.points.length} points`);
  return {
    yawRad: Float64Array.from(input.points, (q) => q.yawRad),
    axialN: Float64Array.from(p, (q) => q.axialN),
    sideN: Float64Array.from(p, (q) => q.sideN),
    rollMomentNm: Float64Array.from(p, (q) => q.rollMomentNm),
    steeringMomentNm: Float64Array.from(p, (q) => q.steeringMomentNm),
    axleTorqueNm: Float64Array.from(p, (q) => q.axleTorqueNm),
    referenceAirspeedMps: input.points[0]!.airspeedMps,
    outerRadiusM: input.wheel.outerRadiusM,
    flags: p.map((q) => [...q.flags]),
  };
}

/** Solve one wheel's yaw curve, 0..90 deg, at airspeed = ground speed = speedMps. */
export function solveRideCurve(caseFile: CaseFile, speedMps: number): RideCurve {
  const input = rideCurveInput(caseFile, speedMps);
  return rideCurveOf(input, solveWheel(input).points);
}

/** Solve both wheels' yaw curves for a ride. */
export function rideCurves(ride: RideFile): RideCurves {
  const cases = rideCases(ride);
  const ref = rideReferenceSpeed(ride, cases.rhoKgPerM3);
  return {
    design: solveRideCurve(cases.design, ref.speedMps),
    baseline: solveRideCurve(cases.baseline, ref.speedMps),
    referenceSpeedMps: ref.speedMps,
    rhoKgPerM3: cases.rhoKgPerM3,
    referenceSpeedCapped: ref.capped,
  };
}
