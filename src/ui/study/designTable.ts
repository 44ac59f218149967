/**
 * The designs of a study as a sortable table: one row per evaluated design, the study's variables (lengths
 * in mm, as the page's inputs) and the chosen objective columns, a unit in every numeric header ("–" for a
 * ratio); each header sorts by its column (aria-sort says which); a click on a row (or Enter on it) calls
 * `onSelect` with the design's index. The optimum and the front's designs are marked, the selected row
 * highlighted, and the cautions stand under the table. CSV and JSON buttons save every row at full
 * precision with the export header (design, conditions, the study's objective and limits, the ride).
 */
import { designVariable, type StudyDocument } from '../../compute/design/index';
import { el } from '../dom';
import { tableExportButtons } from '../export/tableExportButtons';
import { studyCaptionLine } from './studyCaptionLine';
import { studyCautions } from './studyCautions';
import {
  cellText,
  cellValue,
  headerText,
  type StudyColumn,
  type StudyRow,
  sortRows,
  studyRows,
} from './studyRows';

export interface DesignTable {
  element: HTMLElement;
  /** Highlight a design (by index) without calling onSelect. */
  setSelected(index: number | null): void;
}

/** The table's columns: the study's variables, then every objective, then the savings of the objective. */
export function designColumns(doc: StudyDocument): StudyColumn[] {
  const objectives = [doc.objective, ...doc.limits, doc.front.handling];
  const seen = new Set<string>();
  // Lengths in mm, as the page's inputs give them (the study result holds SI metres).
  const cols: StudyColumn[] = doc.variables.map((v) => ({
    key: v.id,
    label: designVariable(v.id)?.label ?? v.id,
    ...(v.unit === 'm' ? { unit: 'mm', factor: 1000 } : { unit: v.unit }),
    from: 'design',
  }));
  for (const o of objectives) {
    if (seen.has(o.id)) continue;
    seen.add(o.id);
    cols.push({ key: o.id, label: o.label, unit: o.unit, from: 'objectives' });
  }
  cols.push({
    key: doc.objective.id,
    label: `${doc.objective.label} saved`,
    unit: doc.objective.unit,
    from: 'saved',
  });
  return cols;
}

/** A column's header: its label and unit; a dimensionless ratio says "–", a text column has no unit. */
export function columnHeader(c: StudyColumn): string {
  return c.unit === '1' ? `${c.label} (–)` : headerText(c.label, c.unit);
}

/** The table as an export: '#', the design's role, then every column, rows in evaluation order. */
export function designTableData(
  doc: StudyDocument,
  columns: StudyColumn[],
): { headers: string[]; rows: Array<Array<number | string | null>> } {
  return {
    headers: ['Design #', 'Role', ...columns.map(columnHeader)],
    rows: studyRows(doc).map((r) => [r.index, r.role, ...columns.map((c) => cellValue(r, c))]),
  };
}

export function designTable(
  doc: StudyDocument,
  onSelect: (index: number) => void,
  columns: StudyColumn[] = designColumns(doc),
): DesignTable {
  const rows = studyRows(doc);
  let sortBy = -1;
  let ascending = true;
  let selected: number | null = null;
  const head = el('tr');
  const body = el('tbody');
  const table = el('table', { className: 'data-table design-table' }, [
    el('caption', { text: `Designs evaluated (${rows.length}); click a row to make it the current design` }),
    el('thead', {}, [head]),
    body,
  ]);
  const drawBody = () => {
    const shown = sortBy < 0 ? rows : sortRows(rows, columns[sortBy]!, ascending);
    body.replaceChildren(
      ...shown.map((r: StudyRow) => {
        const tr = el(
          'tr',
          {
            className: [r.role, r.meetsLimits ? '' : 'over-limit', r.index === selected ? 'selected' : '']
              .join(' ')
              .trim(),
            attrs: {
              tabindex: '0',
              'data-index': String(r.index),
              'aria-selected': String(r.index === selected),
            },
          },
          [
            el('th', {
              text: r.role === 'design' ? String(r.index) : `${r.index} ${r.role}`,
              attrs: { scope: 'row' },
            }),
            ...columns.map((c) => el('td', { text: cellText(cellValue(r, c)) })),
          ],
        );
        tr.addEventListener('click', () => onSelect(r.index));
        tr.addEventListener('keydown', (e) => {
          if (e.key === 'Enter') onSelect(r.index);
        });
        return tr;
      }),
    );
  };
  const drawHead = () => {
    head.replaceChildren(
      el('th', { text: '#', attrs: { scope: 'col' } }),
      ...columns.map((c, k) => {
        const button = el('button', {
          className: 'sort',
          text: columnHeader(c),
          attrs: { type: 'button' },
        });
        button.addEventListener('click', () => {
          if (sortBy === k) ascending = !ascending;
          else {
            sortBy = k;
            ascending = true;
          }
          drawHead();
          drawBody();
        });
        const th = el('th', { attrs: { scope: 'col' } }, [button]);
        if (k === sortBy) th.setAttribute('aria-sort', ascending ? 'ascending' : 'descending');
        return th;
      }),
    );
  };
  drawHead();
  drawBody();
  const exportHead = el('div', { className: 'table-head' });
  exportHead.append(
    ...tableExportButtons({
      title: () => 'Designs evaluated by the design study',
      suffix: 'study-designs',
      data: () => designTableData(doc, columns),
      extra: (meta) => [studyCaptionLine(doc), meta.ride],
    }),
  );
  const element = el('div', { className: 'table-block', attrs: { id: 'table-study-designs-block' } }, [
    exportHead,
    el('div', { className: 'table-scroll' }, [table]),
    studyCautions(doc.cautions),
  ]);
  return {
    element,
    setSelected: (index) => {
      selected = index;
      drawBody();
    },
  };
}
