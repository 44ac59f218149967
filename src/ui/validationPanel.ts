/**
 * The Help tab's validation table: the built-in reference set (src/compute/validation) computed by the
 * model as a task on the pool's task workers when Help is first opened (nothing runs at page load), with the same rows
 * and numbers as `coversweep validate`: case, source, strength of the reference, reference and band,
 * the model's value, pass or fail. The host's data-state says idle, computing, done or failed.
 */
import { formatNumber, withUnit } from '../compute/validation/bandText';
import type { ValidationReport, ValidationRow } from '../compute/validation/types';
import { el } from './dom';
import { pool } from './earlyPool';
import { tableExportButtons } from './export/tableExportButtons';

function referenceText(row: ValidationRow): string {
  const nominal = row.reference === null ? '' : `${formatNumber(row.reference)}; `;
  return withUnit(`${nominal}band ${row.band_text}`, row.unit);
}

function modelText(row: ValidationRow): string {
  if (row.model === null) return `not computed: ${row.error ?? 'no value'}`;
  return `${withUnit(formatNumber(row.model, 6), row.unit)}${row.note ? ` (${row.note})` : ''}`;
}

function tableRow(row: ValidationRow): HTMLTableRowElement {
  return el('tr', { attrs: { 'data-id': row.id, 'data-pass': String(row.pass) } }, [
    el('th', { attrs: { scope: 'row' } }, [
      el('strong', { text: row.quantity }),
      el('div', { className: 'small', text: row.description }),
      el('div', { className: 'small muted', text: `${row.group} · ${row.id}` }),
    ]),
    el('td', { text: row.source }),
    el('td', { text: row.strength }),
    el('td', { text: referenceText(row) }),
    el('td', { text: modelText(row) }),
    row.pass
      ? el('td', { className: 'pass', text: 'pass' })
      : row.known_disagreement !== null
        ? el('td', { className: 'fail' }, [
            el('span', { text: 'FAIL (known)' }),
            el('div', { className: 'small', text: row.known_disagreement }),
          ])
        : el('td', { className: 'fail', text: 'FAIL' }),
  ]);
}

/** The report as an export: one row per reference case, numbers at full precision. */
function reportData(report: ValidationReport) {
  return {
    headers: [
      'Id',
      'Group',
      'Quantity',
      'Unit',
      'Case',
      'Source',
      'Strength',
      'Reference',
      'Band',
      'Model',
      'Result',
      'Known disagreement',
    ],
    rows: report.rows.map((r) => [
      r.id,
      r.group,
      r.quantity,
      r.unit,
      r.description,
      r.source,
      r.strength,
      r.reference,
      r.band_text,
      r.model,
      r.pass ? 'pass' : r.model === null ? `not computed: ${r.error ?? 'no value'}` : 'FAIL',
      r.known_disagreement,
    ]),
  };
}

function reportTable(report: ValidationReport): HTMLElement {
  const head = ['Case', 'Source', 'Strength', 'Reference and band', 'Model', 'Result'];
  const exportHead = el('div', { className: 'table-head' });
  exportHead.append(
    ...tableExportButtons({
      title: () => 'The model against its built-in reference cases (coversweep validate)',
      suffix: 'validation',
      data: () => reportData(report),
    }),
  );
  const scroll = el('div', { className: 'table-scroll validation-scroll' }, [
    el('table', { className: 'data-table validation-table', attrs: { id: 'validation-table' } }, [
      el('caption', {
        text: `${report.passed} of ${report.rows.length} reference cases pass; ${report.failed} fail (${report.known} of them known, documented disagreements)`,
      }),
      el('thead', {}, [
        el(
          'tr',
          {},
          head.map((h) => el('th', { attrs: { scope: 'col' }, text: h })),
        ),
      ]),
      el('tbody', {}, report.rows.map(tableRow)),
    ]),
  ]);
  return el('div', { className: 'table-block', attrs: { id: 'validation-table-block' } }, [
    exportHead,
    scroll,
  ]);
}

/** Compute the reference set as a task on the pool and show it in `host` (once; later calls do nothing). */
export class ValidationPanel {
  private started = false;
  /** The computed report, shared with the printable report (src/ui/report). */
  private computed: Promise<ValidationReport> | null = null;

  constructor(private readonly host: HTMLElement) {
    host.dataset.state = 'idle';
  }

  /** The report (computing it, and filling Help's table, if it has not been). */
  report(): Promise<ValidationReport> {
    this.shown();
    return this.computed!;
  }

  shown(): void {
    if (this.started) return;
    this.started = true;
    this.host.dataset.state = 'computing';
    this.host.replaceChildren(el('p', { className: 'small', text: 'Computing the reference cases…' }));
    this.computed = pool.runTask({ kind: 'validate' }).then((outcome) => {
      if (outcome.status === 'done') {
        this.host.replaceChildren(reportTable(outcome.value));
        this.host.dataset.state = 'done';
        return outcome.value;
      }
      const why = outcome.status === 'failed' ? outcome.error : outcome.status;
      this.host.replaceChildren(
        el('p', { className: 'field-error', text: `The reference cases could not be computed: ${why}` }),
      );
      this.host.dataset.state = 'failed';
      this.started = false;
      throw new Error(why);
    });
    this.computed.catch(() => {});
  }
}
