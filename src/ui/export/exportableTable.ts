/**
 * A table block with CSV and JSON buttons above the table (`.table-head`), as in the Tables tab: the
 * files carry the header block (design, conditions, model, CALIBRATED, units, version, date).
 */
import type { DataTable } from '../dataTable';
import type { ExportMeta } from './exportMeta';
import { tableExportButtons } from './tableExportButtons';

export function exportableTable(
  scroll: HTMLElement,
  table: DataTable,
  suffix: string,
  extra?: (meta: ExportMeta) => string[],
): HTMLElement {
  const head = document.createElement('div');
  head.className = 'table-head';
  head.append(
    ...tableExportButtons({
      title: () => table.caption(),
      suffix,
      data: () => table.exportData(),
      ...(extra ? { extra } : {}),
    }),
  );
  const block = document.createElement('div');
  block.className = 'table-block';
  block.id = `${table.id}-block`;
  block.append(head, scroll);
  return block;
}
