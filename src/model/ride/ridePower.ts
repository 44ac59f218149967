import { apparentWind } from '../wind/apparentWind';
import { checkRideSetup } from './checkRideSetup';
import { martinBearingPowerW } from './martinBearingPowerW';
import { martinGravityPowerW } from './martinGravityPowerW';
import { martinRollingPowerW } from './martinRollingPowerW';
import type { RidePower, RideSetup, WheelLoads, WheelYawCurve } from './types';
import { wheelYawCurveLoads } from './wheelYawCurveLoads';

const hub = { airspeedMps: 0, yawRad: 0 };
const rider = { airspeedMps: 0, yawRad: 0 };
const loads: WheelLoads = {
  axialN: 0,
  sideN: 0,
  rollMomentNm: 0,
  steeringMomentNm: 0,
  axleTorqueNm: 0,
  mirrored: false,
};

/** A zeroed RidePower record (for callers that reuse one as scratch). */
export function emptyRidePower(): RidePower {
  return {
    riderAeroW: 0,
    wheelAxialW: 0,
    wheelRotationW: 0,
    rollingW: 0,
    bearingW: 0,
    gravityW: 0,
    netW: 0,
    pedalW: 0,
    hubAirspeedMps: 0,
    hubYawRad: 0,
    mirrored: false,
  };
}

/**
 * Steady-state power of a rider with one modelled wheel in a wind: the Martin et al. 1998 model
 * (J. Appl. Biomech. 14, 276-291; rolling, bearing and gravity terms as published, no kinetic term at
 * steady speed) with two changes for the wheel study:
 * - the rider and bike (without the modelled wheel) are a bluff body of yaw-independent wind-axis drag
 *   area C_D A in the apparent wind at the rider's height; its axial component is
 *   1/2 rho C_D A V_r^2 cos(beta_r) = 1/2 rho C_D A V_r (v_g + w_r cos psi), equal to Martin's P_AT in
 *   still air or a head/tail wind (common practice, no source);
 * - the modelled wheel's own loads replace Martin's F_W term: P_wheel = s F_axial v_g + T omega,
 *   omega = v_g / R, s the shielding share of the axial force (1 front, < 1 rear).
 * Winds are given at the hub (for the wheel) and at the rider's height (for the rider), both FROM
 * windFromRad relative to the heading. Writes into `out` when given.
 *
 * @throws RangeError when the setup or a speed is out of range.
 */
export function ridePower(
  setup: RideSetup,
  curve: WheelYawCurve,
  groundSpeedMps: number,
  hubWindMps: number,
  riderWindMps: number,
  windFromRad: number,
  out: RidePower = emptyRidePower(),
): RidePower {
  checkRideSetup(setup);
  const v = groundSpeedMps;
  apparentWind(v, hubWindMps, windFromRad, hub);
  apparentWind(v, riderWindMps, windFromRad, rider);
  const along = v + riderWindMps * Math.cos(windFromRad);
  out.riderAeroW = 0.5 * setup.rhoKgPerM3 * setup.riderCdaM2 * rider.airspeedMps * along * v;
  wheelYawCurveLoads(curve, hub.airspeedMps, hub.yawRad, loads);
  out.wheelAxialW = setup.wheelShield * loads.axialN * v;
  out.wheelRotationW = (loads.axleTorqueNm * v) / curve.outerRadiusM;
  out.rollingW = martinRollingPowerW(v, setup.massKg, setup.crr, setup.gradient, setup.gravityMps2);
  out.bearingW = martinBearingPowerW(v);
  out.gravityW = martinGravityPowerW(v, setup.massKg, setup.gradient, setup.gravityMps2);
  out.netW =
    out.riderAeroW + out.wheelAxialW + out.wheelRotationW + out.rollingW + out.bearingW + out.gravityW;
  out.pedalW = out.netW / setup.drivetrainEfficiency;
  out.hubAirspeedMps = hub.airspeedMps;
  out.hubYawRad = hub.yawRad;
  out.mirrored = loads.mirrored;
  return out;
}
