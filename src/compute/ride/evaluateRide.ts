/**
 * Evaluate a ride from its two yaw curves: wind states (speed and direction quadrature, height
 * corrections), power at constant speed, time at constant power, wind-averaged wheel figures, the yaw
 * distribution at the wheel, handling (steering moment features, lean and impulse in a gust) and, for a
 * course, the same per segment. Cheap (no lattice solve): a page can rerun it as inputs change.
 */
import { windAveragedWheelLoads } from '../../model/ride/windAveragedWheelLoads';
import { groundTrailM } from '../../model/wheel/steeringAxis';
import { VALIDITY } from '../../model/wheel/validity';
import { apparentWind } from '../../model/wind/apparentWind';
import { logWindProfileRatio } from '../../model/wind/logWindProfileRatio';
import { weightedHistogram } from '../../model/wind/weightedHistogram';
import { weightedQuantile } from '../../model/wind/weightedQuantile';
import { finiteOrNull } from '../caseFile';
import { degToRad, radToDeg } from '../units';
import { RIDE_CAUTIONS } from './cautions';
import {
  aeroW,
  BREAKDOWN_KEYS,
  type Breakdown,
  breakdownDoc,
  legPowerAtSpeed,
  legTimeAtPower,
  pair,
  type WindScale,
  zeroBreakdown,
} from './legPower';
import {
  MAX_RIDE_SPEED_MPS,
  MIN_RIDING_SPEED_MPS,
  type RideCurve,
  type RideCurves,
  rideSetup,
} from './rideCurves';
import {
  RIDE_NOTES,
  RIDE_QUADRATURE,
  RIDE_RESULT_FORMAT,
  RIDE_RESULT_VERSION,
  type RideDocument,
} from './rideDocument';
import type { RideFile } from './rideFile';
import { curveFlags, gustFor, steeringSummary } from './rideHandling';
import { buildLegs, combinedHubStates, meanWindSpeed } from './rideLegs';
import { segmentResult } from './segmentResult';

export * from './rideDocument';

const scratchWind = { airspeedMps: 0, yawRad: 0 };

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
