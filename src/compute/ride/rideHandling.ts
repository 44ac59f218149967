/** Handling in a ride: the design gust (lean, impulse), the steering moment's features and the model's flags. */
import { gustImpulse } from '../../model/handling/gustImpulse';
import { leanAngleRad } from '../../model/handling/leanAngleRad';
import { steeringFeatures } from '../../model/handling/steeringFeatures';
import type { WheelLoads } from '../../model/ride/types';
import { wheelYawCurveLoads } from '../../model/ride/wheelYawCurveLoads';
import { FLAG_MESSAGES } from '../../model/wheel/validity';
import { apparentWind } from '../../model/wind/apparentWind';
import { finiteOrNull } from '../caseFile';
import { G0_MPS2, radToDeg } from '../units';
import type { RideCurve } from './rideCurves';
import type { SteeringSummary } from './rideDocument';
import type { RideFile } from './rideFile';

const scratchLoads: WheelLoads = {
  axialN: 0,
  sideN: 0,
  rollMomentNm: 0,
  steeringMomentNm: 0,
  axleTorqueNm: 0,
  mirrored: false,
};
const scratchWind = { airspeedMps: 0, yawRad: 0 };

interface GustResult {
  directionDeg: number;
  yawDeg: number;
  sideN: number;
  sideIncrementN: number;
  rollMomentNm: number;
  leanRad: number;
  impulseNs: number;
  lateralSpeedChangeMps: number;
}

export function gustFor(
  ride: RideFile,
  curve: RideCurve,
  speedMps: number,
  hubMeanMps: number,
  directionsRad: number[],
): GustResult {
  const gustMps = ride.handling.gust_factor * hubMeanMps;
  let best = directionsRad[0]!;
  let bestRoll = -1;
  for (const d of directionsRad) {
    apparentWind(speedMps, gustMps, d, scratchWind);
    wheelYawCurveLoads(curve, scratchWind.airspeedMps, scratchWind.yawRad, scratchLoads);
    const r = Math.abs(scratchLoads.rollMomentNm);
    if (r > bestRoll + 1e-12) {
      bestRoll = r;
      best = d;
    }
  }
  apparentWind(speedMps, gustMps, best, scratchWind);
  const yawDeg = radToDeg(scratchWind.yawRad);
  wheelYawCurveLoads(curve, scratchWind.airspeedMps, scratchWind.yawRad, scratchLoads);
  const sideN = scratchLoads.sideN;
  const rollMomentNm = scratchLoads.rollMomentNm;
  apparentWind(speedMps, hubMeanMps, best, scratchWind);
  wheelYawCurveLoads(curve, scratchWind.airspeedMps, scratchWind.yawRad, scratchLoads);
  const sideIncrementN = sideN - scratchLoads.sideN;
  const leanRad = leanAngleRad(rollMomentNm, ride.rider.mass_kg, ride.rider.com_height_m, G0_MPS2);
  const g = gustImpulse(sideIncrementN, ride.handling.gust_duration_s, ride.rider.mass_kg);
  return {
    directionDeg: radToDeg(best),
    yawDeg,
    sideN,
    sideIncrementN,
    rollMomentNm,
    leanRad,
    impulseNs: g.impulseNs,
    lateralSpeedChangeMps: g.lateralSpeedChangeMps,
  };
}

export function steeringSummary(curve: RideCurve): SteeringSummary {
  const f = steeringFeatures(curve.yawRad, curve.steeringMomentNm);
  return {
    slope_Nm_per_deg: finiteOrNull(f.slopeNmPerRad * (Math.PI / 180)),
    sign_changes_deg: f.signChangesRad.map(radToDeg),
    jumps_deg: f.jumpsRad.map(radToDeg),
  };
}

/** Model flags raised at table yaws up to maxYawRad, with their messages, prefixed by the wheel. */
export function curveFlags(curve: RideCurve, maxYawRad: number, label: string): string[] {
  const codes = new Set<string>();
  for (let i = 0; i < curve.yawRad.length; i++) {
    if (i > 0 && curve.yawRad[i - 1]! >= maxYawRad) break;
    for (const f of curve.flags[i] ?? []) codes.add(f);
  }
  return [...codes].map((c) => `${label}: ${c}: ${FLAG_MESSAGES[c] ?? c}`);
}
