/**
 * The data panel's heavy work, run in the data panel's own worker (dataJobs.worker.ts) so that a large
 * table never blocks the page: reading the CSV (a dropped file is handed over as a File and read there), guessing the columns, and
 * the comparison. The parsed table stays in the worker (keyed by the panel's reference); the page only
 * ever holds a summary (headers, row count, a few rows, the guessed map) and the text as read with its
 * SHA-256 (to keep with the page state). A fresh worker (after a
 * cancel or a crash) reads the source again. The comparison's per-point results travel back as
 * columns of typed arrays (buffers transferred, no per-row objects to copy), and the page reads rows
 * from them on demand. No DOM here: this module runs in the worker and in the page.
 */
import { transfer } from 'comlink';
import {
  type CompareReport,
  type CompareRequest,
  type ConvertedRow,
  type CsvResult,
  type CsvTable,
  type GuessContext,
  guessMap,
  type MapGuess,
  OUTPUTS,
  type Output,
  parseCsvText,
  type ResidualRow,
  readCsvStream,
  runComparison,
} from '../compute/compare/index';
import { BoundedCache } from '../compute/engine/boundedCache';
import { sha256Hex } from '../compute/sha256';
import { modelAtDataHere } from '../compute/study/dataComparisonStudy';

/** Where a table comes from: a file the user chose, or text (pasted, or the demo file). */
export type TableSource = { kind: 'file'; file: File } | { kind: 'text'; text: string };

export interface TableRef {
  /** The panel's number for this table (a new one per read). */
  id: number;
  source: TableSource;
  label: string;
}

/** Rows of the table shown in the mapping's preview. */
export const PREVIEW_ROWS = 6;

export interface TableSummary {
  headers: string[];
  rowCount: number;
  preview: string[][];
  guess: MapGuess;
  /**
   * The table's text as read (kept with the page's state), or null when longer than MAX_INLINE_CHARS: a
   * large text stays here until a project file asks for it (tableText), so reading never moves tens
   * of MB to the page. Its length in characters, and its SHA-256, which names it in a link.
   */
  text: string | null;
  chars: number;
  hash: string;
}

/** Longest table text handed to the page with its summary (characters): what the autosave can keep. */
export const MAX_INLINE_CHARS = 2_000_000;

export type TextOutcome = { ok: true; text: string } | { ok: false; errors: string[] };

export type ReadOutcome = { ok: true; summary: TableSummary } | { ok: false; errors: string[] };

/** The comparison's per-data-point values as columns (NaN where a row has no value). */
export interface ConvertedColumns {
  count: number;
  line: Float64Array;
  yaw_deg: Float64Array;
  airspeed_mps: Float64Array;
  air_density_kgpm3: Float64Array;
  values: Partial<Record<Output, Float64Array>>;
}

/** The residuals as columns; `output` indexes OUTPUTS; uncertainty NaN = none, within 1/0/NaN. */
export interface ResidualColumns {
  count: number;
  line: Float64Array;
  yaw_deg: Float64Array;
  airspeed_mps: Float64Array;
  output: Uint8Array;
  data: Float64Array;
  model: Float64Array;
  residual: Float64Array;
  uncertainty: Float64Array;
  within: Float64Array;
}

/** A comparison for the page: the report without its per-point arrays, and those as columns. */
export interface PackedComparison {
  report: CompareReport;
  converted: ConvertedColumns;
  residuals: ResidualColumns;
}

export type PackedResult = { ok: true; value: PackedComparison } | { ok: false; errors: string[] };

export interface TableCompareRequest extends Omit<CompareRequest, 'table'> {
  ref: TableRef;
}

export interface DataJobsApi {
  readTable(ref: TableRef, context: GuessContext): Promise<ReadOutcome>;
  /** The table's text as read (a large one, held back by readTable), or an error. */
  tableText(ref: TableRef): Promise<TextOutcome>;
  compareTable(request: TableCompareRequest): Promise<PackedResult>;
}

// ---------------------------------------------------------------------------------------------
// Packing (worker side)

export function packConverted(rows: readonly ConvertedRow[]): ConvertedColumns {
  const n = rows.length;
  const c: ConvertedColumns = {
    count: n,
    line: new Float64Array(n),
    yaw_deg: new Float64Array(n),
    airspeed_mps: new Float64Array(n),
    air_density_kgpm3: new Float64Array(n),
    values: {},
  };
  for (const out of OUTPUTS) {
    if (rows.some((r) => r[out] !== undefined)) c.values[out] = new Float64Array(n).fill(Number.NaN);
  }
  rows.forEach((r, i) => {
    c.line[i] = r.line;
    c.yaw_deg[i] = r.yaw_deg;
    c.airspeed_mps[i] = r.airspeed_mps;
    c.air_density_kgpm3[i] = r.air_density_kgpm3;
    for (const out of OUTPUTS) {
      const v = r[out];
      if (v !== undefined) c.values[out]![i] = v;
    }
  });
  return c;
}

export function packResiduals(rows: readonly ResidualRow[]): ResidualColumns {
  const n = rows.length;
  const c: ResidualColumns = {
    count: n,
    line: new Float64Array(n),
    yaw_deg: new Float64Array(n),
    airspeed_mps: new Float64Array(n),
    output: new Uint8Array(n),
    data: new Float64Array(n),
    model: new Float64Array(n),
    residual: new Float64Array(n),
    uncertainty: new Float64Array(n),
    within: new Float64Array(n),
  };
  rows.forEach((r, i) => {
    c.line[i] = r.line;
    c.yaw_deg[i] = r.yaw_deg;
    c.airspeed_mps[i] = r.airspeed_mps;
    c.output[i] = OUTPUTS.indexOf(r.output);
    c.data[i] = r.data;
    c.model[i] = r.model;
    c.residual[i] = r.residual;
    c.uncertainty[i] = r.model_uncertainty ?? Number.NaN;
    c.within[i] = r.within_band === null ? Number.NaN : r.within_band ? 1 : 0;
  });
  return c;
}

function buffersOf(p: PackedComparison): ArrayBuffer[] {
  const arrays: Array<Float64Array | Uint8Array> = [
    p.converted.line,
    p.converted.yaw_deg,
    p.converted.airspeed_mps,
    p.converted.air_density_kgpm3,
    ...Object.values(p.converted.values),
    p.residuals.line,
    p.residuals.yaw_deg,
    p.residuals.airspeed_mps,
    p.residuals.output,
    p.residuals.data,
    p.residuals.model,
    p.residuals.residual,
    p.residuals.uncertainty,
    p.residuals.within,
  ];
  return arrays.map((a) => a.buffer as ArrayBuffer);
}

// ---------------------------------------------------------------------------------------------
// Reading rows back (page side)

export function convertedRowAt(c: ConvertedColumns, i: number): ConvertedRow {
  const row: ConvertedRow = {
    line: c.line[i]!,
    yaw_deg: c.yaw_deg[i]!,
    airspeed_mps: c.airspeed_mps[i]!,
    air_density_kgpm3: c.air_density_kgpm3[i]!,
  };
  for (const out of OUTPUTS) {
    const v = c.values[out]?.[i];
    if (v !== undefined && !Number.isNaN(v)) row[out] = v;
  }
  return row;
}

export function residualRowAt(c: ResidualColumns, i: number): ResidualRow {
  const u = c.uncertainty[i]!;
  const w = c.within[i]!;
  return {
    line: c.line[i]!,
    yaw_deg: c.yaw_deg[i]!,
    airspeed_mps: c.airspeed_mps[i]!,
    output: OUTPUTS[c.output[i]!]!,
    data: c.data[i]!,
    model: c.model[i]!,
    residual: c.residual[i]!,
    model_uncertainty: Number.isNaN(u) ? null : u,
    within_band: Number.isNaN(w) ? null : w === 1,
  };
}

/** The whole report with its per-point arrays as objects again (for inspection and tests). */
export function unpackComparison(p: PackedComparison): CompareReport {
  const converted: ConvertedRow[] = [];
  for (let i = 0; i < p.converted.count; i++) converted.push(convertedRowAt(p.converted, i));
  const residuals: ResidualRow[] = [];
  for (let i = 0; i < p.residuals.count; i++) residuals.push(residualRowAt(p.residuals, i));
  return { ...p.report, converted, residuals };
}

// ---------------------------------------------------------------------------------------------
// The worker's side

const tables = new BoundedCache<number, CsvTable>(2);

async function readSource(source: TableSource): Promise<CsvResult> {
  if (source.kind === 'text') return parseCsvText(source.text);
  try {
    return await readCsvStream(source.file.stream() as ReadableStream<Uint8Array>, {
      knownSize: source.file.size,
    });
  } catch (error) {
    return { ok: false, errors: [`could not read the file: ${(error as Error).message}`] };
  }
}

async function textOf(source: TableSource): Promise<TextOutcome> {
  try {
    return { ok: true, text: source.kind === 'text' ? source.text : await source.file.text() };
  } catch (error) {
    return { ok: false, errors: [`could not read the file: ${(error as Error).message}`] };
  }
}

async function tableFor(ref: TableRef): Promise<CsvResult> {
  const kept = tables.get(ref.id);
  if (kept) return { ok: true, value: kept };
  const r = await readSource(ref.source);
  if (r.ok) tables.set(ref.id, r.value);
  return r;
}

export const dataJobsApi: DataJobsApi = {
  async readTable(ref, context) {
    const r = await tableFor(ref);
    if (!r.ok) return r;
    const t = r.value;
    const read = await textOf(ref.source);
    if (!read.ok) return read;
    const text = read.text;
    return {
      ok: true,
      summary: {
        headers: t.headers,
        rowCount: t.rows.length,
        preview: t.rows.slice(0, PREVIEW_ROWS),
        guess: guessMap(t.headers, t, context),
        text: text.length <= MAX_INLINE_CHARS ? text : null,
        chars: text.length,
        hash: sha256Hex(text),
      },
    };
  },
  tableText: (ref) => textOf(ref.source),
  async compareTable(request) {
    const { ref, ...rest } = request;
    const t = await tableFor(ref);
    if (!t.ok) return t;
    let result: ReturnType<typeof runComparison>;
    try {
      result = runComparison({ ...rest, table: t.value }, modelAtDataHere);
    } catch (error) {
      return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
    }
    if (!result.ok) return result;
    const packed: PackedComparison = {
      report: { ...result.value, converted: [], residuals: [] },
      converted: packConverted(result.value.converted),
      residuals: packResiduals(result.value.residuals),
    };
    return transfer({ ok: true, value: packed }, buffersOf(packed));
  },
};
