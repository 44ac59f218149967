/**
 * The imported data as the page keeps it: the `data` section of the page state (project file, autosave,
 * link). The table is kept as the CSV text exactly as read (`csv`: re-reading it gives the same rows,
 * cells and line numbers; numbers stay as short as the file wrote them), named by its content's SHA-256
 * (`hash`), with the column mapping that was applied (`map`, a map file) and the last fit (`fit`: the
 * fit's table without its per-point residuals, which the comparison recomputes).
 *
 * A link carries the reference only (name, hash, rows, map, fit; no `csv`); the autosave keeps the CSV
 * under a key of its own (autosave.ts). Reading checks every field and names it with its rule: the hash
 * must be that of the CSV, the fit must belong to mapped data and lie within its parameters' bounds.
 */
import { z } from 'zod';
import { describeValue, type Parsed } from '../../compute/caseFile';
import {
  CALIBRATABLE,
  type CalibrationResult,
  MAX_DATA_BYTES,
  MAX_DATA_ROWS,
  type MapFile,
  PARAMETER_BOUNDS,
  validateMap,
} from '../../compute/compare/index';
import { OUTPUTS } from '../../compute/compare/quantities';
import { sha256Hex } from '../../compute/sha256';

/** The fit as kept: the calibration's result without its per-point residual rows. */
export type SavedFit = Omit<CalibrationResult, 'residuals'>;

export interface SavedData {
  /** The data's name (its file name, or "pasted data"). */
  name: string;
  /** SHA-256 of `csv` (64 hex digits). */
  hash: string;
  /** Data rows in the table. */
  rows: number;
  /** The CSV's length in characters (absent in files written before it was kept). */
  chars?: number;
  /** The table's text as read; absent in a link, or where it could not be kept. */
  csv?: string;
  /** The mapping that was applied (absent while the columns are still being mapped). */
  map?: MapFile;
  /** The last fit to this data with this mapping (absent: none made). */
  fit?: SavedFit;
}

/** Longest data name kept (characters). */
export const MAX_DATA_NAME_CHARS = 300;

const finite = (what: string) =>
  z.number({ error: (iss) => `must be ${what}, got ${describeValue(iss.input)}` }).refine(Number.isFinite, {
    error: (iss) => `must be ${what}, got ${describeValue(iss.input)}`,
  });
const count = (what: string, max = Number.MAX_SAFE_INTEGER) =>
  z
    .number({ error: (iss) => `must be ${what}, got ${describeValue(iss.input)}` })
    .int({ error: (iss) => `must be ${what}, got ${describeValue(iss.input)}` })
    .min(0, { error: (iss) => `must be ${what}, got ${describeValue(iss.input)}` })
    .max(max, { error: (iss) => `must be ${what}, got ${describeValue(iss.input)}` });
const text = (max: number) =>
  z
    .string({ error: (iss) => `must be text, got ${describeValue(iss.input)}` })
    .max(max, { error: `must be at most ${max} characters` });
const outputEnum = z.enum(OUTPUTS, {
  error: (iss) => `must be one of ${OUTPUTS.join(', ')}, got ${describeValue(iss.input)}`,
});
// JSON has no NaN: a ratio the fit could not form is written as null.
const ratio = z.union([finite('a finite number or null'), z.null()]);
const residualSummary = z.strictObject({
  output: outputEnum,
  points: count('a whole number of points, 0 or more'),
  bias: finite('a finite number (N or N m)'),
  rms: finite('a finite number (N or N m)'),
  relative_rms: ratio,
});
const parameter = z.strictObject({
  name: z.enum(CALIBRATABLE, {
    error: (iss) => `must be one of ${CALIBRATABLE.join(', ')}, got ${describeValue(iss.input)}`,
  }),
  meaning: text(500),
  initial: finite('a finite number'),
  value: finite('a finite number'),
  standard_error: z.union([finite('a finite number 0 or more, or null'), z.null()]),
  interval: z.union([z.tuple([finite('a finite number'), finite('a finite number')]), z.null()]),
  at_bound: z.boolean({ error: (iss) => `must be true or false, got ${describeValue(iss.input)}` }),
});
const fitSchema = z.strictObject({
  label: text(MAX_DATA_NAME_CHARS),
  parameters: z.array(parameter).min(1, { error: 'must list at least one fitted parameter' }).max(10),
  confidence: finite('a number between 0 and 1').refine((v) => v > 0 && v < 1, {
    error: (iss) => `must be between 0 and 1 (exclusive), got ${describeValue(iss.input)}`,
  }),
  degrees_of_freedom: count('a whole number, 0 or more'),
  residual_sd: finite('a finite number 0 or more (N)').refine((v) => v >= 0, {
    error: 'must be 0 or more (N)',
  }),
  converged: z.boolean({ error: (iss) => `must be true or false, got ${describeValue(iss.input)}` }),
  reason: text(500),
  iterations: count('a whole number, 0 or more'),
  model_evaluations: count('a whole number, 0 or more'),
  lattice: z.strictObject({
    span: count('a whole number of panels'),
    chord: count('a whole number of panels'),
    note: text(1000),
  }),
  fitted_to: z.strictObject({
    data: text(MAX_DATA_NAME_CHARS),
    points: count('a whole number of points, 0 or more'),
    outputs: z.array(outputEnum).max(OUTPUTS.length),
  }),
  residuals_before: z.array(residualSummary).max(OUTPUTS.length),
  residuals_after: z.array(residualSummary).max(OUTPUTS.length),
  warnings: z.array(text(2000)).max(50),
});
const dataSchema = z.strictObject(
  {
    name: text(MAX_DATA_NAME_CHARS).min(1, { error: 'must not be empty' }),
    hash: z
      .string({ error: (iss) => `must be text, got ${describeValue(iss.input)}` })
      .regex(/^[0-9a-f]{64}$/, {
        error: (iss) =>
          `must be the data's SHA-256 as 64 lower-case hex digits, got ${describeValue(iss.input)}`,
      }),
    rows: count(`a whole number of data rows from 1 to ${MAX_DATA_ROWS}`, MAX_DATA_ROWS).min(1, {
      error: `must be a whole number of data rows from 1 to ${MAX_DATA_ROWS}`,
    }),
    chars: count(`a whole number of characters from 0 to ${MAX_DATA_BYTES}`, MAX_DATA_BYTES).optional(),
    csv: z
      .string({ error: (iss) => `must be the data's CSV text, got ${describeValue(iss.input)}` })
      .max(MAX_DATA_BYTES, { error: `must be at most ${MAX_DATA_BYTES} characters (the data file limit)` })
      .optional(),
    map: z.unknown().optional(),
    fit: z.unknown().optional(),
  },
  {
    error: (iss) =>
      iss.code === 'unrecognized_keys'
        ? `unknown key ${iss.keys.join(', ')} (allowed: name, hash, rows, chars, csv, map, fit)`
        : `must be an object {"name", "hash", "rows", ...}, got ${describeValue(iss.input)}`,
  },
);

function issuesAt(prefix: string, issues: readonly z.core.$ZodIssue[]): string[] {
  return issues.map((i) => {
    const path = i.path.map((k) => (typeof k === 'number' ? `[${k}]` : `.${String(k)}`)).join('');
    return `${prefix}${path}: ${i.message}`;
  });
}

/**
 * Validate the `data` section; messages read "<label>: data.<field>: <rule>". `verifyHash` checks the
 * CSV against the hash (a project file, the autosave); off only where the caller just computed both.
 */
export function validateSavedData(raw: unknown, label: string, verifyHash = true): Parsed<SavedData> {
  const shape = dataSchema.safeParse(raw);
  if (!shape.success) return { ok: false, errors: issuesAt(`${label}: data`, shape.error.issues) };
  const d = shape.data;
  const errors: string[] = [];
  const value: SavedData = { name: d.name, hash: d.hash, rows: d.rows };
  if (d.chars !== undefined) value.chars = d.chars;
  if (d.csv !== undefined && d.chars !== undefined && d.chars !== d.csv.length) {
    errors.push(`${label}: data.chars: must be the length of data.csv (${d.csv.length}), got ${d.chars}`);
  } else if (d.csv !== undefined) {
    const got = verifyHash ? sha256Hex(d.csv) : d.hash;
    if (got !== d.hash) {
      errors.push(
        `${label}: data.csv: its SHA-256 must equal data.hash (${d.hash.slice(0, 12)}…), got ${got.slice(0, 12)}… (the data was changed after it was saved)`,
      );
    } else value.csv = d.csv;
  }
  if (d.map !== undefined) {
    const m = validateMap(d.map);
    if (!m.ok) errors.push(...m.errors.map((e) => `${label}: data.map.${e}`));
    else value.map = m.value;
  }
  if (d.fit !== undefined) {
    if (d.map === undefined) errors.push(`${label}: data.fit: needs data.map (a fit is made on mapped data)`);
    const f = fitSchema.safeParse(d.fit);
    if (!f.success) errors.push(...issuesAt(`${label}: data.fit`, f.error.issues));
    else {
      const fit = f.data;
      fit.parameters.forEach((p, k) => {
        const [lo, hi] = PARAMETER_BOUNDS[p.name];
        if (!(p.value >= lo && p.value <= hi))
          errors.push(
            `${label}: data.fit.parameters[${k}].value: ${p.name} must lie in ${lo}..${hi}, got ${p.value}`,
          );
        if (p.interval && !(p.interval[0] <= p.interval[1]))
          errors.push(`${label}: data.fit.parameters[${k}].interval: must be [low, high] with low <= high`);
      });
      if (fit.fitted_to.points > d.rows * OUTPUTS.length)
        errors.push(
          `${label}: data.fit.fitted_to.points: at most ${OUTPUTS.length} values per data row (${d.rows * OUTPUTS.length}), got ${fit.fitted_to.points}`,
        );
      value.fit = {
        ...fit,
        residuals_before: fit.residuals_before.map(fromJsonSummary),
        residuals_after: fit.residuals_after.map(fromJsonSummary),
      };
    }
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, value };
}

function fromJsonSummary<T extends { relative_rms: number | null }>(s: T): T & { relative_rms: number } {
  return { ...s, relative_rms: s.relative_rms ?? Number.NaN };
}

/** The fit as kept (its per-point residuals left out; NaN ratios become null in JSON by themselves). */
export function savedFit(c: CalibrationResult): SavedFit {
  const { residuals: _rows, ...rest } = c;
  return structuredClone(rest);
}

/** A kept fit as a calibration result for the panel (no per-point rows: the comparison has them). */
export function fitResult(f: SavedFit): CalibrationResult {
  return { ...f, residuals: [] };
}

/** The data as a link carries it: the reference, the mapping and the fit, never the rows. */
export function dataReference(d: SavedData): SavedData {
  const { csv: _csv, ...ref } = d;
  return ref;
}

/** A short form of the hash for messages. */
export function shortHash(hash: string): string {
  return `${hash.slice(0, 12)}…`;
}

/** The data panel's note for data named only by its reference (a link), waiting for its file. */
export function pendingText(d: SavedData): string {
  return (
    `This design refers to data “${d.name}” (${d.rows} rows, SHA-256 ${shortHash(d.hash)}) whose rows are not in this browser ` +
    `(a link carries a reference to the data, not its rows). Import the same file again and its mapping${d.fit ? ' and fit' : ''} come back.`
  );
}

/** Said of a table read while a reference waited for different data. */
export function notReferencedText(d: SavedData): string {
  return ` This is not the data the design refers to (“${d.name}”, SHA-256 ${shortHash(d.hash)}): its content differs, so its mapping and fit were not used.`;
}

/** Said under a fit restored as it was saved. */
export const FIT_RESTORED_NOTE =
  ' This fit is shown as it was saved, not made again: fitting takes seconds, and with the calibrated model in use it would start from the fitted values and need not end at exactly the same ones. The comparison above is recomputed with the current design. Run the fit again to refresh it.';
