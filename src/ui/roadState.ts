/**
 * The "On the road" inputs as part of the page's state (URL, autosave, project file): rider, ride,
 * air, wind, gust and an optional course. Stored in the ride file's own units (SI, gradient as rise over
 * run); the panel shows km/h, km and percent. roadToRideRaw turns them, with the design and baseline
 * wheels, into a ride file that validateRide checks by the ride file's own rules, so the page and
 * `coversweep ride` accept and compute exactly the same rides.
 */
import { z } from 'zod';
import {
  type CaseConditions,
  type CaseFile,
  type CaseWheel,
  describeValue,
  keyPathText,
  type Parsed,
} from '../compute/caseFile';
import { RIDE_DEFAULTS, RIDE_FORMAT, RIDE_VERSION, type RideFile, validateRide } from '../compute/ride/index';

export interface RoadSegment {
  length_m: number;
  heading_deg: number;
  gradient: number;
}

export interface RoadState {
  position: 'front' | 'rear';
  rear_shield: number;
  rider: {
    mass_kg: number;
    cda_m2: number;
    crr: number;
    drivetrain_efficiency: number;
    com_height_m: number;
  };
  /** Compare at constant power (times over the distance) or constant speed (watts). */
  mode: 'power' | 'speed';
  power_W: number;
  speed_mps: number;
  /** Used without a course. */
  distance_m: number;
  gradient: number;
  /** 'design': the design's air (under "Air"); 'own': the three values below. */
  air: 'design' | 'own';
  temperature_c: number;
  altitude_m: number;
  relative_humidity: number;
  wind: {
    kind: 'fixed' | 'rayleigh' | 'weibull';
    speed_mps: number;
    mean_mps: number;
    shape: number;
    scale_mps: number;
    direction: 'fixed' | 'uniform';
    /** Direction the wind comes FROM: relative to the heading (0 = head wind), compass with a course. */
    direction_deg: number;
    reference_height_m: number;
    roughness_length_m: number;
  };
  handling: { gust_factor: number; gust_duration_s: number };
  use_course: boolean;
  course: RoadSegment[];
}

export const DEFAULT_ROAD: Readonly<RoadState> = Object.freeze({
  position: 'front',
  rear_shield: RIDE_DEFAULTS.rear_shield,
  rider: {
    mass_kg: 80,
    cda_m2: 0.24,
    crr: 0.004,
    drivetrain_efficiency: RIDE_DEFAULTS.drivetrain_efficiency,
    com_height_m: RIDE_DEFAULTS.com_height_m,
  },
  mode: 'power',
  power_W: 250,
  speed_mps: 40 / 3.6,
  distance_m: 40_000,
  gradient: 0,
  air: 'design',
  temperature_c: 20,
  altitude_m: 0,
  relative_humidity: 0.5,
  wind: {
    kind: 'fixed',
    speed_mps: 4,
    mean_mps: 4,
    shape: 2,
    scale_mps: 4.5,
    direction: 'uniform',
    direction_deg: 90,
    reference_height_m: RIDE_DEFAULTS.reference_height_m,
    roughness_length_m: RIDE_DEFAULTS.roughness_length_m,
  },
  handling: { gust_factor: RIDE_DEFAULTS.gust_factor, gust_duration_s: RIDE_DEFAULTS.gust_duration_s },
  use_course: false,
  course: [
    { length_m: 10_000, heading_deg: 0, gradient: 0 },
    { length_m: 10_000, heading_deg: 90, gradient: 0.01 },
    { length_m: 10_000, heading_deg: 180, gradient: 0 },
    { length_m: 10_000, heading_deg: 270, gradient: -0.01 },
  ],
}) as Readonly<RoadState>;

export function defaultRoad(): RoadState {
  return structuredClone(DEFAULT_ROAD) as RoadState;
}

const err = (rule: string) => (iss: { input?: unknown }) => `${rule}, got ${describeValue(iss.input)}`;
const finite = z
  .number({ error: err('must be a finite number') })
  .refine(Number.isFinite, { error: err('must be a finite number') });
const oneOf = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.enum(values, { error: err(`must be one of ${values.map((v) => JSON.stringify(v)).join(', ')}`) });
const obj = <S extends z.ZodRawShape>(shape: S, what: string) =>
  z.strictObject(shape, { error: err(`must be an object (${what})`) });

const roadSchema = obj(
  {
    position: oneOf(['front', 'rear']),
    rear_shield: finite,
    rider: obj(
      {
        mass_kg: finite,
        cda_m2: finite,
        crr: finite,
        drivetrain_efficiency: finite,
        com_height_m: finite,
      },
      'the rider',
    ),
    mode: oneOf(['power', 'speed']),
    power_W: finite,
    speed_mps: finite,
    distance_m: finite,
    gradient: finite,
    air: oneOf(['design', 'own']),
    temperature_c: finite,
    altitude_m: finite,
    relative_humidity: finite,
    wind: obj(
      {
        kind: oneOf(['fixed', 'rayleigh', 'weibull']),
        speed_mps: finite,
        mean_mps: finite,
        shape: finite,
        scale_mps: finite,
        direction: oneOf(['fixed', 'uniform']),
        direction_deg: finite,
        reference_height_m: finite,
        roughness_length_m: finite,
      },
      'the wind',
    ),
    handling: obj({ gust_factor: finite, gust_duration_s: finite }, 'the gust'),
    use_course: z.boolean({ error: err('must be true or false') }),
    course: z
      .array(obj({ length_m: finite, heading_deg: finite, gradient: finite }, 'a course segment'), {
        error: err('must be a list of course segments'),
      })
      .max(200, { error: err('must list at most 200 segments') }),
  },
  'the road inputs',
);

function isObject(x: unknown): x is Record<string, unknown> {
  return x !== null && typeof x === 'object' && !Array.isArray(x);
}

/**
 * Check the shape of stored road inputs (types and keys; missing keys take their defaults). The values'
 * ranges are the ride file's rules, checked by validateRoadFor with a design. Never throws.
 */
export function validateRoadShape(raw: unknown, where = 'road'): Parsed<RoadState> {
  const d = defaultRoad();
  const merged = isObject(raw)
    ? {
        ...d,
        ...raw,
        rider: isObject(raw.rider) ? { ...d.rider, ...raw.rider } : (raw.rider ?? d.rider),
        wind: isObject(raw.wind) ? { ...d.wind, ...raw.wind } : (raw.wind ?? d.wind),
        handling: isObject(raw.handling) ? { ...d.handling, ...raw.handling } : (raw.handling ?? d.handling),
      }
    : raw;
  const r = roadSchema.safeParse(merged);
  if (r.success) return { ok: true, value: r.data as RoadState };
  return {
    ok: false,
    errors: r.error.issues.map((i) => {
      const path = keyPathText([where, ...(i.path as PropertyKey[])]);
      if (i.code === 'unrecognized_keys') return `${path}: unknown key(s) ${i.keys.join(', ')}`;
      return `${path}: ${i.message}`;
    }),
  };
}

/** The design's air in a ride file's `air` keys. */
export function caseAirKeys(c: CaseConditions): Record<string, number> {
  if (c.air_density_kgpm3 !== undefined) {
    return { air_density_kgpm3: c.air_density_kgpm3, temperature_c: c.temperature_c };
  }
  const out: Record<string, number> = { temperature_c: c.temperature_c };
  if (c.pressure_pa !== undefined) out.pressure_pa = c.pressure_pa;
  if (c.altitude_m !== undefined) out.altitude_m = c.altitude_m;
  if (c.relative_humidity !== undefined) out.relative_humidity = c.relative_humidity;
  return out;
}

/**
 * A ride file (raw, to be validated) from the road inputs, the design (its wheel, air, steering and
 * model options) and the baseline wheel. The ride's lattice solves skip the grid-convergence study.
 */
export function roadToRideRaw(
  road: RoadState,
  design: CaseFile,
  baseline: CaseWheel,
  name?: string,
): Record<string, unknown> {
  const ride: Record<string, unknown> = road.use_course
    ? {}
    : { distance_m: road.distance_m, gradient: road.gradient };
  if (road.mode === 'power') ride.power_W = road.power_W;
  else ride.speed_mps = road.speed_mps;
  const w = road.wind;
  const wind: Record<string, unknown> = {
    direction_deg: w.direction === 'uniform' ? 'uniform' : w.direction_deg,
    reference_height_m: w.reference_height_m,
    roughness_length_m: w.roughness_length_m,
  };
  if (w.kind === 'fixed') wind.speed_mps = w.speed_mps;
  else if (w.kind === 'rayleigh') wind.distribution = { type: 'rayleigh', mean_mps: w.mean_mps };
  else wind.distribution = { type: 'weibull', shape: w.shape, scale_mps: w.scale_mps };
  const air =
    road.air === 'design'
      ? caseAirKeys(design.conditions)
      : {
          temperature_c: road.temperature_c,
          altitude_m: road.altitude_m,
          relative_humidity: road.relative_humidity,
        };
  return {
    format: RIDE_FORMAT,
    version: RIDE_VERSION,
    ...(name !== undefined ? { name } : {}),
    design: design.wheel,
    baseline,
    position: road.position,
    rear_shield: road.rear_shield,
    rider: { ...road.rider },
    ride,
    air,
    wind,
    ...(road.use_course ? { course: road.course.map((s) => ({ ...s })) } : {}),
    handling: { ...road.handling },
    steering: design.steering,
    model: { ...design.model, grid_convergence: false },
  };
}

/** Validate road inputs as a ride of `design` against `baseline` (the ride file's rules). */
export function validateRoadFor(road: RoadState, design: CaseFile, baseline: CaseWheel): Parsed<RideFile> {
  return validateRide(roadToRideRaw(road, design, baseline));
}

/**
 * Which road input a ride-file message is about: the input's key as the panel names it (e.g.
 * "rider.mass_kg", "wind.speed_mps", "course[2].length_m"), or null for messages about the wheels.
 */
export function rideMessageField(message: string, road: RoadState): string | null {
  const m = message.match(/^([A-Za-z_][\w.[\]]*?)(?: \([^)]*\))?:/);
  if (!m) return null;
  const path = m[1]!;
  if (path.startsWith('design') || path.startsWith('baseline') || path.startsWith('steering')) return null;
  if (path.startsWith('model') || path === 'format' || path === 'version') return null;
  if (path === 'ride') return road.mode === 'power' ? 'power_W' : 'speed_mps';
  if (path === 'ride.power_W') return 'power_W';
  if (path === 'ride.speed_mps') return 'speed_mps';
  if (path === 'ride.distance_m') return 'distance_m';
  if (path === 'ride.gradient') return 'gradient';
  if (path.startsWith('air.')) return road.air === 'design' ? 'air' : path.slice(4);
  if (path.startsWith('wind.distribution')) {
    const key = path.split('.')[2];
    return key === 'shape'
      ? 'wind.shape'
      : road.wind.kind === 'rayleigh'
        ? 'wind.mean_mps'
        : 'wind.scale_mps';
  }
  if (path === 'wind') return 'wind.speed_mps';
  if (path.startsWith('wind.hub_height_m')) return 'wind.roughness_length_m';
  if (path === 'wind.direction_deg') return 'wind.direction_deg';
  if (path.startsWith('course')) return path;
  return path;
}
