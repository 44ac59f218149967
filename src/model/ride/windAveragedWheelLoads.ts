import { apparentWind } from '../wind/apparentWind';
import type { WindStates } from '../wind/windStates';
import type { WheelLoads, WheelYawCurve } from './types';
import { wheelYawCurveLoads } from './wheelYawCurveLoads';

export interface WindAveragedWheelLoads {
  /** Weighted mean axial force (N), the shielding share applied. */
  axialN: number;
  /** Weighted mean side force (N), signed (0 for symmetric winds), and of its magnitude. */
  sideN: number;
  sideAbsN: number;
  /** Weighted mean axle torque (N m). */
  axleTorqueNm: number;
  /** Weighted mean wheel power s F_axial v_g + T omega (W). */
  powerW: number;
  /** Wind-averaged axial drag area on the ground-speed dynamic pressure, axialN / (1/2 rho v_g^2) (m^2). */
  cdaM2: number;
  /** Apparent |yaw| at the hub for every state (rad), for densities and quantiles. */
  yawAbsRad: Float64Array;
  /** Weight of states with the air from behind (|yaw| > 90 deg, outside the model; loads mirrored). */
  mirroredFraction: number;
}

const wind = { airspeedMps: 0, yawRad: 0 };
const loads: WheelLoads = {
  axialN: 0,
  sideN: 0,
  rollMomentNm: 0,
  steeringMomentNm: 0,
  axleTorqueNm: 0,
  mirrored: false,
};

/**
 * Wind-averaged wheel loads at a fixed ground speed over weighted wind states (hub-height speed and
 * direction): the SAE J1252 (1981) wind-averaged drag generalised from uniform directions at one wind
 * speed to any weighted set of speeds and directions. Each state's apparent wind (wind triangle) sets
 * the airspeed and yaw at which the yaw curve is read; the mean is weighted by riding time. The
 * wind-averaged drag area is referred to the ground-speed dynamic pressure, as in J1252, so a
 * yaw-independent coefficient averages to (1 + (w / v)^2) times itself over uniform directions.
 *
 * @throws RangeError when groundSpeedMps or rhoKgPerM3 is not > 0, shield is not in [0, 1], or the state
 * arrays differ in length or carry no weight.
 */
export function windAveragedWheelLoads(
  curve: WheelYawCurve,
  groundSpeedMps: number,
  states: WindStates,
  shield: number,
  rhoKgPerM3: number,
): WindAveragedWheelLoads {
  if (!(groundSpeedMps > 0) || !Number.isFinite(groundSpeedMps)) {
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite and > 0`);
  }
  if (!(rhoKgPerM3 > 0) || !Number.isFinite(rhoKgPerM3)) {
    throw new RangeError(`rhoKgPerM3=${rhoKgPerM3}: must be finite and > 0`);
  }
  if (!(shield >= 0 && shield <= 1)) throw new RangeError(`shield=${shield}: must be within [0, 1]`);
  const n = states.speedsMps.length;
  if (states.fromRad.length !== n || states.weights.length !== n) {
    throw new RangeError(
      `states: speedsMps, fromRad and weights must have equal lengths, got ${n}, ${states.fromRad.length}, ${states.weights.length}`,
    );
  }
  const omega = groundSpeedMps / curve.outerRadiusM;
  const yawAbsRad = new Float64Array(n);
  let total = 0;
  let axial = 0;
  let side = 0;
  let sideAbs = 0;
  let torque = 0;
  let mirrored = 0;
  for (let k = 0; k < n; k++) {
    const w = states.weights[k]!;
    if (!(w >= 0) || !Number.isFinite(w))
      throw new RangeError(`states.weights[${k}]=${w}: must be finite and >= 0`);
    apparentWind(groundSpeedMps, states.speedsMps[k]!, states.fromRad[k]!, wind);
    wheelYawCurveLoads(curve, wind.airspeedMps, wind.yawRad, loads);
    yawAbsRad[k] = Math.abs(wind.yawRad);
    total += w;
    axial += w * loads.axialN;
    side += w * loads.sideN;
    sideAbs += w * Math.abs(loads.sideN);
    torque += w * loads.axleTorqueNm;
    if (loads.mirrored) mirrored += w;
  }
  if (!(total > 0)) throw new RangeError('states.weights: must not all be zero');
  const axialN = (shield * axial) / total;
  const axleTorqueNm = torque / total;
  return {
    axialN,
    sideN: side / total,
    sideAbsN: sideAbs / total,
    axleTorqueNm,
    powerW: axialN * groundSpeedMps + axleTorqueNm * omega,
    cdaM2: axialN / (0.5 * rhoKgPerM3 * groundSpeedMps * groundSpeedMps),
    yawAbsRad,
    mirroredFraction: mirrored / total,
  };
}
