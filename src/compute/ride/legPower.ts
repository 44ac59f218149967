/** Power terms and times over a leg's wind states, at a constant speed or a constant power (Martin et al. 1998). */
import { emptyRidePower, ridePower } from '../../model/ride/ridePower';
import { speedForPower } from '../../model/ride/speedForPower';
import type { RidePower, RideSetup } from '../../model/ride/types';
import { finiteOrNull } from '../caseFile';
import { MAX_RIDE_SPEED_MPS, type RideCurve } from './rideCurves';
import type { Pair, PowerBreakdown } from './rideDocument';
import type { Leg } from './rideLegs';

export const BREAKDOWN_KEYS = [
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
export type Breakdown = Record<BreakdownKey, number>;

export function zeroBreakdown(): Breakdown {
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

export interface WindScale {
  hub: number;
  rider: number;
}

/** Weighted mean power terms at a constant ground speed over a leg's wind states. */
export function legPowerAtSpeed(
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
export function legTimeAtPower(
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

export function breakdownDoc(b: Breakdown): PowerBreakdown {
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

export function pair(design: number, baseline: number): Pair {
  return { design: finiteOrNull(design), baseline: finiteOrNull(baseline) };
}

export function aeroW(b: Breakdown): number {
  return b.riderAeroW + b.wheelAxialW + b.wheelRotationW;
}
