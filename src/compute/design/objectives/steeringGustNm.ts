import { wheelYawCurveLoads } from '../../../model/ride/wheelYawCurveLoads';
import { apparentWind } from '../../../model/wind/apparentWind';
import type { RideObjective } from '../types';
import { wheelLoadsRecord } from './wheelLoadsRecord';

const wind = { airspeedMps: 0, yawRad: 0 };
const loads = wheelLoadsRecord();

/**
 * The largest |steering moment| of a front wheel in the ride's design gust (N m): the gust (hub mean wind
 * x gust factor) from each direction the ride scans (its one fixed direction, else every degree from 0
 * to 180), at the ride's constant speed, the moment about the steering axis read off the design's yaw
 * curve (scaled with dynamic pressure). The largest over directions, since the direction of the worst
 * steering moment need not be that of the worst roll moment.
 */
export const steeringGustNm: RideObjective = {
  id: 'steering_gust_Nm',
  label: 'Steering moment in the design gust',
  unit: 'N m',
  kind: 'handling',
  description:
    "the largest moment about the steering axis in the ride's design gust over the gust directions scanned (front wheel only)",
  applies: (ride) => (ride.position === 'front' ? null : 'a rear wheel makes no steering moment'),
  compute: (d) => {
    const speed = d.doc.constant_speed_mps;
    const gust = d.doc.gust.hub_speed_mps;
    if (speed === null || gust === null || !(speed > 0)) return Number.NaN;
    let worst = 0;
    for (const from of d.context.gustDirectionsRad) {
      apparentWind(speed, gust, from, wind);
      wheelYawCurveLoads(d.curve, wind.airspeedMps, wind.yawRad, loads);
      worst = Math.max(worst, Math.abs(loads.steeringMomentNm));
    }
    return worst;
  },
};
