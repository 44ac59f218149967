/**
 * The study file: CoverSweep's own versioned JSON asking for the best design wheel for a ride. Keys are
 * snake_case with units:
 *   format "coversweep-study", version 1, name (optional),
 *   ride       a ride file's object (its `design` is the starting design, its `baseline` the reference),
 *   variables  the freed design variables: {"min", "max"} for a continuous one (cover_fraction,
 *              rim_depth_m, tyre_width_m), a list of choices for a discrete one (cover_sides,
 *              cover_placement, spoke_count, spoke_section); the rest stay as the ride's design has them,
 *   objective  the ride objective to minimise (an id of OBJECTIVES),
 *   limits     largest allowed values of objectives, e.g. {"steering_gust_Nm": 1.5} (none by default),
 *   search     optional: method ("nelder-mead", the default, or "grid": the grid alone, brute force),
 *              grid_points (one count for every continuous variable, or {"variable id": count, ...}),
 *              starts, max_evaluations, tolerance, lattice_span + lattice_chord,
 *   front      optional: handling (the figure the trade-off front is drawn against), limit_steps.
 * Parsing never throws: every problem is a message naming the key path, the value and the rule.
 */
import { describeValue, type Parsed, parseJsonText } from '../caseFile';
import { type FormatVersions, migrateFile } from '../fileVersion';
import { validateRide } from '../ride/index';
import { OBJECTIVES, rideObjective } from './objectives/index';
import type { DesignStudy } from './studyTypes';
import { checkVariables } from './studyVariables';

export const STUDY_FORMAT = 'coversweep-study';
export const STUDY_VERSION = 1;
export const STUDY_VERSIONS: FormatVersions = {
  format: STUDY_FORMAT,
  label: 'study-file',
  current: 1,
  steps: {},
};

/** Defaults of the optional `search` and `front` sections (README "Design studies"). */
export const STUDY_DEFAULTS = {
  grid_points: 5,
  starts: 3,
  max_evaluations: 200,
  tolerance: 0.002,
  limit_steps: 3,
} as const;

/** Bounds of the study file's numbers. */
export const STUDY_LIMITS = {
  maxGridPoints: 21,
  maxStarts: 10,
  maxEvaluations: 5000,
  maxCombinations: 64,
  maxLimitSteps: 20,
  maxLatticeCount: 200,
} as const;

type Obj = Record<string, unknown>;
const isObject = (v: unknown): v is Obj => v !== null && typeof v === 'object' && !Array.isArray(v);

function unknownKeys(o: Obj, allowed: readonly string[], path: string, errors: string[]): void {
  for (const k of Object.keys(o)) {
    if (!allowed.includes(k))
      errors.push(`${path}${k}: unknown key (expected one of: ${allowed.join(', ')})`);
  }
}

/** An integer in [min, max] at `path`, or the default when absent; pushes a message when invalid. */
function integerAt(
  o: Obj,
  key: string,
  path: string,
  min: number,
  max: number,
  dflt: number,
  errors: string[],
): number {
  const v = o[key];
  if (v === undefined) return dflt;
  if (typeof v !== 'number' || !Number.isInteger(v) || v < min || v > max) {
    errors.push(
      `${path}${key}: must be an integer at least ${min} and at most ${max}, got ${describeValue(v)}`,
    );
    return dflt;
  }
  return v;
}

export function parseStudyFile(text: string): Parsed<DesignStudy> {
  const json = parseJsonText(text, 'study file');
  if (!json.ok) return json;
  return validateStudy(json.value);
}

export function validateStudy(given: unknown): Parsed<DesignStudy> {
  const migrated = migrateFile(given, STUDY_VERSIONS);
  if (!migrated.ok) return migrated;
  const raw = migrated.value;
  if (!isObject(raw))
    return { ok: false, errors: [`the study file: must be a JSON object, got ${describeValue(raw)}`] };
  const errors: string[] = [];
  unknownKeys(
    raw,
    ['format', 'version', 'name', 'ride', 'variables', 'objective', 'limits', 'search', 'front'],
    '',
    errors,
  );
  if (raw.format !== STUDY_FORMAT)
    errors.push(`format: must be "${STUDY_FORMAT}", got ${describeValue(raw.format)}`);
  if (raw.name !== undefined && (typeof raw.name !== 'string' || raw.name.length > 200)) {
    errors.push(`name: must be text of at most 200 characters, got ${describeValue(raw.name)}`);
  }
  const ride = validateRide(raw.ride);
  if (raw.ride === undefined)
    errors.push('ride: is required (a ride file\'s object: "design", "baseline", "rider", "ride", ...)');
  else if (!ride.ok) errors.push(...ride.errors.map((m) => `ride.${m}`));
  const r = ride.ok ? ride.value : null;

  const objective = raw.objective;
  const known = OBJECTIVES.map((o) => o.id).join(', ');
  if (typeof objective !== 'string' || rideObjective(objective) === undefined) {
    errors.push(`objective: must be one of ${known}, got ${describeValue(objective)}`);
  } else if (r !== null) {
    const why = rideObjective(objective)!.applies(r);
    if (why !== null) errors.push(`objective: "${objective}" does not apply to this ride (${why})`);
  }

  const limits: Record<string, number> = {};
  if (raw.limits !== undefined && !isObject(raw.limits)) {
    errors.push(
      `limits: must be an object of objective ids and largest values, got ${describeValue(raw.limits)}`,
    );
  } else {
    for (const [id, v] of Object.entries((raw.limits as Obj | undefined) ?? {})) {
      const o = rideObjective(id);
      if (o === undefined) errors.push(`limits.${id}: unknown objective (expected one of: ${known})`);
      else if (typeof v !== 'number' || !Number.isFinite(v) || !(v > 0)) {
        errors.push(`limits.${id}: must be a number greater than 0 ${o.unit}, got ${describeValue(v)}`);
      } else if (r !== null && o.applies(r) !== null) {
        errors.push(`limits.${id}: does not apply to this ride (${o.applies(r)})`);
      } else limits[id] = v;
    }
  }

  const search = isObject(raw.search) ? raw.search : {};
  if (raw.search !== undefined && !isObject(raw.search))
    errors.push(`search: must be an object, got ${describeValue(raw.search)}`);
  unknownKeys(
    search,
    ['method', 'grid_points', 'starts', 'max_evaluations', 'tolerance', 'lattice_span', 'lattice_chord'],
    'search.',
    errors,
  );
  const L = STUDY_LIMITS;
  const method = search.method ?? 'nelder-mead';
  if (method !== 'nelder-mead' && method !== 'grid')
    errors.push(`search.method: must be "nelder-mead" or "grid", got ${describeValue(search.method)}`);
  const perVariable = isObject(search.grid_points) ? search.grid_points : null;
  const gridPoints = perVariable
    ? STUDY_DEFAULTS.grid_points
    : integerAt(search, 'grid_points', 'search.', 1, L.maxGridPoints, STUDY_DEFAULTS.grid_points, errors);
  const gridCounts: Record<string, number> = {};
  for (const id of Object.keys(perVariable ?? {})) {
    gridCounts[id] = integerAt(perVariable!, id, 'search.grid_points.', 1, L.maxGridPoints, 1, errors);
  }
  const starts = integerAt(search, 'starts', 'search.', 1, L.maxStarts, STUDY_DEFAULTS.starts, errors);
  const maxEvaluations = integerAt(
    search,
    'max_evaluations',
    'search.',
    1,
    L.maxEvaluations,
    STUDY_DEFAULTS.max_evaluations,
    errors,
  );
  let tolerance: number = STUDY_DEFAULTS.tolerance;
  if (search.tolerance !== undefined) {
    const t = search.tolerance;
    if (typeof t !== 'number' || !(t > 0 && t <= 0.5)) {
      errors.push(
        `search.tolerance: must be a number greater than 0 and at most 0.5 (a fraction of each variable's range), got ${describeValue(t)}`,
      );
    } else tolerance = t;
  }
  let lattice: { span: number; chord: number } | undefined;
  if ((search.lattice_span === undefined) !== (search.lattice_chord === undefined)) {
    errors.push(
      `search.${search.lattice_span === undefined ? 'lattice_span' : 'lattice_chord'}: must be given with search.${search.lattice_span === undefined ? 'lattice_chord' : 'lattice_span'} (both or neither)`,
    );
  } else if (search.lattice_span !== undefined) {
    lattice = {
      span: integerAt(search, 'lattice_span', 'search.', 4, L.maxLatticeCount, 4, errors),
      chord: integerAt(search, 'lattice_chord', 'search.', 2, L.maxLatticeCount, 2, errors),
    };
  }

  const front = isObject(raw.front) ? raw.front : {};
  if (raw.front !== undefined && !isObject(raw.front))
    errors.push(`front: must be an object, got ${describeValue(raw.front)}`);
  unknownKeys(front, ['handling', 'limit_steps'], 'front.', errors);
  const limitSteps = integerAt(
    front,
    'limit_steps',
    'front.',
    0,
    L.maxLimitSteps,
    STUDY_DEFAULTS.limit_steps,
    errors,
  );
  const handlingIds = OBJECTIVES.filter(
    (o) => o.kind === 'handling' && (r === null || o.applies(r) === null),
  ).map((o) => o.id);
  // Default: the first limited handling figure, else the steering moment (a front wheel) or the lean.
  const dfltHandling =
    Object.keys(limits).find((id) => handlingIds.includes(id)) ??
    (r?.position === 'rear' ? 'lean_gust_deg' : 'steering_gust_Nm');
  const handling = front.handling ?? dfltHandling;
  if (typeof handling !== 'string' || !handlingIds.includes(handling)) {
    errors.push(
      `front.handling: must be one of ${handlingIds.join(', ')}, got ${describeValue(front.handling)}`,
    );
  }

  const vars = r === null ? null : checkVariables(raw.variables, r.design, errors);
  if (vars !== null) {
    const combos = vars.discrete.reduce((a, v) => a * v.choices.length, 1);
    for (const id of Object.keys(gridCounts)) {
      if (!vars.continuous.some((v) => v.id === id))
        errors.push(
          `search.grid_points.${id}: not a freed continuous variable (freed: ${vars.continuous.map((v) => v.id).join(', ') || 'none'})`,
        );
    }
    const counts = vars.continuous.map((v) => gridCounts[v.id] ?? gridPoints);
    const grid = combos * counts.reduce((a, n) => a * n, 1);
    if (combos > L.maxCombinations) {
      errors.push(
        `variables: the discrete choices make ${combos} combinations, more than ${L.maxCombinations}; free fewer`,
      );
    } else if (grid > maxEvaluations) {
      errors.push(
        `search.max_evaluations: must be at least the start grid's ${grid} designs (${combos} combinations x ${counts.join(' x ') || 1}), got ${maxEvaluations}`,
      );
    }
  }
  if (errors.length > 0 || r === null || vars === null) return { ok: false, errors: [...new Set(errors)] };
  return {
    ok: true,
    value: {
      ...(typeof raw.name === 'string' ? { name: raw.name } : {}),
      ride: r,
      continuous: vars.continuous,
      discrete: vars.discrete,
      objective: objective as string,
      limits,
      search: {
        method: method as 'nelder-mead' | 'grid',
        gridPoints,
        gridCounts,
        starts,
        maxEvaluations,
        xTolerance: tolerance,
        ...(lattice ? { lattice } : {}),
      },
      front: { handling: handling as string, limitSteps },
    },
  };
}
