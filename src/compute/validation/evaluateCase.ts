import { bandText } from './bandText';
import { inBand } from './inBand';
import type { ReferenceCase, SolveRaw, ValidationRow } from './types';

/** Evaluate one reference case: the model's value, the band check; an exception becomes a failed row
 * with its message (never thrown). */
export function evaluateCase(c: ReferenceCase, solve: SolveRaw): ValidationRow {
  const { compute, knownDisagreement, ...described } = c;
  const row: ValidationRow = {
    ...described,
    known_disagreement: knownDisagreement ?? null,
    band: { ...c.band },
    band_text: bandText(c.band),
    model: null,
    note: null,
    pass: false,
    error: null,
  };
  try {
    const { value, note } = compute(solve);
    row.model = Number.isFinite(value) ? value : null;
    row.note = note ?? null;
    row.pass = Number.isFinite(value) && inBand(value, c.band);
    if (!Number.isFinite(value)) row.error = `the model gave ${value}`;
  } catch (error) {
    row.error = error instanceof Error ? error.message : String(error);
  }
  return row;
}
