/** A ReportTable as an HTML table (first cell of each row a row header) with its notes under it. */
import { el } from '../dom';
import type { ReportTable } from './reportTypes';

export function reportTableDom(t: ReportTable, className: string): HTMLElement {
  return el('div', { className: 'report-table-block' }, [
    el('table', { className: `report-table ${className}` }, [
      el('thead', {}, [
        el(
          'tr',
          {},
          t.head.map((h) => el('th', { attrs: { scope: 'col' }, text: h })),
        ),
      ]),
      el(
        'tbody',
        {},
        t.rows.map((cells) =>
          el('tr', {}, [
            el('th', { attrs: { scope: 'row' }, text: cells[0] ?? '' }),
            ...cells.slice(1).map((c) => el('td', { text: c })),
          ]),
        ),
      ),
    ]),
    ...t.notes.map((n) => el('p', { className: 'report-note', text: n })),
  ]);
}
