/**
 * The map file: CoverSweep's own versioned JSON saying what each column of a data file holds.
 *
 * {
 *   "format": "coversweep-map", "version": 1,
 *   "columns": {
 *     "<header text>": { "quantity": "<quantity>", "unit": "<unit>", "reference_area_m2": <number, coefficients only> }
 *   },
 *   "side_force_sign": 1 | -1,      // -1 when the data's side force is positive to the rider's right
 *   "yaw_moment_sign": 1 | -1,      // optional; defaults to side_force_sign (a mirrored lateral axis flips both)
 *   "airspeed_mps": <number>,       // optional when a "speed" column exists
 *   "air_density_kgpm3": <number>   // optional; else an "air_density" column, else the case's air
 * }
 *
 * Quantities: yaw_deg (unit deg|rad, yaw > 0 for wind from the rider's right), speed (mps|kmh|mph),
 * air_density (kgpm3), axial_force / drag_force_wind / side_force (N|gf|kgf|lbf), drag_area /
 * drag_area_wind (m2|cm2), drag_coefficient / drag_coefficient_wind / side_coefficient (unit "1" with
 * reference_area_m2), yaw_moment / steering_moment (Nm|Nmm), ignore. "axial" is along the direction of
 * travel; "wind" is along the apparent wind. Columns not listed are ignored.
 */
import { z } from 'zod';
import { describeValue, keyPathText, parseJsonText } from '../caseFile';
import { migrateMap } from '../fileVersion';
import { unknownKeyMessage } from '../unknownKeyMessage';
import {
  COEFFICIENT_QUANTITIES,
  OUTPUT_LABEL,
  type Output,
  QUANTITIES,
  QUANTITY_OUTPUT,
  QUANTITY_UNITS,
  type Quantity,
  UNITS,
  type Unit,
} from './quantities';

export const MAP_FORMAT = 'coversweep-map';
export const MAP_VERSION = 1;

export interface MapColumn {
  quantity: Quantity;
  unit: Unit;
  reference_area_m2?: number;
}

export interface MapFile {
  format: typeof MAP_FORMAT;
  version: typeof MAP_VERSION;
  columns: Record<string, MapColumn>;
  side_force_sign: 1 | -1;
  yaw_moment_sign?: 1 | -1;
  airspeed_mps?: number;
  air_density_kgpm3?: number;
}

export type MapParsed = { ok: true; value: MapFile } | { ok: false; errors: string[] };

const list = (values: readonly string[]) => values.map((v) => JSON.stringify(v)).join(', ');

const sign = z.union([z.literal(1), z.literal(-1)], {
  error: (iss) => `must be 1 or -1, got ${describeValue(iss.input)}`,
});
const positive = (max: number, unit: string) =>
  z
    .number({
      error: (iss) =>
        `must be a number greater than 0 and at most ${max} ${unit}, got ${describeValue(iss.input)}`,
    })
    .refine((v) => Number.isFinite(v) && v > 0 && v <= max, {
      error: (iss) =>
        `must be a number greater than 0 and at most ${max} ${unit}, got ${describeValue(iss.input)}`,
    });

const columnSchema = z.strictObject(
  {
    quantity: z.enum(QUANTITIES, {
      error: (iss) => `must be one of ${list(QUANTITIES)}, got ${describeValue(iss.input)}`,
    }),
    unit: z.enum(UNITS, { error: (iss) => `must be one of ${list(UNITS)}, got ${describeValue(iss.input)}` }),
    reference_area_m2: positive(10, 'm^2').optional(),
  },
  { error: (iss) => `must be an object {"quantity", "unit"}, got ${describeValue(iss.input)}` },
);

const mapSchema = z.strictObject(
  {
    format: z.literal(MAP_FORMAT, {
      error: (iss) => `must be "${MAP_FORMAT}", got ${describeValue(iss.input)}`,
    }),
    version: z.literal(MAP_VERSION, {
      error: (iss) =>
        `unsupported map-file version ${describeValue(iss.input)}; this program reads version ${MAP_VERSION}`,
    }),
    columns: z.record(z.string(), columnSchema, {
      error: (iss) => `must be an object of column headers, got ${describeValue(iss.input)}`,
    }),
    side_force_sign: sign,
    yaw_moment_sign: sign.optional(),
    airspeed_mps: positive(60, 'm/s').optional(),
    air_density_kgpm3: positive(1.6, 'kg/m^3').optional(),
  },
  { error: (iss) => `must be an object (a CoverSweep map file), got ${describeValue(iss.input)}` },
);

const ALLOWED_TOP = [
  'format',
  'version',
  'columns',
  'side_force_sign',
  'yaw_moment_sign',
  'airspeed_mps',
  'air_density_kgpm3',
];

/** Validate an already-parsed JSON value as a map file. Never throws. */
export function validateMap(raw: unknown): MapParsed {
  try {
    return validateMapUnsafe(raw);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    return { ok: false, errors: [`internal error while validating the map file: ${reason}`] };
  }
}

function validateMapUnsafe(given: unknown): MapParsed {
  // Older versions (and files without a version: version 1) are brought up to date first.
  const migrated = migrateMap(given);
  if (!migrated.ok) return migrated;
  const raw = migrated.value;
  const parsed = mapSchema.safeParse(raw, { reportInput: true });
  if (!parsed.success) {
    const errors: string[] = [];
    for (const issue of parsed.error.issues) {
      const path = issue.path as PropertyKey[];
      if (issue.code === 'unrecognized_keys') {
        const where = path.map(String).join('.');
        const allowed = where === '' ? ALLOWED_TOP : ['quantity', 'unit', 'reference_area_m2'];
        for (const key of issue.keys) errors.push(unknownKeyMessage(where, key, allowed));
        continue;
      }
      errors.push(`${keyPathText(path)}: ${issue.message}`);
    }
    return { ok: false, errors: [...new Set(errors)] };
  }
  const map = parsed.data as MapFile;
  // Column headers are data: zod builds records on plain objects, where a column named "__proto__" is
  // lost; rebuild them on an object without a prototype, each column checked again.
  const columns: Record<string, MapColumn> = Object.create(null);
  for (const [header, col] of Object.entries((raw as { columns: object }).columns)) {
    const c = columnSchema.safeParse(col);
    if (!c.success)
      return { ok: false, errors: c.error.issues.map((i) => `columns.${header}: ${i.message}`) };
    columns[header] = c.data as MapColumn;
  }
  map.columns = columns;
  const errors = mapRules(map);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, value: map };
}

/** The rules across keys: units fit quantities, one yaw column, one column per output, a speed. */
export function mapRules(map: MapFile): string[] {
  const errors: string[] = [];
  const byOutput = new Map<Output, string>();
  let yaw = 0;
  let speed = 0;
  let density = 0;
  let compared = 0;
  for (const [header, col] of Object.entries(map.columns)) {
    const at = `columns.${header}`;
    const allowed = QUANTITY_UNITS[col.quantity];
    if (!allowed.includes(col.unit)) {
      errors.push(
        `${at}.unit: must be one of ${list(allowed)} for quantity "${col.quantity}", got "${col.unit}"`,
      );
    }
    const isCoefficient = COEFFICIENT_QUANTITIES.includes(col.quantity);
    if (isCoefficient && col.reference_area_m2 === undefined) {
      errors.push(
        `${at}.reference_area_m2: is required for quantity "${col.quantity}" (the area the coefficient is based on, m^2; the wheel's disc is pi R^2)`,
      );
    }
    if (!isCoefficient && col.reference_area_m2 !== undefined) {
      errors.push(
        `${at}.reference_area_m2: only used with coefficient quantities, got ${col.reference_area_m2} for "${col.quantity}"`,
      );
    }
    if (col.quantity === 'yaw_deg') yaw++;
    if (col.quantity === 'speed') speed++;
    if (col.quantity === 'air_density') density++;
    const out = QUANTITY_OUTPUT[col.quantity];
    if (out) {
      compared++;
      const other = byOutput.get(out);
      if (other !== undefined) {
        errors.push(
          `${at}.quantity: ${OUTPUT_LABEL[out]} is already given by column "${other}" (one column per quantity)`,
        );
      } else {
        byOutput.set(out, header);
      }
    }
  }
  if (yaw !== 1) errors.push(`columns: exactly one column must have quantity "yaw_deg", got ${yaw}`);
  if (speed > 1) errors.push(`columns: at most one column may have quantity "speed", got ${speed}`);
  if (density > 1) errors.push(`columns: at most one column may have quantity "air_density", got ${density}`);
  if (compared === 0) {
    errors.push(
      'columns: no column holds a force, drag area, coefficient or moment to compare (map at least one)',
    );
  }
  if (speed === 0 && map.airspeed_mps === undefined) {
    errors.push(
      'airspeed_mps: is required when no column has quantity "speed" (the airspeed of the measurements, m/s)',
    );
  }
  if (speed === 1 && map.airspeed_mps !== undefined) {
    errors.push(`airspeed_mps: cannot be given together with a "speed" column, got ${map.airspeed_mps}`);
  }
  if (density === 1 && map.air_density_kgpm3 !== undefined) {
    errors.push(
      `air_density_kgpm3: cannot be given together with an "air_density" column, got ${map.air_density_kgpm3}`,
    );
  }
  return errors;
}

/** Parse and validate map-file text. Never throws. */
export function parseMapFile(text: string): MapParsed {
  const json = parseJsonText(text, 'map file');
  if (!json.ok) return json;
  return validateMap(json.value);
}
