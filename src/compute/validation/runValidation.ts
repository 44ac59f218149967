import { evaluateCase } from './evaluateCase';
import { memoisedSolve } from './memoisedSolve';
import { REFERENCE_CASES } from './referenceCases';
import type { ReferenceCase, ValidationReport } from './types';

/** Run reference cases (default: the whole built-in set) and report each row, passed and failed counts. */
export function runValidation(cases: readonly ReferenceCase[] = REFERENCE_CASES): ValidationReport {
  const solve = memoisedSolve();
  const rows = cases.map((c) => evaluateCase(c, solve));
  const passed = rows.filter((r) => r.pass).length;
  const known = rows.filter((r) => !r.pass && r.known_disagreement !== null).length;
  const failed = rows.length - passed;
  return {
    format: 'coversweep-validation',
    version: 1,
    rows,
    passed,
    failed,
    known,
    unexpected: failed - known,
  };
}
