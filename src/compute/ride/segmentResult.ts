/** One course segment's figures for the design and the baseline. */
import { windAveragedWheelLoads } from '../../model/ride/windAveragedWheelLoads';
import { apparentWind } from '../../model/wind/apparentWind';
import type { WindStates } from '../../model/wind/windStates';
import { finiteOrNull } from '../caseFile';
import { radToDeg } from '../units';
import { type Breakdown, pair, type WindScale } from './legPower';
import type { RideCurve } from './rideCurves';
import type { RideSegmentResult } from './rideDocument';
import type { RideFile } from './rideFile';
import type { Leg } from './rideLegs';

const scratchWind = { airspeedMps: 0, yawRad: 0 };

/** The figures of course segment `index` (its leg) for the design and the baseline. */
export function segmentResult(
  ride: RideFile,
  leg: Leg,
  index: number,
  speedMps: number,
  scale: WindScale,
  wheels: { design: RideCurve; baseline: RideCurve },
  r: {
    designPower: Breakdown;
    baselinePower: Breakdown;
    designTime: number;
    baselineTime: number;
    shield: number;
    rho: number;
  },
): RideSegmentResult {
  const hub: WindStates = {
    speedsMps: Float64Array.from(leg.states.speedsMps, (u) => u * scale.hub),
    fromRad: leg.states.fromRad,
    weights: leg.states.weights,
  };
  const d = windAveragedWheelLoads(wheels.design, speedMps, hub, r.shield, r.rho);
  const b = windAveragedWheelLoads(wheels.baseline, speedMps, hub, r.shield, r.rho);
  let meanAbsYaw = 0;
  for (let k = 0; k < d.yawAbsRad.length; k++) meanAbsYaw += hub.weights[k]! * d.yawAbsRad[k]!;
  let yawDeg: number | null = null;
  let airspeed: number | null = null;
  if (hub.weights.length === 1) {
    apparentWind(speedMps, hub.speedsMps[0]!, hub.fromRad[0]!, scratchWind);
    yawDeg = radToDeg(scratchWind.yawRad);
    airspeed = scratchWind.airspeedMps;
  }
  const s = ride.course![index]!;
  return {
    index,
    length_m: s.length_m,
    heading_deg: s.heading_deg,
    gradient: s.gradient,
    wind_from_relative_deg:
      leg.fixedFromRad === null ? null : finiteOrNull(wrapDeg(radToDeg(leg.fixedFromRad))),
    yaw_deg: finiteOrNull(yawDeg),
    airspeed_mps: finiteOrNull(airspeed),
    mean_abs_yaw_deg: finiteOrNull(radToDeg(meanAbsYaw)),
    axial_N: pair(d.axialN, b.axialN),
    side_abs_N: pair(d.sideAbsN, b.sideAbsN),
    power_W: pair(r.designPower.pedalW, r.baselinePower.pedalW),
    speed_mps: pair(leg.lengthM / r.designTime, leg.lengthM / r.baselineTime),
    time_s: pair(r.designTime, r.baselineTime),
  };
}

/** Degrees wrapped to (-180, 180]. */
function wrapDeg(deg: number): number {
  let d = deg % 360;
  if (d > 180) d -= 360;
  if (d <= -180) d += 360;
  return d;
}
