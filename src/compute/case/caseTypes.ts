/** The case file's format names, its edge limits and the normalised case (every default filled). */
import type { ComponentName, CoverPlacement, SpokeSection } from '../../model/wheel/types';
import { COMPONENT_NAMES as MODEL_COMPONENT_NAMES } from '../../model/wheel/types';

export const CASE_FORMAT = 'coversweep-case';
export const RESULT_FORMAT = 'coversweep-result';
export const CASE_VERSION = 1;
export const RESULT_VERSION = 1;

/** Limits of the edge rules (documented in the README's "Command line" section). */
export const LIMITS = {
  maxSpeedMps: 60,
  /** Smallest airspeed a case may ask for (m/s); the model flags anything below 2 m/s anyway. */
  minSpeedMps: 0.001,
  maxYawDeg: 90,
  minDensityKgPerM3: 0.3,
  maxDensityKgPerM3: 1.6,
  maxSpokeCount: 200,
  maxPointsPerCase: 10000,
  minTemperatureC: -40,
  maxTemperatureC: 50,
  minPressurePa: 30000,
  maxPressurePa: 110000,
  maxLatticeCount: 200,
  maxLatticePanels: 2500,
  maxReferenceSpeedKmh: 216,
} as const;

/** Component names in the order the output lists them (the model's own list). */
export const COMPONENT_NAMES: readonly ComponentName[] = MODEL_COMPONENT_NAMES;

export interface CaseSpokes {
  count: number;
  section: SpokeSection;
  diameter_m: number;
  width_m: number;
  thickness_m: number;
}

export interface CaseCover {
  fraction: number;
  placement: CoverPlacement;
  /** Only for placement "explicit". */
  inner_radius_m?: number;
  outer_radius_m?: number;
  sides: 1 | 2;
}

export interface CaseWheel {
  outer_radius_m: number;
  tyre_width_m: number;
  rim_depth_m: number;
  rim_width_m: number;
  hub_flange_radius_m: number;
  hub_shell_diameter_m: number;
  hub_shell_width_m: number;
  spokes: CaseSpokes;
  cover: CaseCover;
}

export interface CaseConditions {
  airspeed_mps: number[];
  yaw_deg: number[];
  /** null: equal to each point's airspeed (the wind-tunnel convention). */
  ground_speed_mps: number | null;
  temperature_c: number;
  /** Exactly one air description: a given density, or pressure (or altitude) with humidity. */
  air_density_kgpm3?: number;
  pressure_pa?: number;
  altitude_m?: number;
  relative_humidity?: number;
  reference_speed_kmh: number;
}

export interface CaseSteering {
  head_angle_deg: number;
  fork_offset_m: number;
}

export interface CaseModel {
  ground: boolean;
  lattice_span: number;
  lattice_chord: number;
  suction_recovered: number;
  porosity_scale: number;
  profile_drag_factor: number;
  one_sided_cover_spoke_share: number;
  grid_convergence: boolean;
  /** Solve on the fixed lattice (ModelOptions.fixedLattice); echoed only when true. */
  fixed_lattice?: boolean;
}

export interface CaseFile {
  format: typeof CASE_FORMAT;
  version: typeof CASE_VERSION;
  name?: string;
  wheel: CaseWheel;
  conditions: CaseConditions;
  steering: CaseSteering;
  model: CaseModel;
}

export type Parsed<T> = { ok: true; value: T } | { ok: false; errors: string[] };
