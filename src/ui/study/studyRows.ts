/**
 * Pure helpers behind the study views (no DOM, unit-tested in Node): the rows of a study result as the
 * table and the plot show them, sorting, cell text, and the nearest point to a click.
 */
import type { StudyDocument } from '../../compute/design/index';

/** One design as the views show it. */
export interface StudyRow {
  /** Index of the design in the order evaluated (the result's `designs[k].index`). */
  index: number;
  role: 'optimum' | 'front' | 'design';
  design: Record<string, number | string | null>;
  objectives: Record<string, number | null>;
  saved: Record<string, number | null>;
  meetsLimits: boolean;
}

/** A column of the design table: a design variable or an objective, with its unit. */
export interface StudyColumn {
  key: string;
  label: string;
  unit: string;
  /** Where the value is read: the design's variables, its objectives, or its savings. */
  from: 'design' | 'objectives' | 'saved';
  /** Shown as the value times this (a length in m shown in mm, as the page's inputs); 1 when absent. */
  factor?: number;
}

export function studyRows(doc: StudyDocument): StudyRow[] {
  const front = new Set(doc.front.points.map((p) => p.index));
  return doc.designs.map((d) => ({
    index: d.index,
    role: d.index === doc.optimum.index ? 'optimum' : front.has(d.index) ? 'front' : 'design',
    design: d.design,
    objectives: d.objectives,
    saved: d.saved_vs_baseline,
    meetsLimits: d.meets_limits,
  }));
}

export function cellValue(row: StudyRow, column: StudyColumn): number | string | null {
  const source =
    column.from === 'design' ? row.design : column.from === 'objectives' ? row.objectives : row.saved;
  const v = source[column.key] ?? null;
  return typeof v === 'number' && column.factor !== undefined ? v * column.factor : v;
}

/**
 * Rows sorted by a column (a copy): numbers numerically, text alphabetically, missing values last in
 * either direction; ties keep the evaluation order.
 */
export function sortRows(rows: readonly StudyRow[], column: StudyColumn, ascending: boolean): StudyRow[] {
  const dir = ascending ? 1 : -1;
  return [...rows].sort((a, b) => {
    const x = cellValue(a, column);
    const y = cellValue(b, column);
    if (x === null || y === null) return x === y ? a.index - b.index : x === null ? 1 : -1;
    const c = typeof x === 'number' && typeof y === 'number' ? x - y : String(x).localeCompare(String(y));
    return c !== 0 ? dir * c : a.index - b.index;
  });
}

/** A cell's text: numbers to four significant figures (exact values are in the CSV), '—' when missing. */
export function cellText(value: number | string | null): string {
  if (value === null) return '—';
  if (typeof value === 'string') return value;
  if (value === 0) return '0';
  const a = Math.abs(value);
  return a >= 1e-3 && a < 1e6 ? String(Number(value.toPrecision(4))) : value.toExponential(3);
}

/** A header's text: the label with its unit in brackets (none for dimensionless '1' or ''). */
export function headerText(label: string, unit: string): string {
  return unit === '' || unit === '1' ? label : `${label} (${unit})`;
}

/**
 * The point nearest to (x, y) in pixels among `points` (pixel coordinates), if within `radiusPx`;
 * returns its position in `points`, or -1. Ties go to the earlier point.
 */
export function nearestPoint(
  points: readonly { x: number; y: number }[],
  x: number,
  y: number,
  radiusPx: number,
): number {
  let best = -1;
  let bestD = radiusPx * radiusPx;
  points.forEach((p, k) => {
    const d = (p.x - x) ** 2 + (p.y - y) ** 2;
    if (d <= bestD && (best < 0 || d < bestD)) {
      best = k;
      bestD = d;
    }
  });
  return best;
}
