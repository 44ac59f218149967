import { wheelYawCurveLoads } from '../../../model/ride/wheelYawCurveLoads';
import { apparentWind } from '../../../model/wind/apparentWind';
import { weightedQuantile } from '../../../model/wind/weightedQuantile';
import type { DesignRide, RideObjective } from '../types';
import { ALWAYS } from './numberOrNaN';
import { wheelLoadsRecord } from './wheelLoadsRecord';

const wind = { airspeedMps: 0, yawRad: 0 };
const loads = wheelLoadsRecord();

/** |side force| (N) of the design in every hub-height wind state of the ride at its constant speed. */
export function rideSideForcesN(d: DesignRide): Float64Array {
  const speed = d.doc.constant_speed_mps ?? Number.NaN;
  const s = d.context.hubStates;
  const out = new Float64Array(s.weights.length);
  for (let k = 0; k < out.length; k++) {
    apparentWind(speed, s.speedsMps[k]!, s.fromRad[k]!, wind);
    wheelYawCurveLoads(d.curve, wind.airspeedMps, wind.yawRad, loads);
    out[k] = Math.abs(loads.sideN);
  }
  return out;
}

/**
 * The 90th percentile of the wheel's side-force magnitude over riding time (N): 90 % of the ride's
 * wind states (weighted by riding time, every course segment by its length) give less. Weighted
 * quantile after Hyndman & Fan 1996, definition 1 (weightedQuantile).
 */
export const sideP90N: RideObjective = {
  id: 'side_p90_N',
  label: 'Side force, 90th percentile',
  unit: 'N',
  kind: 'handling',
  description:
    "the wheel's side force that 90 % of riding time stays below, over the ride's wind at hub height at its constant speed",
  applies: ALWAYS,
  compute: (d) => {
    if (!((d.doc.constant_speed_mps ?? 0) > 0)) return Number.NaN;
    return weightedQuantile(rideSideForcesN(d), d.context.hubStates.weights, 0.9);
  },
};
