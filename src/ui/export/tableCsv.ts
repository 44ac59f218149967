/**
 * A table as self-describing CSV: `# key: value` comment lines (metaHeaderLines), then the project's CSV
 * (src/ui/csv.ts: a header row with units in the column names, RFC 4180 quoting). The tool's own CSV
 * reader (compute/compare/csvReader) skips lines starting with '#', so the file reads back as a table.
 */
import { toCsv } from '../csv';
import type { Cell } from '../dataTable';
import { checkTableRows } from './checkTableRows';
import type { ExportMeta } from './exportMeta';
import { metaHeaderLines } from './metaHeaderLines';

export function tableCsv(
  meta: ExportMeta,
  title: string,
  headers: readonly string[],
  rows: ReadonlyArray<ReadonlyArray<Cell>>,
  extra: readonly string[] = [],
): string {
  checkTableRows('tableCsv', headers, rows);
  const head = metaHeaderLines(meta, title, extra).map(([k, v]) => `# ${k}: ${v}`);
  return `${head.join('\r\n')}\r\n${toCsv(headers, rows)}`;
}
