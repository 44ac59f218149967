/**
 * The ride file: CoverSweep's own versioned JSON asking what a wheel design changes on the road against
 * a baseline wheel: power at constant speed, time at constant power, wind-averaged figures, handling.
 * Keys are snake_case with units. The `design` and `baseline` objects are case files' `wheel` objects,
 * `air` holds a case file's air keys, `steering` and `model` are as in a case file: all of these are
 * validated by the case-file rules (src/compute/caseFile.ts), with their messages' key paths renamed.
 * Parsing never throws: every problem becomes a message naming the key path, the value and the rule.
 */
import { z } from 'zod';
import {
  type CaseFile,
  type CaseModel,
  type CaseSteering,
  type CaseWheel,
  caseAirDensity,
  describeValue,
  keyPathText,
  MAX_NAME_CHARS,
  nameTooLong,
  type Parsed,
  parseJsonText,
  validateCase,
} from '../caseFile';
import { migrateRide } from '../fileVersion';

export const RIDE_FORMAT = 'coversweep-ride';
export const RIDE_VERSION = 1;

/** Documented defaults of the ride file (README "Ride"). */
export const RIDE_DEFAULTS = {
  /** Martin et al. 1998 measured chain efficiency. */
  drivetrain_efficiency: 0.976,
  /** Height of the rider-and-bike centre of mass (m), a road rider (common practice, no source). */
  com_height_m: 1.0,
  /** Share of a rear wheel's axial force acting with the frame in front of it (common practice, no source). */
  rear_shield: 0.75,
  /** Wind figures are usually 10 m station values (WMO-No. 8 standard exposure; from memory). */
  reference_height_m: 10,
  /** Open flat terrain, grass with isolated obstacles (Wieringa's class, as tabulated in WMO-No. 8; from memory). */
  roughness_length_m: 0.03,
  /** Height at which the rider's own drag meets the wind (m): about the middle of a rider's frontal area (common practice, no source). */
  rider_height_m: 1.0,
  /** Gust speed / mean speed near the ground, open terrain (common practice, no source). */
  gust_factor: 1.5,
  /** A gust's duration: the WMO gust is a 3 s mean (WMO-No. 8; from memory). */
  gust_duration_s: 3,
  gradient: 0,
} as const;

/** Bounds of the ride file's numbers. */
export const RIDE_LIMITS = {
  maxGroundSpeedMps: 30,
  maxPowerW: 2500,
  maxDistanceM: 1e6,
  maxGradient: 0.3,
  maxWindMps: 30,
  maxSegments: 1000,
  maxSectors: 72,
} as const;

export type WindSpeedSpec =
  | { kind: 'fixed'; speed_mps: number }
  | { kind: 'rayleigh'; mean_mps: number }
  | { kind: 'weibull'; shape: number; scale_mps: number };

export interface RideWind {
  /** One speed (at the reference height) ... */
  speed_mps?: number;
  /** ... or a distribution of speeds (at the reference height). */
  distribution?:
    | { type: 'rayleigh'; mean_mps: number }
    | { type: 'weibull'; shape: number; scale_mps: number };
  /** Direction the wind comes FROM: relative to the heading (compass when a course is given), or "uniform". */
  direction_deg: number | 'uniform';
  /** Wind-rose weights of equal sectors, the first centred on direction 0 (instead of direction_deg). */
  direction_weights?: number[];
  reference_height_m: number;
  roughness_length_m: number;
  /** null: the design wheel's outer radius. */
  hub_height_m: number | null;
  rider_height_m: number;
}

export interface RideRider {
  mass_kg: number;
  cda_m2: number;
  crr: number;
  drivetrain_efficiency: number;
  com_height_m: number;
}

export interface RideRide {
  power_W?: number;
  speed_mps?: number;
  /** Distance (m); with a course, the course's length. */
  distance_m: number;
  gradient: number;
}

export interface RideSegment {
  length_m: number;
  /** Compass heading of travel (deg). */
  heading_deg: number;
  gradient: number;
}

export interface RideHandling {
  gust_factor: number;
  gust_duration_s: number;
}

export interface RideFile {
  format: typeof RIDE_FORMAT;
  version: typeof RIDE_VERSION;
  name?: string;
  design: CaseWheel;
  baseline: CaseWheel;
  position: 'front' | 'rear';
  rear_shield: number;
  rider: RideRider;
  ride: RideRide;
  /** The air, in a case file's keys (one of: density; temperature + pressure/altitude + humidity). */
  air: {
    air_density_kgpm3?: number;
    temperature_c: number;
    pressure_pa?: number;
    altitude_m?: number;
    relative_humidity?: number;
  };
  wind: RideWind;
  course?: RideSegment[];
  handling: RideHandling;
  steering: CaseSteering;
  model: CaseModel;
}

/** Everything a ride needs from the case-file side: the design and baseline as normalised case files. */
export interface RideCases {
  design: CaseFile;
  baseline: CaseFile;
  rhoKgPerM3: number;
}

// ---------------------------------------------------------------------------------------------
// Schema helpers (messages in the case file's style)

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

const rideSchema = z.strictObject(
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

function issueMessages(issue: z.core.$ZodIssue, raw: unknown): string[] {
  const path = issue.path as PropertyKey[];
  if (issue.code === 'unrecognized_keys') {
    const where = path.map(String).join('.');
    const generic = where.replace(/\.\d+$/, '').replace(/^course$/, 'course[]');
    const allowed = generic === 'course[]' ? Object.keys(segmentShape) : ALLOWED_KEYS[where];
    const at = keyPathText(path);
    return issue.keys.map((key) => {
      const keyPath = where === '' ? key : `${at}.${key}`;
      return `${keyPath}: unknown key${allowed ? ` (allowed here: ${allowed.join(', ')})` : ''}`;
    });
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

// ---------------------------------------------------------------------------------------------
// Parsing

/** Parse and validate ride-file text. Never throws. */
export function parseRideFile(text: string): Parsed<RideFile> {
  try {
    const json = parseJsonText(text, 'ride file');
    if (!json.ok) return json;
    return validateRide(json.value);
  } catch (error) {
    return { ok: false, errors: [`internal error while reading the ride: ${errorText(error)}`] };
  }
}

/** Validate an already-parsed JSON value as a ride, fill defaults. Never throws. */
export function validateRide(raw: unknown): Parsed<RideFile> {
  try {
    return validateRideUnsafe(raw);
  } catch (error) {
    return { ok: false, errors: [`internal error while validating the ride: ${errorText(error)}`] };
  }
}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** Re-label a case-file message's key path (`wheel...` -> `design...`). */
function relabel(message: string, from: string, to: string): string {
  const head = message.startsWith(from) ? to + message.slice(from.length) : message;
  return head.replaceAll(`${from}.`, `${to}.`);
}

function validateRideUnsafe(given: unknown): Parsed<RideFile> {
  const errors: string[] = [];
  // Older versions (and files without a version: version 1) are brought up to date first.
  const migrated = migrateRide(given);
  if (!migrated.ok) return migrated;
  const raw = migrated.value;
  if (raw !== null && typeof raw === 'object' && !Array.isArray(raw)) {
    const top = raw as Record<string, unknown>;
    if (top.format !== undefined && top.format !== RIDE_FORMAT) {
      errors.push(`format: must be "${RIDE_FORMAT}", got ${describeValue(top.format)}`);
    }
  }
  const result = rideSchema.safeParse(raw, { reportInput: true });
  if (!result.success) {
    for (const issue of result.error.issues) errors.push(...issueMessages(issue, raw));
    // Report the wheels' problems too, so that one run lists everything it can.
    if (raw !== null && typeof raw === 'object' && !Array.isArray(raw)) {
      for (const key of ['design', 'baseline'] as const) {
        const w = (raw as Record<string, unknown>)[key];
        if (w === null || typeof w !== 'object' || Array.isArray(w)) continue;
        const c = validateCase({ wheel: w, conditions: { airspeed_mps: 10, yaw_deg: 0 } });
        if (!c.ok) for (const m of c.errors) errors.push(relabel(m, 'wheel', key));
      }
    }
    return { ok: false, errors: [...new Set(errors)] };
  }
  const input = result.data;
  for (const key of ['design', 'baseline'] as const) {
    const w = input[key];
    if (w === undefined) errors.push(`${key}: is required (a wheel object, as in a case file's "wheel")`);
    else if (w === null || typeof w !== 'object' || Array.isArray(w)) {
      errors.push(
        `${key}: must be an object (a wheel, as in a case file's "wheel"), got ${describeValue(w)}`,
      );
    }
  }
  if (errors.length > 0) return { ok: false, errors };

  // The design, air, steering and model through the case-file rules.
  const airRaw = (input.air ?? {}) as Record<string, unknown>;
  const designCase = validateCase({
    wheel: input.design,
    conditions: { airspeed_mps: 10, yaw_deg: 0, ...airRaw },
    ...(input.steering !== undefined ? { steering: input.steering } : {}),
    ...(input.model !== undefined ? { model: input.model } : {}),
  });
  if (!designCase.ok) {
    for (const m of designCase.errors)
      errors.push(relabel(relabel(m, 'wheel', 'design'), 'conditions', 'air'));
  }
  const baselineCase = validateCase({ wheel: input.baseline, conditions: { airspeed_mps: 10, yaw_deg: 0 } });
  if (!baselineCase.ok) for (const m of baselineCase.errors) errors.push(relabel(m, 'wheel', 'baseline'));

  // Ride: exactly one of power and speed; a distance unless a course is given.
  const r = input.ride;
  if ((r.power_W === undefined) === (r.speed_mps === undefined)) {
    errors.push(
      `ride: must give exactly one of power_W (constant power) and speed_mps (constant speed), got ${
        r.power_W === undefined ? 'neither' : 'both'
      }`,
    );
  }
  const course = input.course?.map((s) => ({
    length_m: s.length_m,
    heading_deg: s.heading_deg,
    gradient: s.gradient ?? RIDE_DEFAULTS.gradient,
  }));
  let distance = r.distance_m;
  if (course !== undefined) {
    const total = course.reduce((a, s) => a + s.length_m, 0);
    if (distance !== undefined && Math.abs(distance - total) > 1e-6 * total) {
      errors.push(
        `ride.distance_m: must equal the course's length ${total} m when a course is given (or be left out), got ${distance}`,
      );
    }
    if (r.gradient !== undefined) {
      errors.push(
        `ride.gradient: cannot be given with a course (each segment has its own gradient), got ${r.gradient}`,
      );
    }
    distance = total;
  } else if (distance === undefined) {
    errors.push('ride.distance_m: is required (a number greater than 0 m) unless a course is given');
  }

  // Wind: exactly one of speed and distribution; at most one of direction and weights.
  const w = input.wind;
  if ((w.speed_mps === undefined) === (w.distribution === undefined)) {
    errors.push(
      `wind: must give exactly one of speed_mps (one wind speed) and distribution (rayleigh or weibull), got ${
        w.speed_mps === undefined ? 'neither' : 'both'
      }`,
    );
  }
  if (w.direction_deg !== undefined && w.direction_weights !== undefined) {
    errors.push(
      `wind.direction_weights: cannot be given together with wind.direction_deg (a wind rose or one direction), got ${describeValue(w.direction_weights)}`,
    );
  }
  if (w.direction_weights !== undefined && !w.direction_weights.some((x) => x > 0)) {
    errors.push(
      `wind.direction_weights: must have at least one weight greater than 0, got ${describeValue(w.direction_weights)}`,
    );
  }
  const roughness = w.roughness_length_m ?? RIDE_DEFAULTS.roughness_length_m;
  const reference = w.reference_height_m ?? RIDE_DEFAULTS.reference_height_m;
  const riderHeight = w.rider_height_m ?? RIDE_DEFAULTS.rider_height_m;
  const designRadius = designCase.ok ? designCase.value.wheel.outer_radius_m : Number.NaN;
  const hubHeight = w.hub_height_m ?? designRadius;
  const heights: [string, number][] = [
    ['wind.reference_height_m', reference],
    ['wind.rider_height_m', riderHeight],
    [
      w.hub_height_m !== undefined ? 'wind.hub_height_m' : 'wind.hub_height_m (the design outer radius)',
      hubHeight,
    ],
  ];
  for (const [name, h] of heights) {
    if (Number.isFinite(h) && !(h > 2 * roughness)) {
      errors.push(
        `${name}: must be greater than twice wind.roughness_length_m ${roughness} m for the logarithmic profile, got ${h}`,
      );
    }
  }
  if (errors.length > 0 || !designCase.ok || !baselineCase.ok)
    return { ok: false, errors: [...new Set(errors)] };

  const dc = designCase.value;
  const c = dc.conditions;
  const air: RideFile['air'] =
    c.air_density_kgpm3 !== undefined
      ? { air_density_kgpm3: c.air_density_kgpm3, temperature_c: c.temperature_c }
      : {
          temperature_c: c.temperature_c,
          ...(c.pressure_pa !== undefined ? { pressure_pa: c.pressure_pa } : {}),
          ...(c.altitude_m !== undefined ? { altitude_m: c.altitude_m } : {}),
          relative_humidity: c.relative_humidity ?? 0,
        };
  const rawModel = (input.model ?? {}) as Record<string, unknown>;
  const model: CaseModel = {
    ...dc.model,
    // The ride reads the lattice's forces only: the grid-convergence study is off unless asked for.
    grid_convergence: rawModel.grid_convergence === undefined ? false : dc.model.grid_convergence,
  };
  const wind: RideWind = {
    ...(w.speed_mps !== undefined ? { speed_mps: w.speed_mps } : {}),
    ...(w.distribution !== undefined ? { distribution: w.distribution } : {}),
    direction_deg: w.direction_weights !== undefined ? 'uniform' : (w.direction_deg ?? 'uniform'),
    ...(w.direction_weights !== undefined ? { direction_weights: w.direction_weights } : {}),
    reference_height_m: reference,
    roughness_length_m: roughness,
    hub_height_m: w.hub_height_m ?? null,
    rider_height_m: riderHeight,
  };
  const ride: RideFile = {
    format: RIDE_FORMAT,
    version: RIDE_VERSION,
    ...(input.name !== undefined ? { name: input.name } : {}),
    design: dc.wheel,
    baseline: baselineCase.value.wheel,
    position: input.position,
    rear_shield: input.rear_shield ?? RIDE_DEFAULTS.rear_shield,
    rider: {
      mass_kg: input.rider.mass_kg,
      cda_m2: input.rider.cda_m2,
      crr: input.rider.crr,
      drivetrain_efficiency: input.rider.drivetrain_efficiency ?? RIDE_DEFAULTS.drivetrain_efficiency,
      com_height_m: input.rider.com_height_m ?? RIDE_DEFAULTS.com_height_m,
    },
    ride: {
      ...(r.power_W !== undefined ? { power_W: r.power_W } : {}),
      ...(r.speed_mps !== undefined ? { speed_mps: r.speed_mps } : {}),
      distance_m: distance!,
      gradient: r.gradient ?? RIDE_DEFAULTS.gradient,
    },
    air,
    wind,
    ...(course !== undefined ? { course } : {}),
    handling: {
      gust_factor: input.handling?.gust_factor ?? RIDE_DEFAULTS.gust_factor,
      gust_duration_s: input.handling?.gust_duration_s ?? RIDE_DEFAULTS.gust_duration_s,
    },
    steering: dc.steering,
    model,
  };
  return { ok: true, value: ride };
}

/** The design and baseline as normalised case files (for the model input), and the air density. */
export function rideCases(ride: RideFile): RideCases {
  const conditions = {
    airspeed_mps: [10],
    yaw_deg: [0],
    ground_speed_mps: null,
    reference_speed_kmh: 50,
    ...ride.air,
  };
  const base = {
    format: 'coversweep-case' as const,
    version: 1 as const,
    conditions,
    steering: ride.steering,
    model: ride.model,
  };
  const design: CaseFile = { ...base, wheel: ride.design };
  const baseline: CaseFile = { ...base, wheel: ride.baseline };
  return { design, baseline, rhoKgPerM3: caseAirDensity(design) };
}
