/** A ride as legs (the whole ride, or each course segment), each with its wind states relative to its heading. */
import { rayleighScaleMps } from '../../model/wind/rayleighScaleMps';
import { weibullMean } from '../../model/wind/weibullMean';
import { type WindDirectionDistribution, windDirectionNodes } from '../../model/wind/windDirectionNodes';
import { type WindSpeedDistribution, windSpeedNodes } from '../../model/wind/windSpeedNodes';
import { type WindStates, windStates } from '../../model/wind/windStates';
import { degToRad } from '../units';
import { RIDE_QUADRATURE } from './rideDocument';
import type { RideFile } from './rideFile';

export interface Leg {
  lengthM: number;
  gradient: number;
  headingDeg: number;
  /** Reference-height wind states relative to the heading. */
  states: WindStates;
  yawStates: WindStates;
  fixedFromRad: number | null;
}

function speedDistribution(ride: RideFile): WindSpeedDistribution {
  const w = ride.wind;
  if (w.speed_mps !== undefined) return { kind: 'fixed', speedMps: w.speed_mps };
  const d = w.distribution!;
  if (d.type === 'rayleigh') return { kind: 'weibull', shapeK: 2, scaleMps: rayleighScaleMps(d.mean_mps) };
  return { kind: 'weibull', shapeK: d.shape, scaleMps: d.scale_mps };
}

export function meanWindSpeed(ride: RideFile): number {
  const w = ride.wind;
  if (w.speed_mps !== undefined) return w.speed_mps;
  const d = w.distribution!;
  return d.type === 'rayleigh' ? d.mean_mps : weibullMean(d.shape, d.scale_mps);
}

/** Direction distribution relative to a heading (rad, compass; 0 when there is no course). */
function directionDistribution(ride: RideFile, headingRad: number): WindDirectionDistribution {
  const w = ride.wind;
  if (w.direction_weights !== undefined) return { kind: 'sectors', weights: w.direction_weights };
  if (w.direction_deg === 'uniform') return { kind: 'uniform' };
  return { kind: 'fixed', fromRad: degToRad(w.direction_deg) - headingRad };
}

function legStates(
  ride: RideFile,
  headingRad: number,
  speedCount: number,
  directionCount: number,
): WindStates {
  const dist = directionDistribution(ride, headingRad);
  const dirs = windDirectionNodes(dist, directionCount);
  if (dist.kind === 'sectors' && headingRad !== 0) {
    // A wind rose is given in compass directions: relative to the heading, it turns by -heading.
    for (let j = 0; j < dirs.fromRad.length; j++) dirs.fromRad[j] = dirs.fromRad[j]! - headingRad;
  }
  return windStates(windSpeedNodes(speedDistribution(ride), speedCount), dirs);
}

export function buildLegs(ride: RideFile): Leg[] {
  const q = RIDE_QUADRATURE;
  const fixed = ride.wind.direction_weights === undefined && ride.wind.direction_deg !== 'uniform';
  if (ride.course === undefined) {
    return [
      {
        lengthM: ride.ride.distance_m,
        gradient: ride.ride.gradient,
        headingDeg: 0,
        states: legStates(ride, 0, q.speedNodes, q.directionNodes),
        yawStates: legStates(ride, 0, q.yawSpeedNodes, q.yawDirectionNodes),
        fixedFromRad: fixed ? degToRad(ride.wind.direction_deg as number) : null,
      },
    ];
  }
  return ride.course.map((s) => {
    const h = degToRad(s.heading_deg);
    return {
      lengthM: s.length_m,
      gradient: s.gradient,
      headingDeg: s.heading_deg,
      states: legStates(ride, h, q.courseSpeedNodes, q.courseDirectionNodes),
      yawStates: legStates(ride, h, Math.min(q.yawSpeedNodes, 16), q.courseYawDirectionNodes),
      fixedFromRad: fixed ? degToRad(ride.wind.direction_deg as number) - h : null,
    };
  });
}

/** Combine legs' states (scaled to the hub) with weights by length share. */
export function combinedHubStates(legs: Leg[], hubScale: number, which: 'states' | 'yawStates'): WindStates {
  const total = legs.reduce((a, l) => a + l.lengthM, 0);
  const n = legs.reduce((a, l) => a + l[which].weights.length, 0);
  const out: WindStates = {
    speedsMps: new Float64Array(n),
    fromRad: new Float64Array(n),
    weights: new Float64Array(n),
  };
  let k = 0;
  for (const leg of legs) {
    const s = leg[which];
    for (let i = 0; i < s.weights.length; i++, k++) {
      out.speedsMps[k] = s.speedsMps[i]! * hubScale;
      out.fromRad[k] = s.fromRad[i]!;
      out.weights[k] = (s.weights[i]! * leg.lengthM) / total;
    }
  }
  return out;
}
