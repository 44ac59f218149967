/** Types, thresholds and message helpers shared by the slip checks (see detectSlips.ts for the method). */

import type { Output, Unit } from './quantities';

export type SlipCode =
  | 'unit_factor'
  | 'speed_unit'
  | 'area_unit'
  | 'reference_area'
  | 'scale_mismatch'
  | 'side_force_sign'
  | 'drag_axis'
  | 'side_force_at_zero_yaw'
  | 'dynamic_pressure_scaling'
  | 'beyond_model_range'
  | 'yaw_symmetry';

export interface SlipFlag {
  code: SlipCode;
  message: string;
  /** The output concerned, when one. */
  output?: Output;
  /** The factor data / model found, when relevant. */
  factor?: number;
}

/** A factor is blamed on a slip only when |ln r| > ln(MIN_FACTOR) and within SLIP_TOLERANCE of the slip's. */
export const MIN_FACTOR = 1.8;
export const SLIP_TOLERANCE = 1.3;
/**
 * How far the uncalibrated model may be from a wheel it describes (a factor either way) before a
 * difference says more about the data than about the model: common practice, no source (the
 * calibratable parameters move this model's drag by up to about 2x over their plausible ranges).
 */
export const MODEL_SPREAD = 2.2;
/**
 * Physical envelope of a wheel's force coefficients on its disc area pi R^2, with wide margins:
 * - axial (and wind-axis) drag at |yaw| <= 10 deg: 0.004..0.3. A 700C tyre alone (frontal area about
 *   0.017 m^2, Cd about 0.3) gives about 0.013 on the disc; a flat plate face-on gives 1.17 (Hoerner,
 *   Fluid-Dynamic Drag, 1965, ch. 3) and an edge-on wheel far less. The model's wheels give 0.017..0.06.
 * - side force per sin(yaw): 0.3..4 per unit sin(yaw). The exact lift slope of a thin circular wing is
 *   1.79 per radian (Kinner 1937; Jordan 1973), at most about doubled by the ground image; the model's
 *   bare spoked wheel gives about 1.2, its disc about 2.1.
 * Bounds: common practice, no source (the cited figures set their scale).
 */
export const PHYSICAL_ENVELOPE = {
  axialCoefficient: [0.004, 0.3],
  sideSlope: [0.3, 4],
} as const;

/** What to call the map's keys in messages (the page passes its control labels). */
export interface SlipLabels {
  side_force_sign?: string;
  yaw_moment_sign?: string;
  unit?: string;
  reference_area_m2?: string;
  /** What the unit control calls each unit (a page's menu text, e.g. "grams-force" for "gf"). */
  unit_values?: Partial<Record<Unit, string>>;
}

export interface DetectOptions {
  labels?: SlipLabels;
}
export const RAD = Math.PI / 180;

export interface Candidate {
  factor: number;
  code: SlipCode;
  text: string;
}

export function fmt(x: number, digits = 3): string {
  return Number(x.toPrecision(digits)).toString();
}

export function unitName(u: Unit): string {
  const names: Partial<Record<Unit, string>> = {
    N: 'newtons',
    gf: 'grams-force',
    kgf: 'kilograms-force',
    lbf: 'pounds-force',
    m2: 'm^2',
    cm2: 'cm^2',
    mps: 'm/s',
    kmh: 'km/h',
    mph: 'mph',
    Nm: 'N m',
    Nmm: 'N mm',
  };
  return names[u] ?? u;
}
