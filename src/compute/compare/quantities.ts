/**
 * Quantities a data column may hold, their allowed units and the factors to SI. Factors follow their
 * definitions (NIST SP 811 (2008), appendix B.8/B.9): 1 gf = 1e-3 kg x g0, 1 kgf = 1 kg x g0 with
 * g0 = 9.80665 m/s^2 (exact); 1 lbf = 0.45359237 kg x g0 = 4.4482216152605 N (exact by the avoirdupois
 * pound); 1 cm^2 = 1e-4 m^2; 1 km/h = 1/3.6 m/s; 1 mph = 0.44704 m/s (exact); 1 deg = pi/180 rad.
 * Shared constants come from ../units; only what it lacks is defined here.
 */
import { G0_MPS2, kmhToMps, mphToMps } from '../units';

/** Mass of the avoirdupois pound (kg), exact (NIST SP 811 B.8). */
export const KG_PER_POUND = 0.45359237;
/** Newtons per pound-force: KG_PER_POUND x g0, exact. */
export const NEWTONS_PER_LBF = KG_PER_POUND * G0_MPS2;

export const QUANTITIES = [
  'yaw_deg',
  'speed',
  'air_density',
  'axial_force',
  'drag_force_wind',
  'side_force',
  'drag_area',
  'drag_area_wind',
  'drag_coefficient',
  'drag_coefficient_wind',
  'side_coefficient',
  'yaw_moment',
  'steering_moment',
  'ignore',
] as const;
export type Quantity = (typeof QUANTITIES)[number];

export const UNITS = [
  'N',
  'gf',
  'kgf',
  'lbf',
  'm2',
  'cm2',
  'deg',
  'rad',
  'mps',
  'kmh',
  'mph',
  '1',
  'Nm',
  'Nmm',
  'kgpm3',
] as const;
export type Unit = (typeof UNITS)[number];

/** Multiply a value in the unit by this to get SI (N, m^2, rad, m/s, 1, N m, kg/m^3). */
export const UNIT_TO_SI: Readonly<Record<Unit, number>> = {
  N: 1,
  gf: 1e-3 * G0_MPS2,
  kgf: G0_MPS2,
  lbf: NEWTONS_PER_LBF,
  m2: 1,
  cm2: 1e-4,
  deg: Math.PI / 180,
  rad: 1,
  mps: 1,
  kmh: kmhToMps(1),
  mph: mphToMps(1),
  '1': 1,
  Nm: 1,
  Nmm: 1e-3,
  kgpm3: 1,
};

export const FORCE_UNITS: readonly Unit[] = ['N', 'gf', 'kgf', 'lbf'];
export const AREA_UNITS: readonly Unit[] = ['m2', 'cm2'];
export const SPEED_UNITS: readonly Unit[] = ['mps', 'kmh', 'mph'];
export const MOMENT_UNITS: readonly Unit[] = ['Nm', 'Nmm'];

/** Units allowed for each quantity. */
export const QUANTITY_UNITS: Readonly<Record<Quantity, readonly Unit[]>> = {
  yaw_deg: ['deg', 'rad'],
  speed: SPEED_UNITS,
  air_density: ['kgpm3'],
  axial_force: FORCE_UNITS,
  drag_force_wind: FORCE_UNITS,
  side_force: FORCE_UNITS,
  drag_area: AREA_UNITS,
  drag_area_wind: AREA_UNITS,
  drag_coefficient: ['1'],
  drag_coefficient_wind: ['1'],
  side_coefficient: ['1'],
  yaw_moment: MOMENT_UNITS,
  steering_moment: MOMENT_UNITS,
  ignore: [...UNITS],
};

/** Quantities that need a reference area. */
export const COEFFICIENT_QUANTITIES: readonly Quantity[] = [
  'drag_coefficient',
  'drag_coefficient_wind',
  'side_coefficient',
];

/** The compared outputs (every data quantity becomes one of these, in SI). */
export const OUTPUTS = ['axial_N', 'wind_drag_N', 'side_N', 'yaw_moment_Nm', 'steering_moment_Nm'] as const;
export type Output = (typeof OUTPUTS)[number];

/** Which output each measured quantity feeds. */
export const QUANTITY_OUTPUT: Partial<Record<Quantity, Output>> = {
  axial_force: 'axial_N',
  drag_area: 'axial_N',
  drag_coefficient: 'axial_N',
  drag_force_wind: 'wind_drag_N',
  drag_area_wind: 'wind_drag_N',
  drag_coefficient_wind: 'wind_drag_N',
  side_force: 'side_N',
  side_coefficient: 'side_N',
  yaw_moment: 'yaw_moment_Nm',
  steering_moment: 'steering_moment_Nm',
};

/** Plain names for messages. */
export const OUTPUT_LABEL: Readonly<Record<Output, string>> = {
  axial_N: 'axial drag',
  wind_drag_N: 'wind-axis drag',
  side_N: 'side force',
  yaw_moment_Nm: 'yaw moment',
  steering_moment_Nm: 'steering moment',
};

/** Convert a value in `unit` to SI. */
export function toSI(value: number, unit: Unit): number {
  return value * UNIT_TO_SI[unit];
}
