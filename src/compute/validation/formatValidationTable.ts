import { formatNumber, withUnit } from './bandText';
import type { ValidationReport, ValidationRow } from './types';

function modelText(row: ValidationRow): string {
  if (row.model === null) return `error: ${row.error ?? 'no value'}`;
  return `${withUnit(formatNumber(row.model, 8), row.unit)}${row.note ? ` (${row.note})` : ''}`;
}

/**
 * The reference set as a readable text report: one block per case (case, source, strength, reference and
 * band, model value, PASS or FAIL), grouped, with a summary line.
 */
export function formatValidationTable(report: ValidationReport): string {
  const lines: string[] = [];
  let group = '';
  for (const row of report.rows) {
    if (row.group !== group) {
      group = row.group;
      lines.push('', `== ${group} ==`);
    }
    const reference = row.reference === null ? '' : `${formatNumber(row.reference)}, `;
    const known = !row.pass && row.known_disagreement !== null;
    lines.push(
      `${row.pass ? 'PASS' : known ? 'FAIL (known disagreement)' : 'FAIL'}  ${row.id}: ${row.quantity}`,
      `      case:      ${row.description}`,
      `      source:    ${row.source}`,
      `      strength:  ${row.strength}`,
      `      reference: ${withUnit(`${reference}band ${row.band_text}`, row.unit)}`,
      `      model:     ${modelText(row)}`,
    );
    if (known) lines.push(`      known:     ${row.known_disagreement}`);
  }
  lines.push(
    '',
    `${report.passed} passed, ${report.failed} failed (${report.known} of them known disagreements) of ${report.rows.length} reference cases`,
    '',
  );
  return lines.join('\n');
}
