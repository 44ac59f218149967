/** A table read from CSV, the reader's limits, and the size check made before reading. */

/** Largest data file accepted (bytes). Tunnel and CFD result tables are far smaller. */
export const MAX_DATA_BYTES = 32 * 1024 * 1024;
/** Most data rows accepted. */
export const MAX_DATA_ROWS = 100_000;
/** The header line must start within this many characters (after comments and blank lines). */
export const MAX_PREAMBLE_CHARS = 1024 * 1024;
/** Most columns accepted in one row. */
export const MAX_DATA_COLUMNS = 1000;
/** Most error messages reported for one file. */
export const MAX_CSV_ERRORS = 20;

export type Delimiter = ',' | ';' | '\t';

export interface CsvTable {
  headers: string[];
  /** Data rows (trimmed cells), each as long as `headers`. */
  rows: string[][];
  /** 1-based line number in the file where each row starts. */
  lineNumbers: number[];
  delimiter: Delimiter;
  /** True when numbers may use a decimal comma (semicolon or tab delimiter). */
  decimalComma: boolean;
}

export type CsvResult = { ok: true; value: CsvTable } | { ok: false; errors: string[] };

function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  if (bytes >= 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${bytes} bytes`;
}

/** A message when a file of `bytes` is too large to read, else null. Check before reading. */
export function checkDataSize(bytes: number, maxBytes = MAX_DATA_BYTES): string | null {
  if (!(bytes >= 0)) return `data file size ${bytes}: not a valid size`;
  if (bytes > maxBytes) {
    return (
      `data file is ${formatBytes(bytes)}, more than the ${formatBytes(maxBytes)} limit: a comparison needs a table ` +
      `of results (yaw angle, forces, ...), not raw samples; average or decimate it first (at most ${MAX_DATA_ROWS} rows)`
    );
  }
  return null;
}
