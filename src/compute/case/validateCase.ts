/**
 * Reading a case: parse the text, migrate, check the shape (caseSchema), fill defaults, then check the
 * physical rules across keys (radii in order, one air description, a density in range). Never throws.
 */
import { standardAtmosphere } from '../../model/air/index';
import { describeValue } from '../describeValue';
import { migrateCase } from '../fileVersion';
import { parseJsonText } from '../parseJsonText';
import { KELVIN_AT_0C } from '../units';
import {
  DEFAULT_AIR,
  DEFAULT_REFERENCE_SPEED_KMH,
  DEFAULT_STEERING_DEG,
  DEFAULT_WHEEL,
  defaultCaseModel,
} from './caseDefaults';
import { caseSchema, issueMessages, valueAt } from './caseSchema';
import { caseAirDensity } from './caseToModelInput';
import {
  CASE_FORMAT,
  CASE_VERSION,
  type CaseConditions,
  type CaseFile,
  type CaseModel,
  type CaseSteering,
  type CaseWheel,
  LIMITS,
  type Parsed,
} from './caseTypes';

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
    ...(m.fixed_lattice === true ? { fixed_lattice: true } : {}),
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
