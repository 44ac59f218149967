/**
 * The result table (CSV): a header row, then one row per case and operating point. Columns: the
 * plan's varied parameters by key path, then the result columns in the output document's order,
 * components flattened (surface_axial_N, ...), uncertainty as gci_axial_N / gci_side_N, flags joined
 * with ';', and last `error` (empty, or why the case failed: its other result fields are then empty). Numbers are printed in JavaScript's shortest round-trip form (ECMA-262 Number::toString),
 * empty for null; text is quoted per RFC 4180 when it holds a comma, quote or line break. Lines end
 * with "\n".
 */
import { COMPONENT_KEYS, COMPONENT_NAMES, RESULT_SCALAR_KEYS, type ResultDocument } from './caseFile';
import type { PlanValue } from './planFile';

/** The result columns after the varied parameters, in order. */
export function resultColumnNames(): string[] {
  const names: string[] = [...RESULT_SCALAR_KEYS];
  for (const c of COMPONENT_NAMES) for (const k of COMPONENT_KEYS) names.push(`${c}_${k}`);
  names.push('gci_axial_N', 'gci_side_N', 'flags', 'error');
  return names;
}

/** All columns of a table whose cases vary `variedKeys`. */
export function tableColumns(variedKeys: readonly string[]): string[] {
  const result = resultColumnNames();
  const clash = variedKeys.find((k) => result.includes(k));
  if (clash !== undefined) throw new RangeError(`variedKeys: "${clash}" clashes with a result column name`);
  return [...variedKeys, ...result];
}

/** A plain decimal number written as text: safe in a spreadsheet, kept as it is. */
const NUMBER_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * One CSV field. Numbers are written as numbers (a negative number stays `-1.5e-3`). Text that a
 * spreadsheet would run as a formula (starting with =, +, -, @, a tab or a carriage return; OWASP,
 * "CSV Injection") is neutralised by a leading apostrophe and quoted; other text is quoted per RFC 4180
 * when it holds a comma, quote or line break.
 */
export function csvField(value: PlanValue | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = String(value);
  if (/^[=+\-@\t\r]/.test(text) && !NUMBER_TEXT.test(text)) return `"'${text.replace(/"/g, '""')}"`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvLine(fields: readonly (PlanValue | undefined)[]): string {
  return `${fields.map(csvField).join(',')}\n`;
}

export function csvHeader(variedKeys: readonly string[]): string {
  return csvLine(tableColumns(variedKeys));
}

/** The one CSV line of a case that failed: its varied parameters, empty results, and the message. */
export function errorCsvLine(
  variedKeys: readonly string[],
  varied: Readonly<Record<string, PlanValue>>,
  message: string,
): string {
  const empty = resultColumnNames()
    .slice(0, -1)
    .map(() => null);
  return csvLine([...variedKeys.map((k) => varied[k] ?? null), ...empty, message]);
}

/** The CSV lines (no header) of one case's document: one per operating point. The same fields as
 * csvLine of the varied values, the row's scalars in RESULT_SCALAR_KEYS order, each component's
 * COMPONENT_KEYS, the uncertainty, the flags joined with ';' and an empty error, appended field by
 * field (no arrays per row: a sweep writes tens of thousands of rows). */
export function documentCsvLines(
  document: ResultDocument,
  variedKeys: readonly string[],
  varied: Readonly<Record<string, PlanValue>>,
): string {
  let prefix = '';
  for (const k of variedKeys) prefix += `${csvField(varied[k] ?? null)},`;
  let out = '';
  for (const row of document.results) {
    let line = prefix;
    for (const k of RESULT_SCALAR_KEYS) line += `${csvField(row[k])},`;
    for (const c of COMPONENT_NAMES) {
      const loads = row.components[c];
      for (const k of COMPONENT_KEYS) line += `${csvField(loads[k])},`;
    }
    const { axial_N, side_N } = row.uncertainty;
    out += `${line}${csvField(axial_N)},${csvField(side_N)},${csvField(row.flags.join(';'))},\n`;
  }
  return out;
}

/** A whole table in memory (for small sweeps and tests). */
export function resultsToCsv(
  runs: readonly { varied: Readonly<Record<string, PlanValue>>; document: ResultDocument }[],
  variedKeys: readonly string[],
): string {
  let out = csvHeader(variedKeys);
  for (const run of runs) out += documentCsvLines(run.document, variedKeys, run.varied);
  return out;
}

/** Split one CSV line written by csvLine back into fields (RFC 4180 quoting). For tests and tools. */
export function parseCsvLine(line: string): string[] {
  const fields: string[] = [];
  let i = 0;
  const text = line.endsWith('\n') ? line.slice(0, -1) : line;
  while (true) {
    if (text[i] === '"') {
      let value = '';
      i++;
      while (i < text.length) {
        if (text[i] === '"') {
          if (text[i + 1] === '"') {
            value += '"';
            i += 2;
          } else {
            i++;
            break;
          }
        } else {
          value += text[i];
          i++;
        }
      }
      fields.push(value);
    } else {
      const end = text.indexOf(',', i);
      fields.push(end < 0 ? text.slice(i) : text.slice(i, end));
      i = end < 0 ? text.length : end;
    }
    if (i >= text.length) break;
    i++; // the comma
    if (i === text.length) {
      fields.push('');
      break;
    }
  }
  return fields;
}
