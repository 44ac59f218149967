/**
 * The case file: CoverSweep's own versioned JSON describing one wheel, the flow conditions (a list of
 * airspeeds x yaw angles), the steering axis and the model's options. Keys are snake_case and carry
 * their units. This module parses and validates it (zod for the shape, then the physical rules),
 * fills defaults, converts it to the model's SI input, solves it, and turns a solution into the output
 * document. It never throws on bad input: every problem becomes a message naming the key path, the
 * value and the rule.
 */
import { z } from 'zod';
import {
  airDensity,
  STANDARD_ATMOSPHERE_MAX_ALTITUDE_M,
  STANDARD_ATMOSPHERE_MIN_ALTITUDE_M,
  standardAtmosphere,
  sutherlandViscosity,
} from '../model/air/index';
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL } from '../model/wheel/defaults';
import { solveWheel } from '../model/wheel/solveWheel';
import type {
  ComponentLoads,
  ComponentName,
  CoverPlacement,
  FlowConditions,
  ModelOptions,
  PointResult,
  SpokeSection,
  SteeringGeometry,
  WheelGeometry,
  WheelSolution,
} from '../model/wheel/types';
import { COMPONENT_NAMES as MODEL_COMPONENT_NAMES } from '../model/wheel/types';
import { migrateCase } from './fileVersion';
import { findDuplicateKey } from './findDuplicateKey';
import {
  celsiusToKelvin,
  degToRad,
  dragAreaToGramsForce,
  KELVIN_AT_0C,
  kmhToMps,
  mphToMps,
  radToDeg,
} from './units';

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

// ---------------------------------------------------------------------------------------------
// The normalised case (every default filled)

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

/** The invented default wheel (the model's demo wheel): 700c-like, 50 mm rim, 20 round spokes, no cover. */
export const DEFAULT_WHEEL: CaseWheel = {
  outer_radius_m: DEMO_WHEEL.outerRadiusM,
  tyre_width_m: DEMO_WHEEL.tyreWidthM,
  rim_depth_m: DEMO_WHEEL.rimDepthM,
  rim_width_m: DEMO_WHEEL.rimWidthM,
  hub_flange_radius_m: DEMO_WHEEL.hubFlangeRadiusM,
  hub_shell_diameter_m: DEMO_WHEEL.hubShellDiameterM,
  hub_shell_width_m: DEMO_WHEEL.hubShellWidthM,
  spokes: {
    count: DEMO_WHEEL.spokeCount,
    section: DEMO_WHEEL.spokeSection,
    diameter_m: DEMO_WHEEL.spokeDiameterM,
    width_m: DEMO_WHEEL.spokeWidthM,
    thickness_m: DEMO_WHEEL.spokeThicknessM,
  },
  cover: {
    fraction: DEMO_WHEEL.coverFraction,
    placement: DEMO_WHEEL.coverPlacement,
    sides: DEMO_WHEEL.coverSides,
  },
};

/** Default air: ISA sea level (15 C, 101325 Pa, dry), reference speed 50 km/h. */
export const DEFAULT_AIR = { temperature_c: 15, pressure_pa: 101325, relative_humidity: 0 } as const;
export const DEFAULT_REFERENCE_SPEED_KMH = 50;
/** The model's default steering axis in the file's units (73 deg, 45 mm). */
export const DEFAULT_STEERING_DEG: CaseSteering = {
  head_angle_deg: Number(radToDeg(DEFAULT_STEERING.headAngleRad).toPrecision(12)),
  fork_offset_m: DEFAULT_STEERING.forkOffsetM,
};

/** The model's own defaults, in the case file's keys. */
export function defaultCaseModel(): CaseModel {
  const o = DEFAULT_MODEL_OPTIONS;
  return {
    ground: o.ground,
    lattice_span: o.latticeSpanCount,
    lattice_chord: o.latticeChordCount,
    suction_recovered: o.suctionRecovered,
    porosity_scale: o.porosityScale,
    profile_drag_factor: o.profileDragFactor,
    one_sided_cover_spoke_share: o.oneSidedCoverSpokeShare,
    grid_convergence: o.gridConvergence,
  };
}

// ---------------------------------------------------------------------------------------------
// Messages

/** A short, printable description of a value found in a file. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : String(value);
  let text: string;
  try {
    text = JSON.stringify(value) ?? String(value);
  } catch {
    // Cyclic or too deeply nested to print (String() would recurse as deeply).
    text = Array.isArray(value) ? '[...]' : '{...}';
  }
  if (Array.isArray(value)) text = `a list ${text}`;
  else if (value !== null && typeof value === 'object') text = `an object ${text}`;
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/** Key path text: `wheel.cover.fraction`, `conditions.yaw_deg[2]`. */
export function keyPathText(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(top level)' : out;
}

// ---------------------------------------------------------------------------------------------
// Schema

interface NumberRule {
  min: number;
  max: number;
  minOpen?: boolean;
  maxOpen?: boolean;
  integer?: boolean;
  unit?: string;
}

function ruleText(r: NumberRule): string {
  const kind = r.integer ? 'an integer' : 'a number';
  const u = r.unit ? ` ${r.unit}` : '';
  if (r.max === Number.POSITIVE_INFINITY) {
    return r.minOpen
      ? `must be ${kind} greater than ${r.min}${u}`
      : `must be ${kind} of at least ${r.min}${u}`;
  }
  if (!r.minOpen && !r.maxOpen) return `must be ${kind} between ${r.min} and ${r.max}${u}`;
  const lo = r.minOpen ? `greater than ${r.min}` : `at least ${r.min}`;
  const hi = r.maxOpen ? `less than ${r.max}` : `at most ${r.max}`;
  return `must be ${kind} ${lo} and ${hi}${u}`;
}

function inRule(v: number, r: NumberRule): boolean {
  if (!Number.isFinite(v)) return false;
  if (r.integer && !Number.isInteger(v)) return false;
  if (r.minOpen ? !(v > r.min) : !(v >= r.min)) return false;
  if (r.maxOpen ? !(v < r.max) : !(v <= r.max)) return false;
  return true;
}

function num(r: NumberRule) {
  const text = ruleText(r);
  return z
    .number({ error: (iss) => `${text}, got ${describeValue(iss.input)}` })
    .refine((v) => inRule(v, r), { error: (iss) => `${text}, got ${describeValue(iss.input)}` });
}

/** A number or a non-empty list of numbers (the list form is kept; a scalar becomes a one-element list). */
function numOrList(r: NumberRule) {
  const text = `must be a number or a non-empty list of numbers, each ${ruleText(r).replace(/^must be a number /, '')}`;
  return z.preprocess(
    (v) => (typeof v === 'number' ? [v] : v),
    z
      .array(num(r), { error: (iss) => `${text}, got ${describeValue(iss.input)}` })
      .min(1, { error: () => `${text}, got an empty list` })
      .max(LIMITS.maxPointsPerCase, {
        error: () => `must have at most ${LIMITS.maxPointsPerCase} values`,
      }),
  );
}

function bool() {
  return z.boolean({ error: (iss) => `must be true or false, got ${describeValue(iss.input)}` });
}

function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (iss) =>
      `must be one of ${values.map((v) => JSON.stringify(v)).join(', ')}, got ${describeValue(iss.input)}`,
  });
}

const positiveLength = (max: number) => num({ min: 0, max, minOpen: true, unit: 'm' });

const spokesShape = {
  count: num({ min: 0, max: LIMITS.maxSpokeCount, integer: true }),
  section: oneOf(['round', 'bladed']),
  diameter_m: positiveLength(0.02),
  width_m: positiveLength(0.05),
  thickness_m: positiveLength(0.02),
};

const coverShape = {
  fraction: num({ min: 0, max: 1 }),
  placement: oneOf(['rim', 'hub', 'centre', 'explicit']),
  inner_radius_m: positiveLength(1),
  outer_radius_m: positiveLength(1),
  sides: z.union([z.literal(1), z.literal(2)], {
    error: (iss) => `must be 1 or 2 (covers on one side or both), got ${describeValue(iss.input)}`,
  }),
};

const wheelShape = {
  outer_radius_m: positiveLength(1),
  tyre_width_m: positiveLength(0.15),
  rim_depth_m: num({ min: 0, max: 1, unit: 'm' }),
  rim_width_m: positiveLength(0.15),
  hub_flange_radius_m: positiveLength(0.2),
  hub_shell_diameter_m: positiveLength(0.2),
  hub_shell_width_m: positiveLength(0.3),
};

const speed = { min: 0, max: LIMITS.maxSpeedMps, minOpen: true, unit: 'm/s' } as const;

const conditionsShape = {
  airspeed_mps: numOrList(speed),
  yaw_deg: numOrList({ min: -LIMITS.maxYawDeg, max: LIMITS.maxYawDeg, unit: 'deg' }),
  ground_speed_mps: num({ min: 0, max: LIMITS.maxSpeedMps, unit: 'm/s' }).nullable(),
  air_density_kgpm3: num({ min: LIMITS.minDensityKgPerM3, max: LIMITS.maxDensityKgPerM3, unit: 'kg/m^3' }),
  temperature_c: num({ min: LIMITS.minTemperatureC, max: LIMITS.maxTemperatureC, unit: 'C' }),
  pressure_pa: num({ min: LIMITS.minPressurePa, max: LIMITS.maxPressurePa, unit: 'Pa' }),
  altitude_m: num({
    min: STANDARD_ATMOSPHERE_MIN_ALTITUDE_M,
    max: STANDARD_ATMOSPHERE_MAX_ALTITUDE_M,
    unit: 'm (ISA troposphere)',
  }),
  relative_humidity: num({ min: 0, max: 1 }),
  reference_speed_kmh: num({ min: 0, max: LIMITS.maxReferenceSpeedKmh, minOpen: true, unit: 'km/h' }),
};

const steeringShape = {
  head_angle_deg: num({ min: 45, max: 90, unit: 'deg' }),
  fork_offset_m: num({ min: -0.1, max: 0.2, unit: 'm' }),
};

const modelShape = {
  ground: bool(),
  lattice_span: num({ min: 4, max: LIMITS.maxLatticeCount, integer: true }),
  lattice_chord: num({ min: 2, max: LIMITS.maxLatticeCount, integer: true }),
  suction_recovered: num({ min: 0, max: 1 }),
  porosity_scale: num({ min: 0, max: 1000, minOpen: true }),
  profile_drag_factor: num({ min: 0, max: 100, minOpen: true }),
  one_sided_cover_spoke_share: num({ min: 0, max: 1 }),
  grid_convergence: bool(),
};

function partial<S extends Record<string, z.ZodType>>(shape: S) {
  const out: Record<string, z.ZodType> = {};
  for (const [k, v] of Object.entries(shape)) out[k] = v.optional();
  return out as { [K in keyof S]: z.ZodOptional<S[K]> };
}

/** Longest case name accepted (characters): a name labels a design, it is not a document. */
export const MAX_NAME_CHARS = 200;

/** The message for a name over MAX_NAME_CHARS (its start, cut, and its length). */
export function nameTooLong(name: unknown): string {
  const text = String(name);
  return `must be at most ${MAX_NAME_CHARS} characters, got ${text.length} ("${text.slice(0, 40)}...")`;
}

const objectError = (what: string) => (iss: { input?: unknown }) =>
  `must be an object (${what}), got ${describeValue(iss.input)}`;

const caseSchema = z.strictObject(
  {
    format: z.unknown().optional(),
    version: z.unknown().optional(),
    name: z
      .string({ error: (iss) => `must be a string, got ${describeValue(iss.input)}` })
      .max(MAX_NAME_CHARS, { error: (iss) => nameTooLong(iss.input) })
      .optional(),
    wheel: z
      .strictObject(
        {
          ...partial(wheelShape),
          spokes: z.strictObject(partial(spokesShape), { error: objectError('the spokes') }).optional(),
          cover: z.strictObject(partial(coverShape), { error: objectError('the cover') }).optional(),
        },
        { error: objectError('the wheel') },
      )
      .optional(),
    conditions: z.strictObject(
      {
        ...partial(conditionsShape),
        airspeed_mps: conditionsShape.airspeed_mps,
        yaw_deg: conditionsShape.yaw_deg,
      },
      { error: objectError('the flow conditions, with at least airspeed_mps and yaw_deg') },
    ),
    steering: z.strictObject(partial(steeringShape), { error: objectError('the steering axis') }).optional(),
    model: z.strictObject(partial(modelShape), { error: objectError("the model's options") }).optional(),
  },
  { error: objectError('a CoverSweep case') },
);

/** Allowed keys at each object path (for "unknown key" messages). */
const ALLOWED_KEYS: Record<string, readonly string[]> = {
  '': ['format', 'version', 'name', 'wheel', 'conditions', 'steering', 'model'],
  wheel: [...Object.keys(wheelShape), 'spokes', 'cover'],
  'wheel.spokes': Object.keys(spokesShape),
  'wheel.cover': Object.keys(coverShape),
  conditions: Object.keys(conditionsShape),
  steering: Object.keys(steeringShape),
  model: Object.keys(modelShape),
};

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const key of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

function issueMessages(issue: z.core.$ZodIssue, raw: unknown): string[] {
  let path = issue.path as PropertyKey[];
  // A scalar given where a list is allowed was wrapped into a one-element list: drop the [0].
  if (path.length > 0 && typeof path[path.length - 1] === 'number') {
    const parent = valueAt(raw, path.slice(0, -1));
    if (!Array.isArray(parent)) path = path.slice(0, -1);
  }
  if (issue.code === 'unrecognized_keys') {
    const where = path.map(String).join('.');
    const allowed = ALLOWED_KEYS[where];
    return issue.keys.map((key) => {
      const keyPath = where === '' ? key : `${where}.${key}`;
      return `${keyPath}: unknown key${allowed ? ` (allowed here: ${allowed.join(', ')})` : ''}`;
    });
  }
  const at = keyPathText(path);
  if (issue.code === 'invalid_type' && valueAt(raw, path) === undefined && path.length > 0) {
    const rule = issue.message.replace(/, got nothing$/, '');
    return [`${at}: is required (${rule.replace(/^must be /, '')})`];
  }
  return [`${at}: ${issue.message}`];
}

// ---------------------------------------------------------------------------------------------
// Parsing

/** Parse and validate case-file text. Never throws. */
export function parseCaseFile(text: string): Parsed<CaseFile> {
  try {
    const json = parseJsonText(text, 'case file');
    if (!json.ok) return json;
    return validateCase(json.value);
  } catch (error) {
    return { ok: false, errors: [`internal error while reading the case: ${errorText(error)}`] };
  }
}

/** Validate an already-parsed JSON value as a case, fill defaults. Never throws. */
export function validateCase(raw: unknown): Parsed<CaseFile> {
  try {
    return validateCaseUnsafe(raw);
  } catch (error) {
    return { ok: false, errors: [`internal error while validating the case: ${errorText(error)}`] };
  }
}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function validateCaseUnsafe(given: unknown): Parsed<CaseFile> {
  const errors: string[] = [];
  // Older versions (and files without a version: version 1) are brought up to date first.
  const migrated = migrateCase(given);
  if (!migrated.ok) return migrated;
  const raw = migrated.value;
  if (raw !== null && typeof raw === 'object' && !Array.isArray(raw)) {
    const top = raw as Record<string, unknown>;
    if (top.format !== undefined && top.format !== CASE_FORMAT) {
      errors.push(`format: must be "${CASE_FORMAT}", got ${describeValue(top.format)}`);
    }
  }
  const result = caseSchema.safeParse(raw, { reportInput: true });
  if (!result.success) {
    for (const issue of result.error.issues) errors.push(...issueMessages(issue, raw));
    // Still report a rim deeper than the wheel when the numbers involved are themselves valid.
    const radial = ['outer_radius_m', 'tyre_width_m', 'rim_depth_m', 'hub_flange_radius_m'] as const;
    const given = radial.map((k) => valueAt(raw, ['wheel', k]));
    if (given.every((v) => v === undefined || (typeof v === 'number' && Number.isFinite(v)))) {
      const [R, t, d, h] = radial.map((k, i) => (given[i] as number | undefined) ?? DEFAULT_WHEEL[k]) as [
        number,
        number,
        number,
        number,
      ];
      if (R > 0 && t > 0 && d >= 0 && h > 0) {
        const message = rimDeeperMessage(R, t, d, h);
        if (message) errors.push(message);
      }
    }
    return { ok: false, errors: dedupe(errors) };
  }
  if (errors.length > 0) return { ok: false, errors };
  const input = result.data;

  const w = input.wheel ?? {};
  const spokes = w.spokes ?? {};
  const cover = w.cover ?? {};
  const dw = DEFAULT_WHEEL;
  const wheel: CaseWheel = {
    outer_radius_m: w.outer_radius_m ?? dw.outer_radius_m,
    tyre_width_m: w.tyre_width_m ?? dw.tyre_width_m,
    rim_depth_m: w.rim_depth_m ?? dw.rim_depth_m,
    rim_width_m: w.rim_width_m ?? dw.rim_width_m,
    hub_flange_radius_m: w.hub_flange_radius_m ?? dw.hub_flange_radius_m,
    hub_shell_diameter_m: w.hub_shell_diameter_m ?? dw.hub_shell_diameter_m,
    hub_shell_width_m: w.hub_shell_width_m ?? dw.hub_shell_width_m,
    spokes: {
      count: spokes.count ?? dw.spokes.count,
      section: spokes.section ?? dw.spokes.section,
      diameter_m: spokes.diameter_m ?? dw.spokes.diameter_m,
      width_m: spokes.width_m ?? dw.spokes.width_m,
      thickness_m: spokes.thickness_m ?? dw.spokes.thickness_m,
    },
    cover: {
      fraction: cover.fraction ?? dw.cover.fraction,
      placement: cover.placement ?? dw.cover.placement,
      sides: cover.sides ?? dw.cover.sides,
    },
  };
  const R = wheel.outer_radius_m;
  const rimInner = R - wheel.tyre_width_m - wheel.rim_depth_m;
  const hub = wheel.hub_flange_radius_m;
  const rimMessage = rimDeeperMessage(R, wheel.tyre_width_m, wheel.rim_depth_m, hub);
  if (rimMessage) errors.push(rimMessage);
  if (wheel.hub_shell_diameter_m > 2 * hub) {
    errors.push(
      `wheel.hub_shell_diameter_m: must be at most twice wheel.hub_flange_radius_m (${round6(2 * hub)} m: the shell lies inside the flanges), got ${wheel.hub_shell_diameter_m}`,
    );
  }
  if (wheel.spokes.section === 'bladed' && wheel.spokes.thickness_m > wheel.spokes.width_m) {
    errors.push(
      `wheel.spokes.thickness_m: must be at most wheel.spokes.width_m ${wheel.spokes.width_m} m (a bladed spoke is wider than thick), got ${wheel.spokes.thickness_m}`,
    );
  }
  if (wheel.cover.placement === 'explicit') {
    if (cover.fraction !== undefined && cover.fraction !== 0) {
      // The radii set an explicit cover; a fraction beside them would be echoed but not used.
      errors.push(
        `wheel.cover.fraction: not used when wheel.cover.placement is "explicit" (the cover spans inner_radius_m to outer_radius_m); leave it out, got ${cover.fraction}`,
      );
    }
    const ci = cover.inner_radius_m;
    const co = cover.outer_radius_m;
    if (ci === undefined)
      errors.push('wheel.cover.inner_radius_m: is required when wheel.cover.placement is "explicit"');
    if (co === undefined)
      errors.push('wheel.cover.outer_radius_m: is required when wheel.cover.placement is "explicit"');
    if (ci !== undefined && co !== undefined) {
      wheel.cover.inner_radius_m = ci;
      wheel.cover.outer_radius_m = co;
      if (rimInner > hub) {
        if (ci < hub) {
          errors.push(
            `wheel.cover.inner_radius_m: must be at least the hub flange radius ${hub} m (inside the spoked annulus), got ${ci}`,
          );
        }
        if (co > rimInner + 1e-12) {
          errors.push(
            `wheel.cover.outer_radius_m: must be at most the rim's inner radius ${round6(rimInner)} m (outer radius - tyre width - rim depth), got ${co}`,
          );
        }
        if (!(co > ci)) {
          errors.push(
            `wheel.cover.outer_radius_m: must be greater than wheel.cover.inner_radius_m ${ci} m, got ${co}`,
          );
        }
      }
    }
  } else {
    for (const key of ['inner_radius_m', 'outer_radius_m'] as const) {
      if (cover[key] !== undefined) {
        errors.push(
          `wheel.cover.${key}: only used when wheel.cover.placement is "explicit" (placement is "${wheel.cover.placement}"; use wheel.cover.fraction), got ${cover[key]}`,
        );
      }
    }
  }

  const c = input.conditions;
  for (const [i, v] of c.airspeed_mps.entries()) {
    if (v < LIMITS.minSpeedMps) {
      const at = Array.isArray((raw as { conditions?: { airspeed_mps?: unknown } }).conditions?.airspeed_mps)
        ? `[${i}]`
        : '';
      errors.push(
        `conditions.airspeed_mps${at}: must be at least ${LIMITS.minSpeedMps} m/s (slower air is below what the model resolves), got ${v}`,
      );
    }
  }
  const conditions: CaseConditions = {
    airspeed_mps: c.airspeed_mps,
    yaw_deg: c.yaw_deg,
    ground_speed_mps: c.ground_speed_mps ?? null,
    temperature_c: DEFAULT_AIR.temperature_c,
  } as CaseConditions;
  if (c.air_density_kgpm3 !== undefined) {
    for (const key of ['pressure_pa', 'altitude_m', 'relative_humidity'] as const) {
      if (c[key] !== undefined) {
        errors.push(
          `conditions.${key}: cannot be given together with conditions.air_density_kgpm3 (give the density, or temperature + pressure/altitude + humidity), got ${c[key]}`,
        );
      }
    }
    conditions.temperature_c = c.temperature_c ?? DEFAULT_AIR.temperature_c;
    conditions.air_density_kgpm3 = c.air_density_kgpm3;
  } else if (c.altitude_m !== undefined) {
    if (c.pressure_pa !== undefined) {
      errors.push(
        `conditions.pressure_pa: cannot be given together with conditions.altitude_m (the altitude sets the pressure by the standard atmosphere), got ${c.pressure_pa}`,
      );
    }
    conditions.temperature_c =
      c.temperature_c ?? round12(standardAtmosphere(c.altitude_m).temperatureK - KELVIN_AT_0C);
    if (
      c.temperature_c === undefined &&
      !(
        conditions.temperature_c >= LIMITS.minTemperatureC &&
        conditions.temperature_c <= LIMITS.maxTemperatureC
      )
    ) {
      errors.push(
        `conditions.altitude_m: the standard atmosphere's temperature at ${c.altitude_m} m is ${conditions.temperature_c} C, outside the ${LIMITS.minTemperatureC}..${LIMITS.maxTemperatureC} C the air laws cover; give conditions.temperature_c for the day, got ${c.altitude_m}`,
      );
    }
    conditions.altitude_m = c.altitude_m;
    conditions.relative_humidity = c.relative_humidity ?? DEFAULT_AIR.relative_humidity;
  } else {
    conditions.temperature_c = c.temperature_c ?? DEFAULT_AIR.temperature_c;
    conditions.pressure_pa = c.pressure_pa ?? DEFAULT_AIR.pressure_pa;
    conditions.relative_humidity = c.relative_humidity ?? DEFAULT_AIR.relative_humidity;
  }

  conditions.reference_speed_kmh = c.reference_speed_kmh ?? DEFAULT_REFERENCE_SPEED_KMH;

  const s = input.steering ?? {};
  const steering: CaseSteering = {
    head_angle_deg: s.head_angle_deg ?? DEFAULT_STEERING_DEG.head_angle_deg,
    fork_offset_m: s.fork_offset_m ?? DEFAULT_STEERING_DEG.fork_offset_m,
  };
  const m = input.model ?? {};
  const dm = defaultCaseModel();
  const model: CaseModel = {
    ground: m.ground ?? dm.ground,
    lattice_span: m.lattice_span ?? dm.lattice_span,
    lattice_chord: m.lattice_chord ?? dm.lattice_chord,
    suction_recovered: m.suction_recovered ?? dm.suction_recovered,
    porosity_scale: m.porosity_scale ?? dm.porosity_scale,
    profile_drag_factor: m.profile_drag_factor ?? dm.profile_drag_factor,
    one_sided_cover_spoke_share: m.one_sided_cover_spoke_share ?? dm.one_sided_cover_spoke_share,
    grid_convergence: m.grid_convergence ?? dm.grid_convergence,
  };

  const caseFile: CaseFile = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    ...(input.name !== undefined ? { name: input.name } : {}),
    wheel,
    conditions,
    steering,
    model,
  };

  if (model.lattice_span * model.lattice_chord > LIMITS.maxLatticePanels) {
    errors.push(
      `model.lattice_chord: model.lattice_span x model.lattice_chord must be at most ${LIMITS.maxLatticePanels} panels (the solve's cost grows with the cube), got ${model.lattice_span} x ${model.lattice_chord} = ${model.lattice_span * model.lattice_chord}`,
    );
  }

  if (errors.length === 0) {
    // Air density from the description, checked against the plausible range.
    let rho: number | null = null;
    try {
      rho = caseAirDensity(caseFile);
    } catch (error) {
      errors.push(`conditions: cannot compute the air density: ${errorText(error)}`);
    }
    if (
      rho !== null &&
      conditions.air_density_kgpm3 === undefined &&
      !(rho >= LIMITS.minDensityKgPerM3 && rho <= LIMITS.maxDensityKgPerM3)
    ) {
      errors.push(
        `conditions: the air density computed from temperature_c, pressure_pa/altitude_m and relative_humidity must be between ${LIMITS.minDensityKgPerM3} and ${LIMITS.maxDensityKgPerM3} kg/m^3, got ${rho}`,
      );
    }
  }
  if (errors.length > 0) return { ok: false, errors: dedupe(errors) };
  return { ok: true, value: caseFile };
}

/** The rule "rim depth + tyre width < outer radius - hub flange radius", or null when it holds. */
function rimDeeperMessage(R: number, tyreWidth: number, rimDepth: number, hub: number): string | null {
  if (rimDepth + tyreWidth < R - hub) return null;
  return (
    `wheel.rim_depth_m: rim depth ${rimDepth} m + tyre width ${tyreWidth} m must be less than ` +
    `outer radius ${R} m - hub flange radius ${hub} m = ${round6(R - hub)} m (the rim is deeper than the wheel), got ${round6(rimDepth + tyreWidth)} m`
  );
}

function dedupe(list: string[]): string[] {
  return [...new Set(list)];
}

function round6(x: number): number {
  return Math.round(x * 1e6) / 1e6;
}

function round12(x: number): number {
  return Math.round(x * 1e12) / 1e12;
}

// ---------------------------------------------------------------------------------------------
// Conversion to the model's input

export interface ModelInput {
  wheel: WheelGeometry;
  options: ModelOptions;
  steering: SteeringGeometry;
  points: FlowConditions[];
}

/** Air density of a (normalised) case (kg/m^3). */
export function caseAirDensity(caseFile: CaseFile): number {
  const c = caseFile.conditions;
  if (c.air_density_kgpm3 !== undefined) return c.air_density_kgpm3;
  const temperatureK = celsiusToKelvin(c.temperature_c);
  const pressurePa =
    c.altitude_m !== undefined ? standardAtmosphere(c.altitude_m).pressurePa : (c.pressure_pa ?? 101325);
  return airDensity({ temperatureK, pressurePa, relativeHumidity: c.relative_humidity ?? 0 });
}

/** Model input of a normalised case: SI units, one point per (airspeed, yaw), yaw varying fastest. */
export function caseToModelInput(caseFile: CaseFile): ModelInput {
  const w = caseFile.wheel;
  const explicit = w.cover.placement === 'explicit';
  const wheel: WheelGeometry = {
    outerRadiusM: w.outer_radius_m,
    tyreWidthM: w.tyre_width_m,
    rimDepthM: w.rim_depth_m,
    rimWidthM: w.rim_width_m,
    hubFlangeRadiusM: w.hub_flange_radius_m,
    hubShellDiameterM: w.hub_shell_diameter_m,
    hubShellWidthM: w.hub_shell_width_m,
    spokeCount: w.spokes.count,
    spokeSection: w.spokes.section,
    spokeDiameterM: w.spokes.diameter_m,
    spokeWidthM: w.spokes.width_m,
    spokeThicknessM: w.spokes.thickness_m,
    coverFraction: w.cover.fraction,
    coverPlacement: w.cover.placement,
    coverInnerRadiusM: explicit ? (w.cover.inner_radius_m ?? 0) : 0,
    coverOuterRadiusM: explicit ? (w.cover.outer_radius_m ?? 0) : 0,
    coverSides: w.cover.sides,
  };
  const m = caseFile.model;
  const options: ModelOptions = {
    ...DEFAULT_MODEL_OPTIONS,
    ground: m.ground,
    latticeSpanCount: m.lattice_span,
    latticeChordCount: m.lattice_chord,
    suctionRecovered: m.suction_recovered,
    porosityScale: m.porosity_scale,
    profileDragFactor: m.profile_drag_factor,
    oneSidedCoverSpokeShare: m.one_sided_cover_spoke_share,
    gridConvergence: m.grid_convergence,
  };
  const steering: SteeringGeometry = {
    headAngleRad: degToRad(caseFile.steering.head_angle_deg),
    forkOffsetM: caseFile.steering.fork_offset_m,
  };
  const c = caseFile.conditions;
  const rhoKgPerM3 = caseAirDensity(caseFile);
  const muPaS = sutherlandViscosity(celsiusToKelvin(c.temperature_c));
  const points: FlowConditions[] = [];
  for (const airspeedMps of c.airspeed_mps) {
    for (const yawDeg of c.yaw_deg) {
      points.push({
        airspeedMps,
        yawRad: degToRad(yawDeg),
        groundSpeedMps: c.ground_speed_mps ?? airspeedMps,
        rhoKgPerM3,
        muPaS,
      });
    }
  }
  return { wheel, options, steering, points };
}

// ---------------------------------------------------------------------------------------------
// Output document

export interface ComponentRow {
  axial_N: number | null;
  side_N: number | null;
  vertical_N: number | null;
  axle_torque_Nm: number | null;
}

export interface ResultRow {
  yaw_deg: number | null;
  airspeed_mps: number | null;
  ground_speed_mps: number | null;
  air_density_kgpm3: number | null;
  axial_N: number | null;
  side_N: number | null;
  vertical_N: number | null;
  wind_drag_N: number | null;
  wind_lift_N: number | null;
  cp_x_m: number | null;
  cp_z_m: number | null;
  yaw_moment_Nm: number | null;
  roll_moment_Nm: number | null;
  steering_moment_Nm: number | null;
  axle_torque_Nm: number | null;
  power_W: number | null;
  cda_axial_m2: number | null;
  cda_axial_cm2: number | null;
  axial_gf_ref: number | null;
  axial_gf_30mph: number | null;
  components: Record<ComponentName, ComponentRow>;
  uncertainty: { axial_N: number | null; side_N: number | null };
  flags: string[];
}

export interface SurfaceDocument {
  side_slope_per_rad: number | null;
  induced_drag_factor: number | null;
  porous_drag_slope: number | null;
  panels: number | null;
  centre_x_m: number | null;
  centre_z_m: number | null;
  convergence: {
    fine: number | null;
    extrapolated: number | null;
    observed_order: number | null;
    gci_relative: number | null;
  } | null;
}

export interface ResultDocument {
  format: typeof RESULT_FORMAT;
  version: typeof RESULT_VERSION;
  case: CaseFile;
  surface: SurfaceDocument;
  results: ResultRow[];
  reference_speed_mps: number;
  notes: string[];
}

/** The result columns, in the documented order (components and uncertainty listed separately). */
export const RESULT_SCALAR_KEYS = [
  'yaw_deg',
  'airspeed_mps',
  'ground_speed_mps',
  'air_density_kgpm3',
  'axial_N',
  'side_N',
  'vertical_N',
  'wind_drag_N',
  'wind_lift_N',
  'cp_x_m',
  'cp_z_m',
  'yaw_moment_Nm',
  'roll_moment_Nm',
  'steering_moment_Nm',
  'axle_torque_Nm',
  'power_W',
  'cda_axial_m2',
  'cda_axial_cm2',
  'axial_gf_ref',
  'axial_gf_30mph',
] as const satisfies readonly (keyof ResultRow)[];

export const COMPONENT_KEYS = ['axial_N', 'side_N', 'vertical_N', 'axle_torque_Nm'] as const;

export const RESULT_NOTES: readonly string[] = [
  'axial_N is the force along the direction of travel (resisting motion, positive backwards), not wind-axis drag; it can turn negative at yaw',
  "wind_drag_N is along the apparent wind and wind_lift_N across it (horizontal); side_N > 0 pushes the wheel to the rider's left (+y)",
  "yaw_deg > 0 is wind from the rider's right; frame: origin at the hub, x forward, y left, z up",
  'cp_x_m / cp_z_m: centre of pressure of the side force, ahead of / above the hub (null when the side force is about zero)',
  "axial_gf_ref: grams-force of the axial drag area cda_axial_m2 at reference_speed_mps and this point's air density (g0 = 9.80665 m/s^2); axial_gf_30mph the same at 30 mph",
  'power_W = axial_N x ground speed + axle torque x rotation rate, for one wheel',
  'uncertainty: absolute grid-convergence index (Celik et al. 2008) of the lattice share of the force, null when not computed',
  'estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on qualified testing and the competition rules before riding a design',
];

/** A finite number, or null (NaN and infinities never reach JSON). */
export function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

function componentRow(loads: ComponentLoads): ComponentRow {
  return {
    axial_N: finiteOrNull(-loads.fxN),
    side_N: finiteOrNull(loads.fyN),
    vertical_N: finiteOrNull(loads.fzN),
    axle_torque_Nm: finiteOrNull(loads.axleTorqueNm),
  };
}

function resultRow(p: PointResult, referenceSpeedMps: number, yawDeg: number): ResultRow {
  const components = {} as Record<ComponentName, ComponentRow>;
  for (const name of COMPONENT_NAMES) components[name] = componentRow(p.components[name]);
  return {
    yaw_deg: finiteOrNull(yawDeg),
    airspeed_mps: finiteOrNull(p.airspeedMps),
    ground_speed_mps: finiteOrNull(p.groundSpeedMps),
    air_density_kgpm3: finiteOrNull(p.rhoKgPerM3),
    axial_N: finiteOrNull(p.axialN),
    side_N: finiteOrNull(p.sideN),
    vertical_N: finiteOrNull(p.verticalN),
    wind_drag_N: finiteOrNull(p.windDragN),
    wind_lift_N: finiteOrNull(p.windLiftN),
    cp_x_m: finiteOrNull(p.cpXM),
    cp_z_m: finiteOrNull(p.cpZM),
    yaw_moment_Nm: finiteOrNull(p.yawMomentNm),
    roll_moment_Nm: finiteOrNull(p.rollMomentNm),
    steering_moment_Nm: finiteOrNull(p.steeringMomentNm),
    axle_torque_Nm: finiteOrNull(p.axleTorqueNm),
    power_W: finiteOrNull(p.powerW),
    cda_axial_m2: finiteOrNull(p.cdaAxialM2),
    cda_axial_cm2: finiteOrNull(p.cdaAxialM2 * 1e4),
    axial_gf_ref: finiteOrNull(dragAreaToGramsForce(p.cdaAxialM2, referenceSpeedMps, p.rhoKgPerM3)),
    axial_gf_30mph: finiteOrNull(dragAreaToGramsForce(p.cdaAxialM2, mphToMps(30), p.rhoKgPerM3)),
    components,
    uncertainty: { axial_N: finiteOrNull(p.uncertaintyAxialN), side_N: finiteOrNull(p.uncertaintySideN) },
    flags: [...p.flags],
  };
}

/**
 * Yaw of point i in the file's degrees: the value as the case gave it (points are airspeed-major,
 * yaw fastest), so 7.5 deg does not come back as 7.499999999999999 after deg -> rad -> deg.
 */
function pointYawDeg(caseFile: CaseFile, solution: WheelSolution, i: number): number {
  const yaws = caseFile.conditions.yaw_deg;
  const p = solution.points[i]!;
  const given = yaws[i % yaws.length];
  const expected = caseFile.conditions.airspeed_mps.length * yaws.length;
  if (
    solution.points.length === expected &&
    given !== undefined &&
    Math.abs(degToRad(given) - p.yawRad) <= 1e-12
  ) {
    return given;
  }
  return radToDeg(p.yawRad);
}

/** The output document of `solve` for a normalised case and the model's solution. */
export function solutionToDocument(caseFile: CaseFile, solution: WheelSolution): ResultDocument {
  const referenceSpeedMps = kmhToMps(caseFile.conditions.reference_speed_kmh);
  const s = solution.surface;
  const conv = s.convergence;
  return {
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    case: caseFile,
    surface: {
      side_slope_per_rad: finiteOrNull(s.sideSlopePerRad),
      induced_drag_factor: finiteOrNull(s.inducedDragFactor),
      porous_drag_slope: finiteOrNull(s.porousDragSlope),
      panels: finiteOrNull(s.panels),
      centre_x_m: finiteOrNull(s.centreXM),
      centre_z_m: finiteOrNull(s.centreZM),
      convergence: conv
        ? {
            fine: finiteOrNull(conv.fine),
            extrapolated: finiteOrNull(conv.extrapolated),
            observed_order: finiteOrNull(conv.observedOrder),
            gci_relative: finiteOrNull(conv.gciRelative),
          }
        : null,
    },
    results: solution.points.map((p, i) =>
      resultRow(p, referenceSpeedMps, pointYawDeg(caseFile, solution, i)),
    ),
    reference_speed_mps: referenceSpeedMps,
    notes: [...RESULT_NOTES],
  };
}

/** Solve one normalised case: model input, solve, output document. */
export function solveCase(caseFile: CaseFile): ResultDocument {
  return solutionToDocument(caseFile, solveWheel(caseToModelInput(caseFile)));
}

// ---------------------------------------------------------------------------------------------
// JSON text: parse without throwing, and say where broken JSON is broken (line and column). Node's
// JSON.parse messages do not always carry a position, so on failure a small recursive-descent
// scanner following the JSON grammar (RFC 8259, sections 2-7) finds the first offending character.
export type JsonParseResult = { ok: true; value: unknown } | { ok: false; errors: string[] };

const MAX_DEPTH = 512;

export function parseJsonText(text: string, label = 'input'): JsonParseResult {
  if (typeof text !== 'string') return { ok: false, errors: [`${label}: expected JSON text`] };
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    const value: unknown = JSON.parse(body);
    // Valid but absurdly deep JSON would overflow the stack of every recursive step after parsing
    // (validation, copying, messages): refuse it here, where the position is known.
    const deep = nestingBeyond(body, MAX_DEPTH);
    if (deep >= 0) {
      const { line, column } = lineColumn(body, deep);
      return {
        ok: false,
        errors: [`${label}: nesting deeper than ${MAX_DEPTH} levels at line ${line}, column ${column}`],
      };
    }
    const twice = findDuplicateKey(body);
    if (twice !== null) {
      const { line, column } = lineColumn(body, twice.pos);
      return {
        ok: false,
        errors: [
          `${twice.path}: the key "${twice.key}" appears twice in one object (line ${line}, column ${column}); name each key once`,
        ],
      };
    }
    return { ok: true, value };
  } catch (error) {
    let located: { pos: number; message: string } | null = null;
    try {
      located = findJsonSyntaxError(body);
    } catch {
      located = null;
    }
    if (located === null) {
      const reason = error instanceof Error ? error.message : String(error);
      return { ok: false, errors: [`${label}: invalid JSON: ${reason}`] };
    }
    const { line, column } = lineColumn(body, located.pos);
    return {
      ok: false,
      errors: [`${label}: invalid JSON at line ${line}, column ${column}: ${located.message}`],
    };
  }
}

/** Offset of the first bracket opening a level deeper than `max` in valid JSON text, or -1. */
function nestingBeyond(text: string, max: number): number {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++;
      else if (c === 34) inString = false;
    } else if (c === 34) {
      inString = true;
    } else if (c === 91 || c === 123) {
      if (++depth > max) return i;
    } else if (c === 93 || c === 125) {
      depth--;
    }
  }
  return -1;
}

/** 1-based line and column of a character offset. */
export function lineColumn(text: string, pos: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < pos && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: pos - lineStart + 1 };
}

class JsonSyntaxError {
  constructor(
    readonly pos: number,
    readonly message: string,
  ) {}
}

function describeAt(text: string, pos: number): string {
  if (pos >= text.length) return 'the end of the text';
  const ch = text[pos]!;
  if (ch === '\n') return 'a line break';
  return JSON.stringify(ch);
}

/** The first syntax error of `text` as JSON, or null when it is valid. */
export function findJsonSyntaxError(text: string): { pos: number; message: string } | null {
  let i = 0;
  const n = text.length;
  const fail = (message: string): never => {
    throw new JsonSyntaxError(i, `${message}, found ${describeAt(text, i)}`);
  };
  const ws = () => {
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 32 || c === 9 || c === 10 || c === 13) i++;
      else break;
    }
  };
  const literal = (word: string) => {
    for (let k = 0; k < word.length; k++) {
      if (text[i] !== word[k]) fail(`expected "${word}"`);
      i++;
    }
  };
  const string = () => {
    i++; // opening quote
    while (true) {
      if (i >= n) fail('unterminated string');
      const c = text.charCodeAt(i);
      if (c === 34) {
        i++;
        return;
      }
      if (c < 32) fail('control character or line break inside a string (escape it)');
      if (c === 92) {
        i++;
        const e = text[i];
        if (e === 'u') {
          for (let k = 1; k <= 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) {
              i += k;
              fail('expected 4 hex digits after \\u');
            }
          }
          i += 5;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i++;
        } else {
          fail('invalid escape in string');
        }
      } else {
        i++;
      }
    }
  };
  const digits = () => {
    const start = i;
    while (i < n && text.charCodeAt(i) >= 48 && text.charCodeAt(i) <= 57) i++;
    return i - start;
  };
  const number = () => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else if (digits() === 0) fail('expected a digit');
    if (text[i] === '.') {
      i++;
      if (digits() === 0) fail('expected a digit after the decimal point');
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      if (digits() === 0) fail('expected a digit in the exponent');
    }
  };
  const value = (depth: number) => {
    if (depth > MAX_DEPTH) fail(`nesting deeper than ${MAX_DEPTH} levels`);
    ws();
    const ch = text[i];
    if (ch === '{') {
      i++;
      ws();
      if (text[i] === '}') {
        i++;
        return;
      }
      while (true) {
        ws();
        if (text[i] !== '"') fail('expected a property name in double quotes');
        string();
        ws();
        if (text[i] !== ':') fail('expected ":" after the property name');
        i++;
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          ws();
          if (text[i] === '}') fail('trailing comma before "}" (not allowed in JSON)');
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail('expected "," or "}" after a property value');
      }
    } else if (ch === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      while (true) {
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          ws();
          if (text[i] === ']') fail('trailing comma before "]" (not allowed in JSON)');
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail('expected "," or "]" after a list element');
      }
    } else if (ch === '"') {
      string();
    } else if (ch === '-' || (ch !== undefined && ch >= '0' && ch <= '9')) {
      number();
    } else if (ch === 't') {
      literal('true');
    } else if (ch === 'f') {
      literal('false');
    } else if (ch === 'n') {
      literal('null');
    } else {
      fail(i >= n ? 'expected a value (the text is empty or ends early)' : 'expected a value');
    }
  };
  try {
    value(0);
    ws();
    if (i < n) fail('expected the end of the text after the top-level value');
    return null;
  } catch (error) {
    if (error instanceof JsonSyntaxError) return { pos: error.pos, message: error.message };
    throw error;
  }
}
