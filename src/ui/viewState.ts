/**
 * The page's view settings (everything that is not the design itself): display units, what the plots
 * and the design map show, the open tab. Carried in the URL, the autosave and the project file next to
 * the case file, and validated the same way (every problem names the field).
 */
import { z } from 'zod';
import { describeValue, keyPathText } from '../compute/caseFile';
import { MAP_OUTPUT_KEYS, type OutputKey } from './outputs';

export type SpeedUnit = 'kmh' | 'mph';
export type ForceUnit = 'N' | 'gf';
export type AreaUnit = 'm2' | 'cm2';
export type DifferenceMode = 'none' | 'force' | 'power' | 'percent';
export const TAB_IDS = ['results', 'map', 'tables', 'road', 'study', 'data', 'help'] as const;
export type TabId = (typeof TAB_IDS)[number];

export interface ViewState {
  speedUnit: SpeedUnit;
  forceUnit: ForceUnit;
  areaUnit: AreaUnit;
  /** Covering fractions drawn as the family on the yaw plots. */
  familyFractions: number[];
  /** Yaw angles (deg) and extra airspeeds (m/s) of the "drag vs covering fraction" plot. */
  coverPlotYawsDeg: number[];
  coverPlotSpeedsMps: number[];
  /** The design map: yaw angle, colour and contour outputs, deepest rim drawn. */
  mapYawDeg: number;
  mapColour: OutputKey;
  mapContour: OutputKey;
  mapMaxRimDepthM: number;
  /** Yaw angle (deg) of the 3D view's flow field. */
  view3dYawDeg: number;
  /** With a pinned baseline, show drag as a difference from it. */
  difference: DifferenceMode;
  tab: TabId;
  /** 3D view layers (names and meaning belong to the 3D view). */
  layers3d: Record<string, boolean>;
}

export const DEFAULT_VIEW: Readonly<ViewState> = Object.freeze({
  speedUnit: 'kmh',
  forceUnit: 'N',
  areaUnit: 'cm2',
  familyFractions: [0, 0.25, 0.5, 0.75, 1],
  coverPlotYawsDeg: [0, 5, 10, 15],
  coverPlotSpeedsMps: [],
  mapYawDeg: 10,
  mapColour: 'axial',
  mapContour: 'side',
  mapMaxRimDepthM: 0.1,
  view3dYawDeg: 10,
  difference: 'none',
  tab: 'results',
  layers3d: {},
}) as Readonly<ViewState>;

export function defaultView(): ViewState {
  return structuredClone(DEFAULT_VIEW) as ViewState;
}

const err = (rule: string) => (iss: { input?: unknown }) => `${rule}, got ${describeValue(iss.input)}`;
const oneOf = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.enum(values, { error: err(`must be one of ${values.map((v) => JSON.stringify(v)).join(', ')}`) });
const numIn = (min: number, max: number, unit: string) => {
  const rule = `must be a number between ${min} and ${max}${unit ? ` ${unit}` : ''}`;
  return z
    .number({ error: err(rule) })
    .min(min, { error: err(rule) })
    .max(max, { error: err(rule) });
};
const list = (item: z.ZodNumber, max: number) =>
  z
    .array(item, { error: err(`must be a list of at most ${max} numbers`) })
    .max(max, { error: err(`must be a list of at most ${max} numbers`) });
const mapKeys = MAP_OUTPUT_KEYS as unknown as readonly [string, ...string[]];

const viewSchema = z.strictObject(
  {
    speedUnit: oneOf(['kmh', 'mph']),
    forceUnit: oneOf(['N', 'gf']),
    areaUnit: oneOf(['m2', 'cm2']),
    familyFractions: list(numIn(0, 1, ''), 8).min(1, { error: 'must list at least one fraction' }),
    coverPlotYawsDeg: list(numIn(0, 30, 'deg'), 6).min(1, { error: 'must list at least one yaw angle' }),
    coverPlotSpeedsMps: list(numIn(0.5, 60, 'm/s'), 3),
    mapYawDeg: numIn(0, 30, 'deg'),
    mapColour: oneOf(mapKeys),
    mapContour: oneOf(mapKeys),
    mapMaxRimDepthM: numIn(0.02, 0.3, 'm'),
    view3dYawDeg: numIn(0, 30, 'deg'),
    difference: oneOf(['none', 'force', 'power', 'percent']),
    tab: oneOf(TAB_IDS as unknown as readonly [string, ...string[]]),
    layers3d: z.record(z.string(), z.boolean({ error: err('must be true or false') }), {
      error: err('must be an object of true/false layer switches'),
    }),
  },
  { error: err('must be an object (the view settings)') },
);

/** Validate view settings; missing keys take their defaults. Never throws. */
export function validateView(
  raw: unknown,
  where = 'view',
): { ok: true; value: ViewState } | { ok: false; errors: string[] } {
  const merged =
    raw !== null && typeof raw === 'object' && !Array.isArray(raw)
      ? { ...defaultView(), ...(raw as Record<string, unknown>) }
      : raw;
  const r = viewSchema.safeParse(merged);
  if (r.success) return { ok: true, value: r.data as ViewState };
  return {
    ok: false,
    errors: r.error.issues.map((i) => {
      const path = keyPathText([where, ...(i.path as PropertyKey[])]);
      if (i.code === 'unrecognized_keys') return `${path}: unknown key(s) ${i.keys.join(', ')}`;
      return `${path}: ${i.message}`;
    }),
  };
}
