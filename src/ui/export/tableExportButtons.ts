/**
 * A table's CSV and JSON buttons: every row at full precision with the header block (design, conditions,
 * model, CALIBRATED, units, version, date) read at the click; files named after the current design.
 */
import type { Cell } from '../dataTable';
import { downloadText } from '../download';
import { exportButton } from './exportButton';
import { currentExportMeta } from './exportContext';
import type { ExportMeta } from './exportMeta';
import { tableCsv } from './tableCsv';
import { tableJson } from './tableJson';

export interface TableExport {
  title(): string;
  suffix: string;
  /** Headers (units in the names) and rows at full precision, in the order shown. */
  data(): { headers: string[]; rows: Cell[][] };
  extra?: (meta: ExportMeta) => string[];
}

export function tableExportButtons(t: TableExport): HTMLButtonElement[] {
  const file = (ext: string, write: typeof tableCsv, mime: string) => () => {
    const meta = currentExportMeta();
    const { headers, rows } = t.data();
    if (headers.length === 0) throw new Error('the table is empty: nothing computed yet');
    downloadText(
      `${meta.design.file_stem}-${t.suffix}.${ext}`,
      write(meta, t.title(), headers, rows, t.extra?.(meta) ?? []),
      mime,
    );
  };
  return [
    exportButton('CSV', `Save as CSV: ${t.title()}`, file('csv', tableCsv, 'text/csv')),
    exportButton('JSON', `Save as JSON: ${t.title()}`, file('json', tableJson, 'application/json')),
  ];
}
