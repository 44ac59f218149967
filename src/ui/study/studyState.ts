/**
 * The design study's inputs as part of the page's state (URL, autosave, project file): the search
 * method, the design space (cover fraction x rim depth, each a range and a number of grid points), the
 * objective, the handling limits the user states (none by default: no published or trade figure was
 * found to support one) and the lattice of the evaluations. Only the inputs are stored: the result is
 * recomputed from them. studyToRaw turns them, with the ride the road inputs define, into a study file's
 * object that validateStudy checks by the study file's own rules, so the page and `coversweep optimise`
 * accept and compute exactly the same studies.
 */
import { z } from 'zod';
import { keyPathText, type Parsed } from '../../compute/caseFile';
import { OBJECTIVES, STUDY_DEFAULTS, STUDY_FORMAT, STUDY_VERSION } from '../../compute/design/index';
import type { RideFile } from '../../compute/ride/index';

/** The handling figures a limit may be put on (objective ids of kind 'handling'). */
export const LIMIT_IDS = ['steering_gust_Nm', 'lean_gust_deg', 'side_gust_N'] as const;
export type LimitId = (typeof LIMIT_IDS)[number];

export interface StudyRange {
  min: number;
  max: number;
  /** Grid points across the range (the grid method's resolution; the optimiser's start grid). */
  points: number;
}

export interface StudyInputs {
  method: 'grid' | 'nelder-mead';
  objective: string;
  /** Largest allowed value of each limited handling figure, in the objective's unit. */
  limits: Partial<Record<LimitId, number>>;
  coverFraction: StudyRange;
  /** Rim depth in millimetres (the page's unit; the study file takes metres). */
  rimDepthMm: StudyRange;
  lattice: { span: number; chord: number };
  /** Tyre width in millimetres, freed when present (absent: the current wheel's). */
  tyreWidthMm?: StudyRange;
  /** The discrete design variables, freed when present: the choices every design tries. */
  coverSides?: number[];
  coverPlacement?: string[];
  spokeCount?: number[];
  spokeSection?: string[];
  /** Colour and lines of the design map by a ride objective (absent or null: the view's own outputs). */
  mapColour?: string | null;
  mapContour?: string | null;
}

/** The discrete inputs and the study file's variable ids they free. */
export const DISCRETE_INPUTS = [
  ['coverSides', 'cover_sides'],
  ['coverPlacement', 'cover_placement'],
  ['spokeCount', 'spoke_count'],
  ['spokeSection', 'spoke_section'],
] as const;

/** The defaults: a 6 x 4 grid over the whole cover range and 30-90 mm rims, time over the ride, no limits. */
export function defaultStudyInputs(): StudyInputs {
  return {
    method: 'grid',
    objective: 'time_s',
    limits: {},
    coverFraction: { min: 0, max: 1, points: 6 },
    rimDepthMm: { min: 30, max: 90, points: 4 },
    lattice: { span: 12, chord: 6 },
  };
}

const finite = z.number().refine(Number.isFinite, { error: 'must be a finite number' });
const range = z.strictObject({
  min: finite,
  max: finite,
  points: z.number().int({ error: 'must be a whole number' }).min(1).max(21),
});
const schema = z.strictObject({
  method: z.enum(['grid', 'nelder-mead']),
  objective: z.string().max(60),
  limits: z.strictObject({
    steering_gust_Nm: finite.optional(),
    lean_gust_deg: finite.optional(),
    side_gust_N: finite.optional(),
  }),
  coverFraction: range,
  rimDepthMm: range,
  lattice: z.strictObject({
    span: z.number().int().min(4).max(200),
    chord: z.number().int().min(2).max(200),
  }),
  tyreWidthMm: range.optional(),
  coverSides: z.array(finite).max(8).optional(),
  coverPlacement: z.array(z.string().max(20)).max(8).optional(),
  spokeCount: z
    .array(z.number({ error: 'must be whole numbers separated by commas, e.g. 16, 20, 24' }))
    .max(40)
    .optional(),
  spokeSection: z.array(z.string().max(20)).max(8).optional(),
  mapColour: z
    .enum(OBJECTIVES.map((o) => o.id) as [string, ...string[]])
    .nullable()
    .optional(),
  mapContour: z
    .enum(OBJECTIVES.map((o) => o.id) as [string, ...string[]])
    .nullable()
    .optional(),
});

/** Check the shape of stored study inputs (the values' ranges are the study file's rules). Never throws. */
export function validateStudyInputs(raw: unknown, where = 'study'): Parsed<StudyInputs> {
  const r = schema.safeParse(raw);
  if (r.success) return { ok: true, value: r.data as StudyInputs };
  return {
    ok: false,
    errors: r.error.issues.map((i) => `${keyPathText([where, ...(i.path as PropertyKey[])])}: ${i.message}`),
  };
}

/** The study file's object (to be validated by validateStudy) for these inputs and a validated ride. */
export function studyToRaw(inputs: StudyInputs, ride: RideFile, name?: string): Record<string, unknown> {
  const { coverFraction: cf, rimDepthMm: rd, tyreWidthMm: tw } = inputs;
  const discrete: Record<string, (number | string)[]> = {};
  for (const [key, id] of DISCRETE_INPUTS) {
    const choices = inputs[key];
    if (choices !== undefined) discrete[id] = [...choices];
  }
  const combos = Object.values(discrete).reduce((n, c) => n * c.length, 1);
  const grid = combos * cf.points * rd.points * (tw?.points ?? 1);
  return {
    format: STUDY_FORMAT,
    version: STUDY_VERSION,
    ...(name !== undefined ? { name } : {}),
    ride,
    variables: {
      cover_fraction: { min: cf.min, max: cf.max },
      rim_depth_m: { min: rd.min / 1000, max: rd.max / 1000 },
      ...(tw ? { tyre_width_m: { min: tw.min / 1000, max: tw.max / 1000 } } : {}),
      ...discrete,
    },
    objective: inputs.objective,
    limits: { ...inputs.limits },
    search: {
      method: inputs.method,
      grid_points: {
        cover_fraction: cf.points,
        rim_depth_m: rd.points,
        ...(tw ? { tyre_width_m: tw.points } : {}),
      },
      // The grid method evaluates its grid alone; the optimiser gets its usual budget beyond the grid.
      max_evaluations: inputs.method === 'grid' ? Math.max(grid, 1) : grid + STUDY_DEFAULTS.max_evaluations,
      lattice_span: inputs.lattice.span,
      lattice_chord: inputs.lattice.chord,
    },
  };
}

/**
 * Which input a study-file message is about, as the panel names it (e.g. "variables.rim_depth_m.max"
 * is the rim depth's "max"): the inputs' key path, or null for messages about the ride.
 */
export function studyMessageInput(message: string): string | null {
  const rules: [RegExp, string][] = [
    [/^study\.((?:coverFraction|rimDepthMm|tyreWidthMm|lattice|limits)\.\w+)/, '$1'],
    [/^study\.(coverSides|coverPlacement|spokeCount|spokeSection)\b/, '$1'],
    [/^variables\.cover_fraction\.(min|max)/, 'coverFraction.$1'],
    [/^variables\.rim_depth_m\.(min|max)/, 'rimDepthMm.$1'],
    [/^variables\.tyre_width_m\.(min|max)/, 'tyreWidthMm.$1'],
    [/^variables\.cover_sides\b/, 'coverSides'],
    [/^variables\.cover_placement\b/, 'coverPlacement'],
    [/^variables\.spoke_count\b/, 'spokeCount'],
    [/^variables\.spoke_section\b/, 'spokeSection'],
    [/^search\.grid_points\.cover_fraction/, 'coverFraction.points'],
    [/^search\.grid_points\.rim_depth_m/, 'rimDepthMm.points'],
    [/^search\.grid_points\.tyre_width_m/, 'tyreWidthMm.points'],
    [/^limits\.(\w+)/, 'limits.$1'],
    [/^objective/, 'objective'],
    [/^search\.lattice_(span|chord)/, 'lattice.$1'],
  ];
  for (const [re, to] of rules) {
    const m = message.match(re);
    if (m) return m[0].replace(re, to);
  }
  return null;
}
