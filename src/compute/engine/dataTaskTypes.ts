/**
 * The data panel's tasks (tasks.ts: `dataRead`, `dataText`, `dataCompare`), run on the pool's task
 * workers by compute/worker/dataTasks.ts: what they take and answer. A table is named by the panel's
 * reference (a new id per read) and always travels with its source (a File, a cheap handle, or the
 * text), so a worker that does not hold the parsed table (a fresh one after a crash, a hang or a cancel,
 * or the other task worker) reads it again: the user's data is never lost with a worker.
 */
import type { CompareReport, CompareRequest, GuessContext, MapGuess, Output } from '../compare/index';

export type { GuessContext };

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
   * large text stays in the task worker until a project file asks for it (the `dataText` task), so reading never moves tens
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
