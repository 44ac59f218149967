/**
 * The case file's shape (zod) with the rule of every key in its messages, and the translation of
 * zod's issues into messages naming the key path, the value and the rule.
 */

import { z } from 'zod';
import {
  STANDARD_ATMOSPHERE_MAX_ALTITUDE_M,
  STANDARD_ATMOSPHERE_MIN_ALTITUDE_M,
} from '../../model/air/index';
import { describeValue, keyPathText } from '../describeValue';
import { unknownKeyMessage } from '../unknownKeyMessage';
import { LIMITS } from './caseTypes';

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
  fixed_lattice: bool(),
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

export const caseSchema = z.strictObject(
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

export function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const key of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

export function issueMessages(issue: z.core.$ZodIssue, raw: unknown): string[] {
  let path = issue.path as PropertyKey[];
  // A scalar given where a list is allowed was wrapped into a one-element list: drop the [0].
  if (path.length > 0 && typeof path[path.length - 1] === 'number') {
    const parent = valueAt(raw, path.slice(0, -1));
    if (!Array.isArray(parent)) path = path.slice(0, -1);
  }
  if (issue.code === 'unrecognized_keys') {
    const where = path.map(String).join('.');
    const allowed = ALLOWED_KEYS[where];
    return issue.keys.map((key) => unknownKeyMessage(where, key, allowed));
  }
  const at = keyPathText(path);
  if (issue.code === 'invalid_type' && valueAt(raw, path) === undefined && path.length > 0) {
    const rule = issue.message.replace(/, got nothing$/, '');
    return [`${at}: is required (${rule.replace(/^must be /, '')})`];
  }
  return [`${at}: ${issue.message}`];
}
