/**
 * Evaluate a ride from its two yaw curves: wind states (speed and direction quadrature, height
 * corrections), power at constant speed, time at constant power, wind-averaged wheel figures, the yaw
 * distribution at the wheel, handling (steering moment features, lean and impulse in a gust) and, for a
 * course, the same per segment. Cheap (no lattice solve): a page can rerun it as inputs change.
 */
import { gustImpulse } from '../../model/handling/gustImpulse';
import { leanAngleRad } from '../../model/handling/leanAngleRad';
import { steeringFeatures } from '../../model/handling/steeringFeatures';
import { emptyRidePower, ridePower } from '../../model/ride/ridePower';
import { speedForPower } from '../../model/ride/speedForPower';
import type { RidePower, RideSetup, WheelLoads } from '../../model/ride/types';
import { wheelYawCurveLoads } from '../../model/ride/wheelYawCurveLoads';
import { windAveragedWheelLoads } from '../../model/ride/windAveragedWheelLoads';
import { groundTrailM } from '../../model/wheel/steeringAxis';
import { FLAG_MESSAGES, VALIDITY } from '../../model/wheel/validity';
import { apparentWind } from '../../model/wind/apparentWind';
import { logWindProfileRatio } from '../../model/wind/logWindProfileRatio';
import { rayleighScaleMps } from '../../model/wind/rayleighScaleMps';
import { weibullMean } from '../../model/wind/weibullMean';
import { weightedHistogram } from '../../model/wind/weightedHistogram';
import { weightedQuantile } from '../../model/wind/weightedQuantile';
import { type WindDirectionDistribution, windDirectionNodes } from '../../model/wind/windDirectionNodes';
import { type WindSpeedDistribution, windSpeedNodes } from '../../model/wind/windSpeedNodes';
import { type WindStates, windStates } from '../../model/wind/windStates';
import { finiteOrNull } from '../caseFile';
import { degToRad, G0_MPS2, radToDeg } from '../units';
import { RIDE_CAUTIONS } from './cautions';
import {
  MAX_RIDE_SPEED_MPS,
  MIN_RIDING_SPEED_MPS,
  type RideCurve,
  type RideCurves,
  rideSetup,
} from './rideCurves';
import type { RideFile } from './rideFile';

export const RIDE_RESULT_FORMAT = 'coversweep-ride-result';
export const RIDE_RESULT_VERSION = 1;

/** Quadrature sizes (documented in README "Ride"). */
export const RIDE_QUADRATURE = {
  /** Wind-speed nodes (equal probability) and wind directions for power, time and wind-averaged loads. */
  speedNodes: 24,
  directionNodes: 72,
  /** The same for each segment of a course. */
  courseSpeedNodes: 8,
  courseDirectionNodes: 24,
  /** Finer sets for the yaw distribution (density and 90 % quantile). */
  yawSpeedNodes: 64,
  yawDirectionNodes: 720,
  courseYawDirectionNodes: 72,
  /** Yaw-density bins (deg) from 0 to 90. */
  yawBinDeg: 1,
  /** Gust directions scanned when the wind direction is not one fixed value (deg). */
  gustScanStepDeg: 1,
} as const;

export interface Pair {
  design: number | null;
  baseline: number | null;
}

export interface PowerBreakdown {
  rider_aero_W: number | null;
  wheel_axial_W: number | null;
  wheel_rotation_W: number | null;
  rolling_W: number | null;
  bearing_W: number | null;
  gravity_W: number | null;
  net_W: number | null;
  pedal_W: number | null;
}

export interface SteeringSummary {
  slope_Nm_per_deg: number | null;
  sign_changes_deg: number[];
  jumps_deg: number[];
}

export interface RideSegmentResult {
  index: number;
  length_m: number;
  heading_deg: number;
  gradient: number;
  /** Wind direction relative to the heading (deg, FROM; 0 head wind), null when not one direction. */
  wind_from_relative_deg: number | null;
  /** Hub-height apparent yaw and airspeed at the constant speed (one wind state only; else null). */
  yaw_deg: number | null;
  airspeed_mps: number | null;
  /** Mean |yaw| at the hub over the segment's wind states (deg). */
  mean_abs_yaw_deg: number | null;
  axial_N: Pair;
  side_abs_N: Pair;
  power_W: Pair;
  speed_mps: Pair;
  time_s: Pair;
}

export interface RideDocument {
  format: typeof RIDE_RESULT_FORMAT;
  version: typeof RIDE_RESULT_VERSION;
  ride: RideFile;
  position: 'front' | 'rear';
  /** Share of the wheel's axial force acting on the bike (1 front; rear_shield for a rear wheel). */
  shield: number;
  air_density_kgpm3: number | null;
  /** Speed of the yaw curves (airspeed = ground speed, m/s). */
  curve_speed_mps: number | null;
  /** Ground speed of the constant-speed comparison (m/s): the given speed, or the baseline's mean speed at the given power. */
  constant_speed_mps: number | null;
  /** Pedal power of the constant-power comparison (W): the given power, or the baseline's mean power at the given speed. */
  constant_power_W: number | null;
  distance_m: number;
  wind: {
    hub_height_m: number;
    hub_speed_factor: number | null;
    rider_speed_factor: number | null;
    /** Mean wind speed at the reference height and at the hub (m/s). */
    mean_speed_mps: number | null;
    hub_mean_speed_mps: number | null;
  };
  /** Pedal power at constant speed (W), and design - baseline. */
  power_W: Pair;
  delta_power_W: number | null;
  /** Time over the distance or course at constant power (s), mean speed, and design - baseline. */
  time_s: Pair;
  delta_time_s: number | null;
  speed_mps: Pair;
  delta_speed_mps: number | null;
  /** delta_time_s / baseline time, and the change of aerodynamic power over baseline aerodynamic power at constant speed. */
  delta_time_fraction: number | null;
  delta_aero_power_fraction: number | null;
  /** Aerodynamic share of the net power at constant speed (rider + wheel, rotation included). */
  aero_share: Pair;
  power_breakdown_W: { design: PowerBreakdown; baseline: PowerBreakdown };
  /** Wind-averaged wheel figures at the constant speed, over every wind state (and course segment). */
  wind_averaged_axial_N: Pair;
  wind_averaged_cda_m2: Pair;
  /** Mean magnitude of the side force (N) (the signed mean cancels for symmetric winds). */
  wind_averaged_side_N: Pair;
  wind_averaged_wheel_power_W: Pair;
  /** 90 % of riding time is spent below this hub-height |yaw| (deg). */
  yaw_p90_deg: number | null;
  yaw_mean_deg: number | null;
  /** Probability density of |yaw| at the hub (per deg), 1-deg bins from 0 to 90. */
  yaw_density: { yaw_deg: number; density_per_deg: number }[];
  /** Share of riding time beyond the model's trusted yaw and with the air from behind (> 90 deg). */
  yaw_beyond_validity_fraction: number | null;
  yaw_beyond_90_fraction: number | null;
  /** Lean angle to balance the wheel's roll moment in the worst gust (deg). */
  lean_deg: Pair;
  /** Side-force increment of the gust over the mean wind x its duration (N s) and the lateral speed change it gives. */
  gust_impulse_Ns: Pair;
  gust_lateral_speed_change_mps: Pair;
  gust: {
    factor: number;
    duration_s: number;
    hub_speed_mps: number | null;
    /** Relative wind direction (FROM, deg) of the worst gust for each wheel. */
    direction_deg: Pair;
    yaw_deg: Pair;
    side_N: Pair;
    side_increment_N: Pair;
    roll_moment_Nm: Pair;
  };
  /** Ground trail from the head angle, fork offset and each wheel's radius (m). */
  trail_m: Pair;
  /** Front wheel: steering moment features at the curve speed (null for a rear wheel). */
  steering: {
    airspeed_mps: number | null;
    design: SteeringSummary;
    baseline: SteeringSummary;
    curve: { yaw_deg: number; design_Nm: number | null; baseline_Nm: number | null }[];
  } | null;
  segments?: RideSegmentResult[];
  flags: string[];
  notes: string[];
  cautions: string[];
}

export const RIDE_NOTES: readonly string[] = [
  "power and time include the wheel's axial force (times the shielding share for a rear wheel) times ground speed and its axle torque times rotation rate (ground speed / outer radius); the rider's drag area excludes the wheel and Martin et al.'s wheel-rotation term F_W is not added",
  'the rider and the rest of the bike: Martin et al. 1998 (rolling, wheel-bearing, gravity, drivetrain efficiency); their drag area is a yaw-independent wind-axis drag area in the apparent wind at rider_height_m',
  'wheel loads come from one yaw curve solved at curve_speed_mps and are scaled with dynamic pressure to other airspeeds (Reynolds-number effects neglected within the ride)',
  'wind speed is corrected from reference_height_m to the hub and rider heights by the neutral logarithmic profile with roughness_length_m',
  'wind-averaged figures weight every wind speed and direction by riding time at constant_speed_mps; the drag area is referred to the ground-speed dynamic pressure (SAE J1252)',
  'at constant power each wind state (and segment) covers its share of the distance at its own steady speed; speed changes between states and segments are neglected (no kinetic-energy term)',
  "lean: static balance of the wheel's aerodynamic roll moment in the gust by gravity (rider and bike rigid, thin tyres); the rider's own side force is not included",
  'gust: the hub-height mean wind times the gust factor, from the direction (or, for a variable or unknown direction, the worst relative direction) giving the largest roll moment; the impulse is the side-force increment over the mean wind held for the gust duration',
  'loads with the air from behind (|yaw| > 90 deg) are mirrored from 180 deg - |yaw| with the axial force reversed: outside the model',
];

interface Leg {
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

function meanWindSpeed(ride: RideFile): number {
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

function buildLegs(ride: RideFile): Leg[] {
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

const BREAKDOWN_KEYS = [
  'riderAeroW',
  'wheelAxialW',
  'wheelRotationW',
  'rollingW',
  'bearingW',
  'gravityW',
  'netW',
  'pedalW',
] as const;
type BreakdownKey = (typeof BREAKDOWN_KEYS)[number];
type Breakdown = Record<BreakdownKey, number>;

function zeroBreakdown(): Breakdown {
  return {
    riderAeroW: 0,
    wheelAxialW: 0,
    wheelRotationW: 0,
    rollingW: 0,
    bearingW: 0,
    gravityW: 0,
    netW: 0,
    pedalW: 0,
  };
}

const scratchPower: RidePower = emptyRidePower();

interface WindScale {
  hub: number;
  rider: number;
}

/** Weighted mean power terms at a constant ground speed over a leg's wind states. */
function legPowerAtSpeed(
  setup: RideSetup,
  curve: RideCurve,
  speedMps: number,
  leg: Leg,
  scale: WindScale,
): Breakdown {
  const out = zeroBreakdown();
  const s = leg.states;
  let total = 0;
  for (let k = 0; k < s.weights.length; k++) {
    const w = s.weights[k]!;
    if (w === 0) continue;
    const u = s.speedsMps[k]!;
    ridePower(setup, curve, speedMps, u * scale.hub, u * scale.rider, s.fromRad[k]!, scratchPower);
    for (const key of BREAKDOWN_KEYS) out[key] += w * scratchPower[key];
    total += w;
  }
  for (const key of BREAKDOWN_KEYS) out[key] /= total;
  return out;
}

/** Time over a leg at constant pedal power: each wind state covers its weight's share at its steady speed. */
function legTimeAtPower(
  setup: RideSetup,
  curve: RideCurve,
  powerW: number,
  leg: Leg,
  scale: WindScale,
): { timeS: number; capped: boolean } {
  const s = leg.states;
  let total = 0;
  let time = 0;
  let capped = false;
  for (let k = 0; k < s.weights.length; k++) {
    const w = s.weights[k]!;
    if (w === 0) continue;
    const u = s.speedsMps[k]!;
    const from = s.fromRad[k]!;
    let v = speedForPower(
      (speed) => ridePower(setup, curve, speed, u * scale.hub, u * scale.rider, from, scratchPower).pedalW,
      powerW,
      MAX_RIDE_SPEED_MPS,
      2,
    );
    if (!Number.isFinite(v)) {
      v = MAX_RIDE_SPEED_MPS;
      capped = true;
    }
    time += (w * leg.lengthM) / v;
    total += w;
  }
  return { timeS: time / total, capped };
}

function breakdownDoc(b: Breakdown): PowerBreakdown {
  return {
    rider_aero_W: finiteOrNull(b.riderAeroW),
    wheel_axial_W: finiteOrNull(b.wheelAxialW),
    wheel_rotation_W: finiteOrNull(b.wheelRotationW),
    rolling_W: finiteOrNull(b.rollingW),
    bearing_W: finiteOrNull(b.bearingW),
    gravity_W: finiteOrNull(b.gravityW),
    net_W: finiteOrNull(b.netW),
    pedal_W: finiteOrNull(b.pedalW),
  };
}

function pair(design: number, baseline: number): Pair {
  return { design: finiteOrNull(design), baseline: finiteOrNull(baseline) };
}

function aeroW(b: Breakdown): number {
  return b.riderAeroW + b.wheelAxialW + b.wheelRotationW;
}

/** Combine legs' states (scaled to the hub) with weights by length share. */
function combinedHubStates(legs: Leg[], hubScale: number, which: 'states' | 'yawStates'): WindStates {
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

function gustFor(
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

function steeringSummary(curve: RideCurve): SteeringSummary {
  const f = steeringFeatures(curve.yawRad, curve.steeringMomentNm);
  return {
    slope_Nm_per_deg: finiteOrNull(f.slopeNmPerRad * (Math.PI / 180)),
    sign_changes_deg: f.signChangesRad.map(radToDeg),
    jumps_deg: f.jumpsRad.map(radToDeg),
  };
}

/** Model flags raised at table yaws up to maxYawRad, with their messages, prefixed by the wheel. */
function curveFlags(curve: RideCurve, maxYawRad: number, label: string): string[] {
  const codes = new Set<string>();
  for (let i = 0; i < curve.yawRad.length; i++) {
    if (i > 0 && curve.yawRad[i - 1]! >= maxYawRad) break;
    for (const f of curve.flags[i] ?? []) codes.add(f);
  }
  return [...codes].map((c) => `${label}: ${c}: ${FLAG_MESSAGES[c] ?? c}`);
}

/** Evaluate a ride from its solved curves. */
export function evaluateRide(ride: RideFile, curves: RideCurves): RideDocument {
  const rho = curves.rhoKgPerM3;
  const flags: string[] = [];
  if (curves.referenceSpeedCapped) {
    flags.push(
      `no still-air steady speed below ${MAX_RIDE_SPEED_MPS} m/s at the given power: curves solved at the cap`,
    );
  }
  const w = ride.wind;
  const hubHeight = w.hub_height_m ?? ride.design.outer_radius_m;
  const scale: WindScale = {
    hub: logWindProfileRatio(hubHeight, w.reference_height_m, w.roughness_length_m),
    rider: logWindProfileRatio(w.rider_height_m, w.reference_height_m, w.roughness_length_m),
  };
  const legs = buildLegs(ride);
  const setups = legs.map((l) => rideSetup(ride, rho, l.gradient));
  const distance = ride.ride.distance_m;
  const wheels = { design: curves.design, baseline: curves.baseline };

  // Constant power: times.
  const timesAt = (curve: RideCurve, powerW: number) => {
    const perLeg = legs.map((leg, i) => legTimeAtPower(setups[i]!, curve, powerW, leg, scale));
    if (perLeg.some((t) => t.capped)) {
      flags.push(
        `at ${powerW.toFixed(1)} W some wind states or segments need more than ${MAX_RIDE_SPEED_MPS} m/s: capped`,
      );
    }
    return perLeg.map((t) => t.timeS);
  };
  const powersAt = (curve: RideCurve, speedMps: number) =>
    legs.map((leg, i) => legPowerAtSpeed(setups[i]!, curve, speedMps, leg, scale));
  const meanBreakdown = (perLeg: Breakdown[]) => {
    const out = zeroBreakdown();
    legs.forEach((leg, i) => {
      for (const key of BREAKDOWN_KEYS) out[key] += (perLeg[i]![key] * leg.lengthM) / distance;
    });
    return out;
  };

  let constantSpeed: number;
  let constantPower: number;
  let baselinePowers: Breakdown[];
  let baselineTimes: number[];
  if (ride.ride.power_W !== undefined) {
    constantPower = ride.ride.power_W;
    baselineTimes = timesAt(wheels.baseline, constantPower);
    constantSpeed = distance / baselineTimes.reduce((a, t) => a + t, 0);
    baselinePowers = powersAt(wheels.baseline, constantSpeed);
  } else {
    constantSpeed = ride.ride.speed_mps!;
    baselinePowers = powersAt(wheels.baseline, constantSpeed);
    constantPower = meanBreakdown(baselinePowers).pedalW;
    if (!(constantPower > 0)) {
      flags.push(
        `the baseline needs no pedal power at ${constantSpeed} m/s on this ride (downhill or tail wind): no constant-power comparison`,
      );
      baselineTimes = legs.map(() => Number.NaN);
    } else {
      baselineTimes = timesAt(wheels.baseline, constantPower);
    }
  }
  const designTimes = constantPower > 0 ? timesAt(wheels.design, constantPower) : legs.map(() => Number.NaN);
  const designPowers = powersAt(wheels.design, constantSpeed);
  const bd = { design: meanBreakdown(designPowers), baseline: meanBreakdown(baselinePowers) };
  const timeD = designTimes.reduce((a, t) => a + t, 0);
  const timeB = baselineTimes.reduce((a, t) => a + t, 0);

  // Wind-averaged wheel loads at the constant speed.
  const hubStates = combinedHubStates(legs, scale.hub, 'states');
  const shield = ride.position === 'front' ? 1 : ride.rear_shield;
  const avg = {
    design: windAveragedWheelLoads(wheels.design, constantSpeed, hubStates, shield, rho),
    baseline: windAveragedWheelLoads(wheels.baseline, constantSpeed, hubStates, shield, rho),
  };

  if (constantSpeed < MIN_RIDING_SPEED_MPS) {
    flags.push(
      `the steady speed on this ride is ${constantSpeed.toPrecision(3)} m/s, below the model's ${MIN_RIDING_SPEED_MPS}..${MAX_RIDE_SPEED_MPS} m/s range (a near standstill at ${constantPower.toPrecision(3)} W): times, powers and wind-averaged figures are extrapolated and say little`,
    );
  }
  for (const [label, a] of [
    ['design', avg.design],
    ['baseline', avg.baseline],
  ] as const) {
    if (a.cdaM2 < 0) {
      flags.push(
        `${label}: the wind-averaged drag area is negative (${a.cdaM2.toPrecision(3)} m^2): at ${constantSpeed.toPrecision(3)} m/s the wind pushes the wheel forward on average (it is referred to the riding speed's dynamic pressure)`,
      );
    }
  }

  // Yaw distribution at the hub.
  const yawStates = combinedHubStates(legs, scale.hub, 'yawStates');
  const yawAbs = new Float64Array(yawStates.weights.length);
  let meanYaw = 0;
  let beyondValidity = 0;
  let maxYaw = 0;
  for (let k = 0; k < yawAbs.length; k++) {
    apparentWind(constantSpeed, yawStates.speedsMps[k]!, yawStates.fromRad[k]!, scratchWind);
    const a = Math.abs(scratchWind.yawRad);
    yawAbs[k] = a;
    const wk = yawStates.weights[k]!;
    meanYaw += wk * a;
    if (a > VALIDITY.maxYawRad + 1e-12) beyondValidity += wk;
    if (wk > 1e-9) maxYaw = Math.max(maxYaw, a);
  }
  const binRad = degToRad(RIDE_QUADRATURE.yawBinDeg);
  const binCount = Math.round(90 / RIDE_QUADRATURE.yawBinDeg);
  const hist = weightedHistogram(yawAbs, yawStates.weights, binRad, binCount);
  const yawP90 = weightedQuantile(yawAbs, yawStates.weights, 0.9);
  const yawDensity = Array.from(hist.density, (d, i) => ({
    yaw_deg: (i + 0.5) * RIDE_QUADRATURE.yawBinDeg,
    density_per_deg: (d * Math.PI) / 180,
  }));
  if (beyondValidity > 0.005) {
    flags.push(
      `${(100 * beyondValidity).toFixed(1)} % of riding time is at |yaw| beyond ${radToDeg(VALIDITY.maxYawRad).toFixed(0)} deg, outside the model's trusted range`,
    );
  }
  if (hist.fractionAbove > 0) {
    flags.push(
      `${(100 * hist.fractionAbove).toFixed(1)} % of riding time has the air from behind the wheel (|yaw| > 90 deg): loads mirrored, outside the model`,
    );
  }
  flags.push(
    ...curveFlags(wheels.design, maxYaw, 'design'),
    ...curveFlags(wheels.baseline, maxYaw, 'baseline'),
  );

  // Gust and lean.
  const meanRef = meanWindSpeed(ride);
  const hubMean = meanRef * scale.hub;
  const fixedSingle = legs.length === 1 && legs[0]!.fixedFromRad !== null;
  const directions: number[] = [];
  if (fixedSingle) directions.push(legs[0]!.fixedFromRad!);
  else {
    for (let d = 0; d <= 180; d += RIDE_QUADRATURE.gustScanStepDeg) directions.push(degToRad(d));
  }
  const gust = {
    design: gustFor(ride, wheels.design, constantSpeed, hubMean, directions),
    baseline: gustFor(ride, wheels.baseline, constantSpeed, hubMean, directions),
  };

  // Steering (front wheel).
  const steeringGeometry = {
    headAngleRad: degToRad(ride.steering.head_angle_deg),
    forkOffsetM: ride.steering.fork_offset_m,
  };
  const steering =
    ride.position === 'front'
      ? {
          airspeed_mps: finiteOrNull(curves.referenceSpeedMps),
          design: steeringSummary(wheels.design),
          baseline: steeringSummary(wheels.baseline),
          curve: Array.from(wheels.design.yawRad, (y, i) => ({
            yaw_deg: Math.round(radToDeg(y) * 1e9) / 1e9,
            design_Nm: finiteOrNull(wheels.design.steeringMomentNm[i]!),
            baseline_Nm: finiteOrNull(wheels.baseline.steeringMomentNm[i]!),
          })),
        }
      : null;
  if (steering !== null) {
    for (const [label, s] of [
      ['design', steering.design],
      ['baseline', steering.baseline],
    ] as const) {
      if (s.sign_changes_deg.length > 0) {
        flags.push(
          `${label}: the steering moment changes sign at ${s.sign_changes_deg.map((d) => d.toFixed(1)).join(', ')} deg of yaw`,
        );
      }
      if (s.jumps_deg.length > 0) {
        flags.push(
          `${label}: the steering moment jumps near ${s.jumps_deg.map((d) => d.toFixed(1)).join(', ')} deg of yaw`,
        );
      }
    }
  }

  const aeroB = aeroW(bd.baseline);
  const doc: RideDocument = {
    format: RIDE_RESULT_FORMAT,
    version: RIDE_RESULT_VERSION,
    ride,
    position: ride.position,
    shield,
    air_density_kgpm3: finiteOrNull(rho),
    curve_speed_mps: finiteOrNull(curves.referenceSpeedMps),
    constant_speed_mps: finiteOrNull(constantSpeed),
    constant_power_W: finiteOrNull(constantPower),
    distance_m: distance,
    wind: {
      hub_height_m: hubHeight,
      hub_speed_factor: finiteOrNull(scale.hub),
      rider_speed_factor: finiteOrNull(scale.rider),
      mean_speed_mps: finiteOrNull(meanRef),
      hub_mean_speed_mps: finiteOrNull(hubMean),
    },
    power_W: pair(bd.design.pedalW, bd.baseline.pedalW),
    delta_power_W: finiteOrNull(bd.design.pedalW - bd.baseline.pedalW),
    time_s: pair(timeD, timeB),
    delta_time_s: finiteOrNull(timeD - timeB),
    speed_mps: pair(distance / timeD, distance / timeB),
    delta_speed_mps: finiteOrNull(distance / timeD - distance / timeB),
    delta_time_fraction: finiteOrNull((timeD - timeB) / timeB),
    delta_aero_power_fraction: finiteOrNull((aeroW(bd.design) - aeroB) / aeroB),
    aero_share: pair(aeroW(bd.design) / bd.design.netW, aeroB / bd.baseline.netW),
    power_breakdown_W: { design: breakdownDoc(bd.design), baseline: breakdownDoc(bd.baseline) },
    wind_averaged_axial_N: pair(avg.design.axialN, avg.baseline.axialN),
    wind_averaged_cda_m2: pair(avg.design.cdaM2, avg.baseline.cdaM2),
    wind_averaged_side_N: pair(avg.design.sideAbsN, avg.baseline.sideAbsN),
    wind_averaged_wheel_power_W: pair(avg.design.powerW, avg.baseline.powerW),
    yaw_p90_deg: finiteOrNull(radToDeg(yawP90)),
    yaw_mean_deg: finiteOrNull(radToDeg(meanYaw)),
    yaw_density: yawDensity,
    yaw_beyond_validity_fraction: finiteOrNull(beyondValidity),
    yaw_beyond_90_fraction: finiteOrNull(hist.fractionAbove),
    lean_deg: pair(radToDeg(gust.design.leanRad), radToDeg(gust.baseline.leanRad)),
    gust_impulse_Ns: pair(gust.design.impulseNs, gust.baseline.impulseNs),
    gust_lateral_speed_change_mps: pair(
      gust.design.lateralSpeedChangeMps,
      gust.baseline.lateralSpeedChangeMps,
    ),
    gust: {
      factor: ride.handling.gust_factor,
      duration_s: ride.handling.gust_duration_s,
      hub_speed_mps: finiteOrNull(ride.handling.gust_factor * hubMean),
      direction_deg: pair(gust.design.directionDeg, gust.baseline.directionDeg),
      yaw_deg: pair(gust.design.yawDeg, gust.baseline.yawDeg),
      side_N: pair(gust.design.sideN, gust.baseline.sideN),
      side_increment_N: pair(gust.design.sideIncrementN, gust.baseline.sideIncrementN),
      roll_moment_Nm: pair(gust.design.rollMomentNm, gust.baseline.rollMomentNm),
    },
    trail_m: pair(
      groundTrailM(ride.design.outer_radius_m, steeringGeometry),
      groundTrailM(ride.baseline.outer_radius_m, steeringGeometry),
    ),
    steering,
    flags: [...new Set(flags)],
    notes: [...RIDE_NOTES],
    cautions: [...RIDE_CAUTIONS],
  };
  if (ride.course !== undefined) {
    doc.segments = legs.map((leg, i) =>
      segmentResult(ride, leg, i, constantSpeed, scale, wheels, {
        designPower: designPowers[i]!,
        baselinePower: baselinePowers[i]!,
        designTime: designTimes[i]!,
        baselineTime: baselineTimes[i]!,
        shield,
        rho,
      }),
    );
  }
  return doc;
}

function segmentResult(
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
