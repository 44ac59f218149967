/**
 * The data panel's mapping table: one row per column of the data (what it holds, its unit, a
 * reference area for coefficients), pre-filled from the guess, and read back as a map file.
 */
import {
  COEFFICIENT_QUANTITIES,
  MAP_FORMAT,
  MAP_VERSION,
  type MapColumn,
  type MapFile,
  QUANTITIES,
  QUANTITY_UNITS,
  type Quantity,
  type Unit,
} from '../../compute/compare/index';
import type { TableSummary } from '../../compute/engine/dataTaskTypes';
import { speedFromMps, speedToMps, speedUnitText } from '../displayUnits';
import { el } from '../dom';
import type { SpeedUnit } from '../viewState';
import { QUANTITY_TEXT, UNIT_TEXT } from './dataLabels';
import type { DataContext, DataPanelDom } from './dataPanelTypes';

export interface MapRow {
  header: string;
  quantity: HTMLSelectElement;
  unit: HTMLSelectElement;
  area: HTMLInputElement;
  areaCell: HTMLElement;
}

/**
 * Fill the mapping table for a table just read, pre-filled with the guess, or with `given` (a mapping
 * applied before, restored from a project file, the autosave or a link); returns its rows.
 */
export function fillMappingForm(
  dom: DataPanelDom,
  table: TableSummary,
  ctx: DataContext,
  given?: MapFile,
): MapRow[] {
  const guess = given
    ? { map: given, notes: ['The mapping as it was applied when this data was saved.'] }
    : table.guess;
  // Column names are data: look them up without the prototype chain ("__proto__" is a name too).
  const guessed = new Map(Object.entries(guess.map.columns));
  const rows: MapRow[] = [];
  const body = document.createDocumentFragment();
  table.headers.forEach((header, k) => {
    const col = guessed.get(header) ?? { quantity: 'ignore', unit: '1' };
    const unsure = guess.notes.some((n) => n.startsWith(`"${header}"`) && /CHECK|not recognised/.test(n));
    const quantity = el('select', {
      attrs: { 'aria-label': `Column ${k + 1}: what it holds`, 'data-col': String(k) },
    });
    for (const q of QUANTITIES) {
      const o = el('option', { text: QUANTITY_TEXT[q] });
      o.value = q;
      quantity.append(o);
    }
    quantity.value = col.quantity;
    const unit = el('select', { attrs: { 'aria-label': `Column ${k + 1}: unit` } });
    const area = el('input', {
      attrs: { type: 'number', step: 'any', 'aria-label': `Column ${k + 1}: reference area, m²` },
    });
    area.value = String(col.reference_area_m2 ?? Number(ctx.referenceAreaM2.toPrecision(6)));
    const areaCell = el('td', {}, [area]);
    const fillUnits = (selected: Unit | null) => {
      const q = quantity.value as Quantity;
      const allowed = q === 'ignore' ? (['1'] as Unit[]) : QUANTITY_UNITS[q];
      unit.replaceChildren(
        ...allowed.map((u) => {
          const o = el('option', { text: UNIT_TEXT[u] });
          o.value = u;
          return o;
        }),
      );
      unit.value = selected && allowed.includes(selected) ? selected : allowed[0]!;
      area.hidden = !COEFFICIENT_QUANTITIES.includes(q);
    };
    fillUnits(col.unit);
    quantity.addEventListener('change', () => fillUnits(null));
    const headerCell = el('th', { attrs: { scope: 'row' } });
    headerCell.textContent = header;
    const mark = el('td', { className: unsure ? 'check' : '', text: unsure ? 'check' : '' });
    body.append(
      el('tr', { className: unsure ? 'unsure' : '' }, [
        headerCell,
        el('td', {}, [quantity]),
        el('td', {}, [unit]),
        areaCell,
        mark,
      ]),
    );
    rows.push({ header, quantity, unit, area, areaCell });
  });
  dom.mapBody.replaceChildren(body);
  dom.sideSign.value = String(guess.map.side_force_sign);
  const su = ctx.speedUnit;
  dom.speedUnitEl.textContent = speedUnitText(su);
  dom.speedInput.value = String(
    Number(speedFromMps(guess.map.airspeed_mps ?? ctx.airspeedMps, su).toPrecision(6)),
  );
  dom.densityInput.value = given?.air_density_kgpm3 === undefined ? '' : String(given.air_density_kgpm3);
  dom.guessNotes.replaceChildren(...guess.notes.map((n) => el('li', { text: n })));
  dom.mapErrors.replaceChildren();
  // A preview of the first rows, as read (text only).
  const head = el(
    'tr',
    {},
    table.headers.map((h) => el('th', { text: h, attrs: { scope: 'col' } })),
  );
  const previewRows = table.preview.map((r) =>
    el(
      'tr',
      {},
      r.map((c) => el('td', { text: c })),
    ),
  );
  dom.preview.replaceChildren(
    el('table', { className: 'data-table', attrs: { id: 'data-preview' } }, [
      el('thead', {}, [head]),
      el('tbody', {}, previewRows),
    ]),
  );
  dom.mapping.hidden = false;
  return rows;
}

/** The mapping table as a map file (not yet validated). */
export function mapFromForm(
  dom: DataPanelDom,
  rows: readonly MapRow[],
  speedUnit: SpeedUnit,
): { map: unknown; errors: string[] } {
  const errors: string[] = [];
  // No prototype: a column may be named "__proto__", "constructor" or "prototype".
  const columns: Record<string, MapColumn> = Object.create(null);
  for (const r of rows) {
    const q = r.quantity.value as Quantity;
    const col: MapColumn = { quantity: q, unit: r.unit.value as Unit };
    if (COEFFICIENT_QUANTITIES.includes(q)) {
      const a = Number(r.area.value);
      if (r.area.value.trim() === '' || !Number.isFinite(a)) {
        errors.push(`column "${r.header}": the reference area must be a number of m²`);
      }
      col.reference_area_m2 = a;
    }
    columns[r.header] = col;
  }
  const map: Record<string, unknown> = {
    format: MAP_FORMAT,
    version: MAP_VERSION,
    columns,
    side_force_sign: Number(dom.sideSign.value),
  };
  const hasSpeed = Object.values(columns).some((c) => c.quantity === 'speed');
  if (!hasSpeed) {
    const v = Number(dom.speedInput.value);
    if (dom.speedInput.value.trim() === '' || !Number.isFinite(v)) {
      errors.push('airspeed: give the airspeed of the measurements (no column holds it)');
    } else map.airspeed_mps = speedToMps(v, speedUnit);
  }
  const hasDensity = Object.values(columns).some((c) => c.quantity === 'air_density');
  if (dom.densityInput.value.trim() !== '' && !hasDensity) {
    map.air_density_kgpm3 = Number(dom.densityInput.value);
  }
  return { map, errors };
}
