/** The ride file's shape (zod), with messages in the case file's style (key path, value, rule). */

import { z } from 'zod';
import { describeValue, keyPathText, MAX_NAME_CHARS, nameTooLong } from '../caseFile';
import { unknownKeyMessage } from '../unknownKeyMessage';
import { RIDE_LIMITS } from './rideFileTypes';

interface Rule {
  min: number;
  max: number;
  minOpen?: boolean;
  unit?: string;
  integer?: boolean;
}

function ruleText(r: Rule): string {
  const kind = r.integer ? 'an integer' : 'a number';
  const u = r.unit ? ` ${r.unit}` : '';
  const lo = r.minOpen ? `greater than ${r.min}` : `at least ${r.min}`;
  return `must be ${kind} ${lo} and at most ${r.max}${u}`;
}

function num(r: Rule) {
  const text = ruleText(r);
  const ok = (v: number) =>
    Number.isFinite(v) &&
    (!r.integer || Number.isInteger(v)) &&
    (r.minOpen ? v > r.min : v >= r.min) &&
    v <= r.max;
  return z
    .number({ error: (iss) => `${text}, got ${describeValue(iss.input)}` })
    .refine(ok, { error: (iss) => `${text}, got ${describeValue(iss.input)}` });
}

const objectError = (what: string) => (iss: { input?: unknown }) =>
  `must be an object (${what}), got ${describeValue(iss.input)}`;

const anything = z.unknown();

const AIR_KEYS = [
  'air_density_kgpm3',
  'temperature_c',
  'pressure_pa',
  'altitude_m',
  'relative_humidity',
] as const;

const riderShape = {
  mass_kg: num({ min: 20, max: 300, unit: 'kg (rider and bike)' }),
  cda_m2: num({ min: 0, max: 1.5, unit: 'm^2 (rider and bike without this wheel)' }),
  crr: num({ min: 0, max: 0.05 }),
  drivetrain_efficiency: num({ min: 0.5, max: 1 }),
  com_height_m: num({ min: 0.3, max: 2, unit: 'm' }),
};

const rideShape = {
  power_W: num({ min: 0, max: RIDE_LIMITS.maxPowerW, minOpen: true, unit: 'W' }),
  speed_mps: num({ min: 0.5, max: RIDE_LIMITS.maxGroundSpeedMps, unit: 'm/s' }),
  distance_m: num({ min: 0, max: RIDE_LIMITS.maxDistanceM, minOpen: true, unit: 'm' }),
  gradient: num({ min: -RIDE_LIMITS.maxGradient, max: RIDE_LIMITS.maxGradient, unit: '(rise over run)' }),
};

const direction = z.union([num({ min: -360, max: 360, unit: 'deg' }), z.literal('uniform')], {
  error: (iss) =>
    `must be a number of degrees between -360 and 360 or "uniform", got ${describeValue(iss.input)}`,
});

const distributionSchema = z.discriminatedUnion(
  'type',
  [
    z.strictObject({
      type: z.literal('rayleigh'),
      mean_mps: num({ min: 0, max: RIDE_LIMITS.maxWindMps, unit: 'm/s' }),
    }),
    z.strictObject({
      type: z.literal('weibull'),
      shape: num({ min: 0.5, max: 10 }),
      scale_mps: num({ min: 0, max: RIDE_LIMITS.maxWindMps, unit: 'm/s' }),
    }),
  ],
  {
    error: (iss) =>
      `must be {"type": "rayleigh", "mean_mps": ...} or {"type": "weibull", "shape": ..., "scale_mps": ...}, got ${describeValue(iss.input)}`,
  },
);

const windShape = {
  speed_mps: num({ min: 0, max: RIDE_LIMITS.maxWindMps, unit: 'm/s' }),
  distribution: distributionSchema,
  direction_deg: direction,
  direction_weights: z
    .array(num({ min: 0, max: 1e6 }), {
      error: (iss) => `must be a list of sector weights (numbers >= 0), got ${describeValue(iss.input)}`,
    })
    .min(1, { error: () => 'must list at least one sector weight' })
    .max(RIDE_LIMITS.maxSectors, { error: () => `must list at most ${RIDE_LIMITS.maxSectors} sectors` }),
  reference_height_m: num({ min: 0.5, max: 200, unit: 'm' }),
  roughness_length_m: num({ min: 0.0001, max: 2, unit: 'm' }),
  // null (as a normalised ride file writes it): the design's outer radius.
  hub_height_m: num({ min: 0.05, max: 2, unit: 'm' }).nullable(),
  rider_height_m: num({ min: 0.2, max: 3, unit: 'm' }),
};

const segmentShape = {
  length_m: num({ min: 0, max: RIDE_LIMITS.maxDistanceM, minOpen: true, unit: 'm' }),
  heading_deg: num({ min: -360, max: 360, unit: 'deg (compass)' }),
  gradient: num({ min: -RIDE_LIMITS.maxGradient, max: RIDE_LIMITS.maxGradient, unit: '(rise over run)' }),
};

const handlingShape = {
  gust_factor: num({ min: 1, max: 3 }),
  gust_duration_s: num({ min: 0, max: 60, minOpen: true, unit: 's' }),
};

function partial<S extends Record<string, z.ZodType>>(shape: S) {
  const out: Record<string, z.ZodType> = {};
  for (const [k, v] of Object.entries(shape)) out[k] = v.optional();
  return out as { [K in keyof S]: z.ZodOptional<S[K]> };
}

export const rideSchema = z.strictObject(
  {
    format: anything.optional(),
    version: anything.optional(),
    name: z
      .string({ error: (iss) => `must be a string, got ${describeValue(iss.input)}` })
      .max(MAX_NAME_CHARS, { error: (iss) => nameTooLong(iss.input) })
      .optional(),
    design: anything.optional(),
    baseline: anything.optional(),
    position: z.enum(['front', 'rear'], {
      error: (iss) => `must be "front" or "rear", got ${describeValue(iss.input)}`,
    }),
    rear_shield: num({ min: 0, max: 1 }).optional(),
    rider: z.strictObject(
      {
        ...partial(riderShape),
        mass_kg: riderShape.mass_kg,
        cda_m2: riderShape.cda_m2,
        crr: riderShape.crr,
      },
      { error: objectError('the rider, with at least mass_kg, cda_m2 and crr') },
    ),
    ride: z.strictObject(partial(rideShape), {
      error: objectError('the ride: power_W or speed_mps, and distance_m'),
    }),
    air: z
      .strictObject(Object.fromEntries(AIR_KEYS.map((k) => [k, anything.optional()])), {
        error: objectError(
          'the air: air_density_kgpm3, or temperature_c, pressure_pa or altitude_m, relative_humidity',
        ),
      })
      .optional(),
    wind: z.strictObject(partial(windShape), {
      error: objectError(
        'the wind: speed_mps or distribution, direction_deg or direction_weights, reference_height_m',
      ),
    }),
    course: z
      .array(
        z.strictObject(
          { ...segmentShape, gradient: segmentShape.gradient.optional() },
          { error: objectError('a course segment: length_m, heading_deg, gradient') },
        ),
        { error: (iss) => `must be a list of segments, got ${describeValue(iss.input)}` },
      )
      .min(1, { error: () => 'must list at least one segment' })
      .max(RIDE_LIMITS.maxSegments, { error: () => `must list at most ${RIDE_LIMITS.maxSegments} segments` })
      .optional(),
    handling: z
      .strictObject(partial(handlingShape), { error: objectError('the handling options') })
      .optional(),
    steering: anything.optional(),
    model: anything.optional(),
  },
  { error: objectError('a CoverSweep ride') },
);

const ALLOWED_KEYS: Record<string, readonly string[]> = {
  '': [
    'format',
    'version',
    'name',
    'design',
    'baseline',
    'position',
    'rear_shield',
    'rider',
    'ride',
    'air',
    'wind',
    'course',
    'handling',
    'steering',
    'model',
  ],
  rider: Object.keys(riderShape),
  ride: Object.keys(rideShape),
  air: AIR_KEYS,
  wind: Object.keys(windShape),
  handling: Object.keys(handlingShape),
};

export function issueMessages(issue: z.core.$ZodIssue, raw: unknown): string[] {
  const path = issue.path as PropertyKey[];
  if (issue.code === 'unrecognized_keys') {
    const where = path.map(String).join('.');
    const generic = where.replace(/\.\d+$/, '').replace(/^course$/, 'course[]');
    const allowed = generic === 'course[]' ? Object.keys(segmentShape) : ALLOWED_KEYS[where];
    const at = keyPathText(path);
    return issue.keys.map((key) => unknownKeyMessage(where === '' ? '' : at, key, allowed));
  }
  const at = keyPathText(path);
  let v: unknown = raw;
  for (const key of path)
    v = v !== null && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[key] : undefined;
  if (v === undefined && path.length > 0) {
    const rule = issue.message.replace(/, got nothing$/, '').replace(/^must be /, '');
    return [`${at}: is required (${rule})`];
  }
  return [`${at}: ${issue.message}`];
}
