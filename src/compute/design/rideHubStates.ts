/**
 * The ride's wind states at hub height, as the ride evaluation weights them: per leg (the whole ride, or
 * each course segment relative to its heading) equal-probability speed nodes x direction nodes (the
 * ride's quadrature sizes, RIDE_QUADRATURE), the speed corrected to the hub by the neutral logarithmic
 * profile, each leg weighted by its share of the distance. The objectives that need a distribution of
 * loads over the ride (the 90th-percentile side force) read these.
 */
import { logWindProfileRatio } from '../../model/wind/logWindProfileRatio';
import { rayleighScaleMps } from '../../model/wind/rayleighScaleMps';
import { type WindDirectionDistribution, windDirectionNodes } from '../../model/wind/windDirectionNodes';
import { type WindSpeedDistribution, windSpeedNodes } from '../../model/wind/windSpeedNodes';
import { type WindStates, windStates } from '../../model/wind/windStates';
import { RIDE_QUADRATURE, type RideFile } from '../ride/index';
import { degToRad } from '../units';

function speedDistribution(ride: RideFile): WindSpeedDistribution {
  const w = ride.wind;
  if (w.speed_mps !== undefined) return { kind: 'fixed', speedMps: w.speed_mps };
  const d = w.distribution!;
  if (d.type === 'rayleigh') return { kind: 'weibull', shapeK: 2, scaleMps: rayleighScaleMps(d.mean_mps) };
  return { kind: 'weibull', shapeK: d.shape, scaleMps: d.scale_mps };
}

function legStates(
  ride: RideFile,
  headingRad: number,
  speedCount: number,
  directionCount: number,
): WindStates {
  const w = ride.wind;
  const dist: WindDirectionDistribution =
    w.direction_weights !== undefined
      ? { kind: 'sectors', weights: w.direction_weights }
      : w.direction_deg === 'uniform'
        ? { kind: 'uniform' }
        : { kind: 'fixed', fromRad: degToRad(w.direction_deg) - headingRad };
  const dirs = windDirectionNodes(dist, directionCount);
  // A wind rose is given in compass directions: relative to the heading it turns by -heading.
  if (dist.kind === 'sectors') for (let j = 0; j < dirs.fromRad.length; j++) dirs.fromRad[j]! -= headingRad;
  return windStates(windSpeedNodes(speedDistribution(ride), speedCount), dirs);
}

/** Hub-height wind speed over reference-height wind speed for the ride. */
export function hubSpeedFactor(ride: RideFile): number {
  const w = ride.wind;
  return logWindProfileRatio(
    w.hub_height_m ?? ride.design.outer_radius_m,
    w.reference_height_m,
    w.roughness_length_m,
  );
}

/** The ride's hub-height wind states, all legs together (weights sum to 1). */
export function rideHubStates(ride: RideFile): WindStates {
  const q = RIDE_QUADRATURE;
  const legs =
    ride.course === undefined
      ? [{ lengthM: ride.ride.distance_m, states: legStates(ride, 0, q.speedNodes, q.directionNodes) }]
      : ride.course.map((s) => ({
          lengthM: s.length_m,
          states: legStates(ride, degToRad(s.heading_deg), q.courseSpeedNodes, q.courseDirectionNodes),
        }));
  const hub = hubSpeedFactor(ride);
  const total = legs.reduce((a, l) => a + l.lengthM, 0);
  const n = legs.reduce((a, l) => a + l.states.weights.length, 0);
  const out: WindStates = {
    speedsMps: new Float64Array(n),
    fromRad: new Float64Array(n),
    weights: new Float64Array(n),
  };
  let k = 0;
  for (const leg of legs) {
    const s = leg.states;
    for (let i = 0; i < s.weights.length; i++, k++) {
      out.speedsMps[k] = s.speedsMps[i]! * hub;
      out.fromRad[k] = s.fromRad[i]!;
      out.weights[k] = (s.weights[i]! * leg.lengthM) / total;
    }
  }
  return out;
}

/** Relative wind directions (FROM, rad) the ride's gust is sought over: the one fixed direction of a ride
 * without a course, else every degree from 0 to 180 (RIDE_QUADRATURE.gustScanStepDeg), as the ride does. */
export function gustDirectionsRad(ride: RideFile): number[] {
  const w = ride.wind;
  if (ride.course === undefined && w.direction_weights === undefined && w.direction_deg !== 'uniform') {
    return [degToRad(w.direction_deg)];
  }
  const out: number[] = [];
  for (let d = 0; d <= 180; d += RIDE_QUADRATURE.gustScanStepDeg) out.push(degToRad(d));
  return out;
}
