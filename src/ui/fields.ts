/**
 * Every control of the page, as data: where it sits (group), what it edits (the case file or the view
 * settings), how it reads its display value from the state and how it writes a changed value back into
 * a raw copy of the state. Writes touch only their own keys, so values never drift through repeated
 * unit conversions; the result is validated (validateCase / validateView) before it is applied.
 */
import type { CaseFile } from '../compute/caseFile';
import { LIMITS } from '../compute/caseFile';
import { speedFromMps, speedToMps, speedUnitText } from './displayUnits';
import { MAP_OUTPUT_KEYS, OUTPUTS } from './outputs';
import type { ViewState } from './viewState';

export type GroupId =
  | 'wheel'
  | 'spokes'
  | 'cover'
  | 'conditions'
  | 'air'
  | 'steering'
  | 'model'
  | 'units'
  | 'plots';

export const GROUP_TITLES: Record<GroupId, string> = {
  wheel: 'Wheel geometry',
  spokes: 'Spokes',
  cover: 'Covering',
  conditions: 'Speed and yaw',
  air: 'Air',
  steering: 'Steering axis (front wheel)',
  model: 'Model options',
  units: 'Units',
  plots: 'Plots and design map',
};

export type FieldValue = number | string | boolean;

export interface FieldContext {
  case: CaseFile;
  view: ViewState;
}

/** A deep copy of a case or view, edited by key before it is validated. */
// biome-ignore lint/suspicious/noExplicitAny: raw JSON is edited by key path and validated afterwards
export type RawJson = Record<string, any>;

export interface Field {
  key: string;
  group: GroupId;
  /** Label text; may depend on the units chosen. */
  label: (ctx: FieldContext) => string;
  target: 'case' | 'view';
  control: 'number' | 'select' | 'bool' | 'text';
  min?: number;
  max?: number;
  step?: number;
  options?: Record<string, FieldValue>;
  get(ctx: FieldContext): FieldValue;
  /** Write the display value into `raw` (a deep copy of the case or of the view). May throw Error. */
  set(raw: RawJson, value: FieldValue, ctx: FieldContext): void;
  visible?(ctx: FieldContext): boolean;
}

/** Round to 12 significant digits (removes unit-conversion noise such as 0.30000000000000004). */
export function clean(x: number): number {
  return Number.isFinite(x) ? Number(x.toPrecision(12)) : x;
}

const mm = (m: number) => clean(m * 1000);
const m = (mmValue: number) => clean(Number(mmValue) / 1000);

/** Parse "0, 0.25, 0.5" into numbers; throws Error naming the bad item. */
export function parseNumberList(text: string, what: string): number[] {
  const items = String(text)
    .split(/[,;\s]+/)
    .filter((s) => s !== '');
  return items.map((s) => {
    const x = Number(s);
    if (!Number.isFinite(x)) throw new Error(`${what}: "${s}" is not a number`);
    return x;
  });
}

export function listText(xs: readonly number[]): string {
  return xs.map((x) => String(clean(x))).join(', ');
}

/** Yaw list 0..max in steps (max always included). */
export function yawRange(maxDeg: number, stepDeg: number): number[] {
  if (!(stepDeg > 0)) throw new Error(`yaw step: must be greater than 0 deg, got ${stepDeg}`);
  if (!(maxDeg >= 0)) throw new Error(`yaw range: the largest yaw must be at least 0 deg, got ${maxDeg}`);
  const n = Math.floor(maxDeg / stepDeg + 1e-9);
  if (n + 1 > LIMITS.maxPointsPerCase) throw new Error(`yaw step: too many yaw angles (${n + 1})`);
  const out: number[] = [];
  for (let i = 0; i <= n; i++) out.push(clean(i * stepDeg));
  if (maxDeg - out[out.length - 1]! > 1e-9) out.push(clean(maxDeg));
  return out;
}

function yawStep(yaws: readonly number[]): number {
  return yaws.length > 1 ? clean(yaws[1]! - yaws[0]!) : 1;
}

type AirMode = 'pressure' | 'altitude' | 'density';
function airMode(c: CaseFile): AirMode {
  if (c.conditions.air_density_kgpm3 !== undefined) return 'density';
  if (c.conditions.altitude_m !== undefined) return 'altitude';
  return 'pressure';
}

/** A speed as shown (3 decimals in the chosen unit). */
const shownSpeed = (mps: number, ctx: FieldContext) =>
  clean(Number(speedFromMps(mps, ctx.view.speedUnit).toFixed(3)));
/** The speed (m/s) a shown value stands for: the current one when the shown value is unchanged. */
const speedFromShown = (value: FieldValue, currentMps: number, ctx: FieldContext) =>
  Number(value) === shownSpeed(currentMps, ctx)
    ? currentMps
    : clean(speedToMps(Number(value), ctx.view.speedUnit));

const sp = (ctx: FieldContext) => speedUnitText(ctx.view.speedUnit);
const num = (v: FieldValue) => Number(v);

const mapOptions: Record<string, FieldValue> = Object.fromEntries(
  MAP_OUTPUT_KEYS.map((k) => [OUTPUTS[k].label, k]),
);

export const FIELDS: readonly Field[] = [
  // Wheel geometry
  {
    key: 'name',
    group: 'wheel',
    label: () => 'Design name',
    target: 'case',
    control: 'text',
    get: (c) => c.case.name ?? '',
    set: (raw, v) => {
      const s = String(v).trim();
      if (s === '') delete raw.name;
      else raw.name = s.slice(0, 120);
    },
  },
  {
    key: 'outerRadiusMm',
    group: 'wheel',
    label: () => 'Outer radius (tyre), mm',
    target: 'case',
    control: 'number',
    min: 150,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.outer_radius_m),
    set: (raw, v) => {
      raw.wheel.outer_radius_m = m(num(v));
    },
  },
  {
    key: 'tyreWidthMm',
    group: 'wheel',
    label: () => 'Tyre width, mm',
    target: 'case',
    control: 'number',
    min: 15,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.wheel.tyre_width_m),
    set: (raw, v) => {
      raw.wheel.tyre_width_m = m(num(v));
    },
  },
  {
    key: 'rimDepthMm',
    group: 'wheel',
    label: () => 'Rim depth, mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 200,
    step: 1,
    get: (c) => mm(c.case.wheel.rim_depth_m),
    set: (raw, v) => {
      raw.wheel.rim_depth_m = m(num(v));
    },
  },
  {
    key: 'rimWidthMm',
    group: 'wheel',
    label: () => 'Rim width, mm',
    target: 'case',
    control: 'number',
    min: 15,
    max: 60,
    step: 0.5,
    get: (c) => mm(c.case.wheel.rim_width_m),
    set: (raw, v) => {
      raw.wheel.rim_width_m = m(num(v));
    },
  },
  {
    key: 'hubFlangeRadiusMm',
    group: 'wheel',
    label: () => 'Hub flange radius, mm',
    target: 'case',
    control: 'number',
    min: 10,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.wheel.hub_flange_radius_m),
    set: (raw, v) => {
      raw.wheel.hub_flange_radius_m = m(num(v));
    },
  },
  {
    key: 'hubShellDiameterMm',
    group: 'wheel',
    label: () => 'Hub shell diameter, mm',
    target: 'case',
    control: 'number',
    min: 10,
    max: 160,
    step: 0.5,
    get: (c) => mm(c.case.wheel.hub_shell_diameter_m),
    set: (raw, v) => {
      raw.wheel.hub_shell_diameter_m = m(num(v));
    },
  },
  {
    key: 'hubShellWidthMm',
    group: 'wheel',
    label: () => 'Hub shell width (exposed), mm',
    target: 'case',
    control: 'number',
    min: 10,
    max: 200,
    step: 1,
    get: (c) => mm(c.case.wheel.hub_shell_width_m),
    set: (raw, v) => {
      raw.wheel.hub_shell_width_m = m(num(v));
    },
  },
  // Spokes
  {
    key: 'spokeCount',
    group: 'spokes',
    label: () => 'Spoke count',
    target: 'case',
    control: 'number',
    min: 0,
    max: 48,
    step: 1,
    get: (c) => c.case.wheel.spokes.count,
    set: (raw, v) => {
      raw.wheel.spokes.count = Math.round(num(v));
    },
  },
  {
    key: 'spokeSection',
    group: 'spokes',
    label: () => 'Section',
    target: 'case',
    control: 'select',
    options: { round: 'round', 'bladed (flat)': 'bladed' },
    get: (c) => c.case.wheel.spokes.section,
    set: (raw, v) => {
      raw.wheel.spokes.section = v;
    },
  },
  {
    key: 'spokeDiameterMm',
    group: 'spokes',
    label: () => 'Round spoke diameter, mm',
    target: 'case',
    control: 'number',
    min: 1,
    max: 5,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.diameter_m),
    set: (raw, v) => {
      raw.wheel.spokes.diameter_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'round',
  },
  {
    key: 'spokeWidthMm',
    group: 'spokes',
    label: () => 'Blade width (chord), mm',
    target: 'case',
    control: 'number',
    min: 1,
    max: 10,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.width_m),
    set: (raw, v) => {
      raw.wheel.spokes.width_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'bladed',
  },
  {
    key: 'spokeThicknessMm',
    group: 'spokes',
    label: () => 'Blade thickness, mm',
    target: 'case',
    control: 'number',
    min: 0.5,
    max: 5,
    step: 0.05,
    get: (c) => mm(c.case.wheel.spokes.thickness_m),
    set: (raw, v) => {
      raw.wheel.spokes.thickness_m = m(num(v));
    },
    visible: (c) => c.case.wheel.spokes.section === 'bladed',
  },
  // Covering
  {
    key: 'coverFraction',
    group: 'cover',
    label: () => 'Covered fraction of spoked area',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.01,
    get: (c) => c.case.wheel.cover.fraction,
    set: (raw, v) => {
      raw.wheel.cover.fraction = clean(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement !== 'explicit',
  },
  {
    key: 'coverPlacement',
    group: 'cover',
    label: () => 'Placement',
    target: 'case',
    control: 'select',
    options: {
      'next to the rim': 'rim',
      'next to the hub': 'hub',
      'centred in the spokes': 'centre',
      'explicit radii': 'explicit',
    },
    get: (c) => c.case.wheel.cover.placement,
    set: (raw, v, ctx) => {
      const cover = raw.wheel.cover;
      cover.placement = v;
      if (v === 'explicit') {
        // An explicit cover is set by its radii; the case file refuses a fraction beside them.
        delete (cover as { fraction?: number }).fraction;
        const w = ctx.case.wheel;
        const rimInner = w.outer_radius_m - w.tyre_width_m - w.rim_depth_m;
        cover.inner_radius_m = cover.inner_radius_m ?? clean(w.hub_flange_radius_m);
        cover.outer_radius_m = cover.outer_radius_m ?? clean(rimInner);
      } else {
        delete cover.inner_radius_m;
        delete cover.outer_radius_m;
      }
    },
  },
  {
    key: 'coverInnerMm',
    group: 'cover',
    label: () => 'Cover inner radius, mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.cover.inner_radius_m ?? c.case.wheel.hub_flange_radius_m),
    set: (raw, v) => {
      raw.wheel.cover.inner_radius_m = m(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement === 'explicit',
  },
  {
    key: 'coverOuterMm',
    group: 'cover',
    label: () => 'Cover outer radius, mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 400,
    step: 1,
    get: (c) => mm(c.case.wheel.cover.outer_radius_m ?? c.case.wheel.outer_radius_m / 2),
    set: (raw, v) => {
      raw.wheel.cover.outer_radius_m = m(num(v));
    },
    visible: (c) => c.case.wheel.cover.placement === 'explicit',
  },
  {
    key: 'coverSides',
    group: 'cover',
    label: () => 'Covered sides',
    target: 'case',
    control: 'select',
    options: { 'both sides': 2, 'one side': 1 },
    get: (c) => c.case.wheel.cover.sides,
    set: (raw, v) => {
      raw.wheel.cover.sides = Number(v);
    },
  },
  // Speed and yaw
  {
    key: 'airspeed',
    group: 'conditions',
    label: (c) => `Airspeed, ${sp(c)}`,
    target: 'case',
    control: 'number',
    min: 5,
    max: 120,
    step: 0.1,
    get: (c) => shownSpeed(c.case.conditions.airspeed_mps[0]!, c),
    set: (raw, v, c) => {
      raw.conditions.airspeed_mps = [speedFromShown(v, c.case.conditions.airspeed_mps[0]!, c)];
    },
  },
  {
    key: 'groundMode',
    group: 'conditions',
    label: () => 'Wheel rotation',
    target: 'case',
    control: 'select',
    options: { 'tunnel: ground speed = airspeed': 'tunnel', 'given ground speed': 'given' },
    get: (c) => (c.case.conditions.ground_speed_mps === null ? 'tunnel' : 'given'),
    set: (raw, v, c) => {
      raw.conditions.ground_speed_mps = v === 'tunnel' ? null : c.case.conditions.airspeed_mps[0];
    },
  },
  {
    key: 'groundSpeed',
    group: 'conditions',
    label: (c) => `Ground speed, ${sp(c)}`,
    target: 'case',
    control: 'number',
    min: 0,
    max: 120,
    step: 0.1,
    get: (c) => shownSpeed(c.case.conditions.ground_speed_mps ?? c.case.conditions.airspeed_mps[0]!, c),
    set: (raw, v, c) => {
      raw.conditions.ground_speed_mps = speedFromShown(
        v,
        c.case.conditions.ground_speed_mps ?? c.case.conditions.airspeed_mps[0]!,
        c,
      );
    },
    visible: (c) => c.case.conditions.ground_speed_mps !== null,
  },
  {
    key: 'yawMaxDeg',
    group: 'conditions',
    label: () => 'Largest yaw, deg',
    target: 'case',
    control: 'number',
    min: 0,
    max: 45,
    step: 0.5,
    get: (c) => clean(Math.max(...c.case.conditions.yaw_deg)),
    set: (raw, v, c) => {
      raw.conditions.yaw_deg = yawRange(num(v), yawStep(c.case.conditions.yaw_deg));
    },
  },
  {
    key: 'yawStepDeg',
    group: 'conditions',
    label: () => 'Yaw step, deg',
    target: 'case',
    control: 'number',
    min: 0.25,
    max: 5,
    step: 0.25,
    get: (c) => yawStep(c.case.conditions.yaw_deg),
    set: (raw, v, c) => {
      raw.conditions.yaw_deg = yawRange(Math.max(...c.case.conditions.yaw_deg), num(v));
    },
  },
  {
    key: 'referenceSpeed',
    group: 'units',
    label: (c) => `Reference speed for gf, ${sp(c)}`,
    target: 'case',
    control: 'number',
    min: 10,
    max: 100,
    step: 0.5,
    get: (c) => shownSpeed(c.case.conditions.reference_speed_kmh / 3.6, c),
    set: (raw, v, c) => {
      const kmh = c.case.conditions.reference_speed_kmh;
      raw.conditions.reference_speed_kmh =
        Number(v) === shownSpeed(kmh / 3.6, c) ? kmh : clean(speedToMps(num(v), c.view.speedUnit) * 3.6);
    },
  },
  // Air
  {
    key: 'airMode',
    group: 'air',
    label: () => 'Air given by',
    target: 'case',
    control: 'select',
    options: {
      'temperature, pressure, humidity': 'pressure',
      'temperature, altitude, humidity': 'altitude',
      'density (and temperature)': 'density',
    },
    get: (c) => airMode(c.case),
    set: (raw, v, c) => {
      const cond = raw.conditions;
      const rho = cond.air_density_kgpm3;
      delete cond.air_density_kgpm3;
      delete cond.pressure_pa;
      delete cond.altitude_m;
      if (v === 'pressure') {
        cond.pressure_pa = 101325;
        cond.relative_humidity = cond.relative_humidity ?? 0;
      } else if (v === 'altitude') {
        cond.altitude_m = 0;
        cond.relative_humidity = cond.relative_humidity ?? 0;
      } else {
        delete cond.relative_humidity;
        cond.air_density_kgpm3 = rho ?? 1.225;
      }
      void c;
    },
  },
  {
    key: 'temperatureC',
    group: 'air',
    label: () => 'Temperature, °C',
    target: 'case',
    control: 'number',
    min: -40,
    max: 50,
    step: 0.5,
    get: (c) => c.case.conditions.temperature_c,
    set: (raw, v) => {
      raw.conditions.temperature_c = clean(num(v));
    },
  },
  {
    key: 'pressureHpa',
    group: 'air',
    label: () => 'Pressure, hPa',
    target: 'case',
    control: 'number',
    min: 300,
    max: 1100,
    step: 0.25,
    get: (c) => clean((c.case.conditions.pressure_pa ?? 101325) / 100),
    set: (raw, v) => {
      raw.conditions.pressure_pa = clean(num(v) * 100);
    },
    visible: (c) => airMode(c.case) === 'pressure',
  },
  {
    key: 'altitudeM',
    group: 'air',
    label: () => 'Altitude, m',
    target: 'case',
    control: 'number',
    min: 0,
    max: 5000,
    step: 10,
    get: (c) => c.case.conditions.altitude_m ?? 0,
    set: (raw, v) => {
      raw.conditions.altitude_m = clean(num(v));
    },
    visible: (c) => airMode(c.case) === 'altitude',
  },
  {
    key: 'humidityPct',
    group: 'air',
    label: () => 'Relative humidity, %',
    target: 'case',
    control: 'number',
    min: 0,
    max: 100,
    step: 1,
    get: (c) => clean((c.case.conditions.relative_humidity ?? 0) * 100),
    set: (raw, v) => {
      raw.conditions.relative_humidity = clean(num(v) / 100);
    },
    visible: (c) => airMode(c.case) !== 'density',
  },
  {
    key: 'densityKgPerM3',
    group: 'air',
    label: () => 'Air density, kg/m³',
    target: 'case',
    control: 'number',
    min: 0.3,
    max: 1.6,
    step: 0.001,
    get: (c) => c.case.conditions.air_density_kgpm3 ?? 1.225,
    set: (raw, v) => {
      raw.conditions.air_density_kgpm3 = clean(num(v));
    },
    visible: (c) => airMode(c.case) === 'density',
  },
  // Steering
  {
    key: 'headAngleDeg',
    group: 'steering',
    label: () => 'Head angle, deg',
    target: 'case',
    control: 'number',
    min: 60,
    max: 80,
    step: 0.25,
    get: (c) => c.case.steering.head_angle_deg,
    set: (raw, v) => {
      raw.steering.head_angle_deg = clean(num(v));
    },
  },
  {
    key: 'forkOffsetMm',
    group: 'steering',
    label: () => 'Fork offset (rake), mm',
    target: 'case',
    control: 'number',
    min: 0,
    max: 80,
    step: 0.5,
    get: (c) => mm(c.case.steering.fork_offset_m),
    set: (raw, v) => {
      raw.steering.fork_offset_m = m(num(v));
    },
  },
  // Model options
  {
    key: 'ground',
    group: 'model',
    label: () => 'Ground plane (mirror image)',
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.ground,
    set: (raw, v) => {
      raw.model.ground = Boolean(v);
    },
  },
  {
    key: 'latticeSpan',
    group: 'model',
    label: () => 'Lattice strips (fineness)',
    target: 'case',
    control: 'number',
    min: 4,
    max: 60,
    step: 1,
    get: (c) => c.case.model.lattice_span,
    set: (raw, v) => {
      raw.model.lattice_span = Math.round(num(v));
    },
  },
  {
    key: 'latticeChord',
    group: 'model',
    label: () => 'Lattice panels per strip',
    target: 'case',
    control: 'number',
    min: 2,
    max: 40,
    step: 1,
    get: (c) => c.case.model.lattice_chord,
    set: (raw, v) => {
      raw.model.lattice_chord = Math.round(num(v));
    },
  },
  {
    key: 'gridConvergence',
    group: 'model',
    label: () => 'Lattice uncertainty (GCI)',
    target: 'case',
    control: 'bool',
    get: (c) => c.case.model.grid_convergence,
    set: (raw, v) => {
      raw.model.grid_convergence = Boolean(v);
    },
  },
  {
    key: 'suctionRecovered',
    group: 'model',
    label: () => 'Tyre edge thrust, share of attainable',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.05,
    get: (c) => c.case.model.suction_recovered,
    set: (raw, v) => {
      raw.model.suction_recovered = clean(num(v));
    },
  },
  {
    key: 'porosityScale',
    group: 'model',
    label: () => 'Spoke screen resistance ×',
    target: 'case',
    control: 'number',
    min: 0.1,
    max: 10,
    step: 0.05,
    get: (c) => c.case.model.porosity_scale,
    set: (raw, v) => {
      raw.model.porosity_scale = clean(num(v));
    },
  },
  {
    key: 'profileDragFactor',
    group: 'model',
    label: () => 'Section profile drag ×',
    target: 'case',
    control: 'number',
    min: 0.1,
    max: 5,
    step: 0.05,
    get: (c) => c.case.model.profile_drag_factor,
    set: (raw, v) => {
      raw.model.profile_drag_factor = clean(num(v));
    },
  },
  {
    key: 'oneSidedShare',
    group: 'model',
    label: () => 'Spoke drag kept behind 1-sided cover',
    target: 'case',
    control: 'number',
    min: 0,
    max: 1,
    step: 0.05,
    get: (c) => c.case.model.one_sided_cover_spoke_share,
    set: (raw, v) => {
      raw.model.one_sided_cover_spoke_share = clean(num(v));
    },
  },
  // Units (view)
  {
    key: 'speedUnit',
    group: 'units',
    label: () => 'Speeds in',
    target: 'view',
    control: 'select',
    options: { 'km/h': 'kmh', mph: 'mph' },
    get: (c) => c.view.speedUnit,
    set: (raw, v) => {
      raw.speedUnit = v;
    },
  },
  {
    key: 'forceUnit',
    group: 'units',
    label: () => 'Forces in',
    target: 'view',
    control: 'select',
    options: { 'newtons (at the airspeed)': 'N', 'grams-force at the reference speed': 'gf' },
    get: (c) => c.view.forceUnit,
    set: (raw, v) => {
      raw.forceUnit = v;
    },
  },
  {
    key: 'areaUnit',
    group: 'units',
    label: () => 'Drag area in',
    target: 'view',
    control: 'select',
    options: { 'cm²': 'cm2', 'm²': 'm2' },
    get: (c) => c.view.areaUnit,
    set: (raw, v) => {
      raw.areaUnit = v;
    },
  },
  // Plots (view)
  {
    key: 'familyFractions',
    group: 'plots',
    label: () => 'Cover fractions on yaw plots',
    target: 'view',
    control: 'text',
    get: (c) => listText(c.view.familyFractions),
    set: (raw, v) => {
      raw.familyFractions = parseNumberList(String(v), 'cover fractions');
    },
  },
  {
    key: 'coverPlotYaws',
    group: 'plots',
    label: () => 'Yaws for drag vs cover, deg',
    target: 'view',
    control: 'text',
    get: (c) => listText(c.view.coverPlotYawsDeg),
    set: (raw, v) => {
      raw.coverPlotYawsDeg = parseNumberList(String(v), 'yaw angles');
    },
  },
  {
    key: 'coverPlotSpeeds',
    group: 'plots',
    label: (c) => `Extra speeds for drag vs cover, ${sp(c)}`,
    target: 'view',
    control: 'text',
    get: (c) =>
      listText(c.view.coverPlotSpeedsMps.map((s) => Number(speedFromMps(s, c.view.speedUnit).toFixed(3)))),
    set: (raw, v, c) => {
      raw.coverPlotSpeedsMps = parseNumberList(String(v), 'speeds').map((s) =>
        clean(speedToMps(s, c.view.speedUnit)),
      );
    },
  },
  {
    key: 'mapYawDeg',
    group: 'plots',
    label: () => 'Design map yaw, deg',
    target: 'view',
    control: 'number',
    min: 0,
    max: 30,
    step: 0.5,
    get: (c) => c.view.mapYawDeg,
    set: (raw, v) => {
      raw.mapYawDeg = clean(num(v));
    },
  },
  {
    key: 'mapColour',
    group: 'plots',
    label: () => 'Map colour',
    target: 'view',
    control: 'select',
    options: mapOptions,
    get: (c) => c.view.mapColour,
    set: (raw, v) => {
      raw.mapColour = v;
    },
  },
  {
    key: 'mapContour',
    group: 'plots',
    label: () => 'Map contour lines',
    target: 'view',
    control: 'select',
    options: mapOptions,
    get: (c) => c.view.mapContour,
    set: (raw, v) => {
      raw.mapContour = v;
    },
  },
  {
    key: 'mapMaxRimDepthMm',
    group: 'plots',
    label: () => 'Map deepest rim, mm',
    target: 'view',
    control: 'number',
    min: 20,
    max: 300,
    step: 5,
    get: (c) => mm(c.view.mapMaxRimDepthM),
    set: (raw, v) => {
      raw.mapMaxRimDepthM = m(num(v));
    },
  },
  {
    key: 'view3dYawDeg',
    group: 'plots',
    label: () => '3D view yaw, deg',
    target: 'view',
    control: 'number',
    min: 0,
    max: 30,
    step: 0.5,
    get: (c) => c.view.view3dYawDeg,
    set: (raw, v) => {
      raw.view3dYawDeg = clean(num(v));
    },
  },
  {
    key: 'difference',
    group: 'plots',
    label: () => 'Against the baseline show',
    target: 'view',
    control: 'select',
    options: {
      'values (baseline dashed)': 'none',
      'drag difference (force unit)': 'force',
      'power difference, W': 'power',
      'drag difference, %': 'percent',
    },
    get: (c) => c.view.difference,
    set: (raw, v) => {
      raw.difference = v;
    },
  },
];
