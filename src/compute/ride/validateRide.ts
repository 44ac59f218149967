/**
 * Reading a ride: parse the text, migrate, check the shape (rideSchema), then validate the design,
 * baseline, air, steering and model through the case-file rules, their messages' key paths renamed.
 * Never throws.
 */
import { type CaseModel, describeValue, type Parsed, parseJsonText, validateCase } from '../caseFile';
import { migrateRide } from '../fileVersion';
import { RIDE_DEFAULTS, RIDE_FORMAT, RIDE_VERSION, type RideFile, type RideWind } from './rideFileTypes';
import { issueMessages, rideSchema } from './rideSchema';

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
