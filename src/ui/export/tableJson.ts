/**
 * A table as self-describing JSON: `format` and `version` of the file, `metadata` (the export's design,
 * conditions, model options, calibration, units, tool version and date), the column names (with their
 * units) and the rows as arrays. Numbers that are not finite are written as null.
 */
import type { Cell } from '../dataTable';
import { checkTableRows } from './checkTableRows';
import type { ExportMeta } from './exportMeta';

export const TABLE_FORMAT = 'coversweep-table';
export const TABLE_VERSION = 1;

export function tableJson(
  meta: ExportMeta,
  title: string,
  headers: readonly string[],
  rows: ReadonlyArray<ReadonlyArray<Cell>>,
  extra: readonly string[] = [],
): string {
  checkTableRows('tableJson', headers, rows);
  const doc = {
    format: TABLE_FORMAT,
    version: TABLE_VERSION,
    table: title,
    metadata: { ...meta, notes: extra.filter((l) => l.trim() !== '') },
    columns: [...headers],
    rows: rows.map((r) => r.map((c) => (typeof c === 'number' && !Number.isFinite(c) ? null : c))),
  };
  return `${JSON.stringify(doc, null, 2)}\n`;
}
