import { windAveragedWheelLoads } from '../../../model/ride/windAveragedWheelLoads';
import { windDirectionNodes } from '../../../model/wind/windDirectionNodes';
import { windSpeedNodes } from '../../../model/wind/windSpeedNodes';
import { windStates } from '../../../model/wind/windStates';
import type { RideObjective } from '../types';
import { ALWAYS } from './numberOrNaN';

/** SAE J1252 (1981) wind: 7 mph (3.129 m/s) from uniformly distributed directions (from memory). */
export const J1252_WIND_MPS = 7 * 0.44704;
/** Direction nodes of the uniform average (midpoint rule, exact for trigonometric polynomials of degree < 72). */
export const J1252_DIRECTION_NODES = 72;

const J1252_STATES = windStates(
  windSpeedNodes({ kind: 'fixed', speedMps: J1252_WIND_MPS }, 1),
  windDirectionNodes({ kind: 'uniform' }, J1252_DIRECTION_NODES),
);

/**
 * The wheel's axial force averaged SAE J1252 style at the ride's constant speed (N): a 7 mph wind at
 * hub height from every direction with equal probability, each direction's apparent wind read off the
 * design's yaw curve (windAveragedWheelLoads); the rear-wheel shielding share applied.
 */
export const j1252AxialN: RideObjective = {
  id: 'j1252_axial_N',
  label: 'Wind-averaged axial drag (SAE J1252)',
  unit: 'N',
  kind: 'performance',
  description:
    "the wheel's axial force averaged over a 7 mph wind from uniformly distributed directions (SAE J1252) at the ride's constant speed",
  applies: ALWAYS,
  compute: (d) => {
    const speed = d.doc.constant_speed_mps;
    if (speed === null || !(speed > 0)) return Number.NaN;
    return windAveragedWheelLoads(d.curve, speed, J1252_STATES, d.doc.shield, d.context.rhoKgPerM3).axialN;
  },
};
