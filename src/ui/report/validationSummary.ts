/**
 * The validation status in a few lines: how many of the built-in reference cases (the Help table,
 * `coversweep validate`) pass, and each failing row with its reference band, the model's value and, for
 * a known disagreement, its documented reason (its first sentence when long: the report is one page). The counts are recounted from the rows so the summary
 * cannot disagree with the table it summarises.
 */
import type { ValidationReport } from '../../compute/validation/types';

export interface ValidationSummary {
  passed: number;
  total: number;
  /** "29 of 30 reference cases pass; 1 fails (1 known, documented disagreement)". */
  headline: string;
  /** One line per failing row. */
  failures: string[];
}

/** A documented reason cut to its first sentence (at most `max` characters, at a word), marked when cut. */
export function abridged(text: string, max = 480): string {
  const end = text.indexOf('. ');
  let cut = end >= 0 && end < max ? text.slice(0, end + 1) : text;
  if (cut.length > max) cut = `${cut.slice(0, cut.lastIndexOf(' ', max)).replace(/[,;:]$/, '')} …`;
  return cut === text ? text : `${cut} (abridged; in full in the Help table)`;
}

function significant(x: number): string {
  return String(Number(x.toPrecision(4)));
}

export function validationSummary(report: ValidationReport): ValidationSummary {
  const total = report.rows.length;
  if (total === 0) throw new RangeError('validationSummary: the report has no rows');
  const failing = report.rows.filter((r) => !r.pass);
  const passed = total - failing.length;
  const known = failing.filter((r) => r.known_disagreement !== null).length;
  const unexpected = failing.length - known;
  const parts = [`${passed} of ${total} reference cases pass`];
  if (failing.length > 0) {
    parts.push(
      `${failing.length} fail${failing.length === 1 ? 's' : ''} (${known} known, documented disagreement${known === 1 ? '' : 's'}${unexpected > 0 ? `; ${unexpected} unexplained` : ''})`,
    );
  }
  const failures = failing.map((r) => {
    const model =
      r.model === null ? `not computed (${r.error ?? 'no value'})` : `${significant(r.model)} ${r.unit}`;
    const why =
      r.known_disagreement === null
        ? 'UNEXPLAINED failure'
        : `known disagreement: ${abridged(r.known_disagreement)}`;
    return `${r.id} — ${r.quantity}: reference band ${r.band_text} ${r.unit}, model ${model}; ${why}`;
  });
  return { passed, total, headline: parts.join('; '), failures };
}
