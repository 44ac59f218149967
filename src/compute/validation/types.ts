/**
 * The built-in reference set of `coversweep validate` (and the page's Help): each case holds one model
 * value against a reference value and band from outside the model (a paper, a handbook, an exact
 * solution, trade practice), says how strong that reference is, and computes the model's value through
 * the public solve path (case file -> validateCase -> solveCase, as `coversweep solve` does) or, for a
 * model part, through the model function itself.
 */

import type { ResultDocument } from '../caseFile';

/** How strong a reference is, strongest first. */
export type ReferenceStrength =
  | 'theory (exact)'
  | 'measured'
  | 'measured (trend)'
  | 'CFD'
  | 'handbook data'
  | 'standard table'
  | 'hand calculation'
  | 'numerical (refinement study)'
  | 'trade practice, from memory'
  | 'physical reasoning';

/** The interval a model value must lie in. A null end is unbounded; an open end excludes its value. */
export interface ReferenceBand {
  low: number | null;
  high: number | null;
  lowOpen?: boolean;
  highOpen?: boolean;
}

/** What a case's computation returns: the model's value, and optionally a short note on how it arose. */
export interface ModelValue {
  value: number;
  note?: string;
}

/** Solve a case file given as a plain object (the case-file keys; defaults filled) and return its result
 * document. Runs memoise it, so cases sharing a wheel solve it once. */
export type SolveRaw = (raw: unknown) => ResultDocument;

export type ReferenceGroup = 'wheel' | 'side force' | 'model part';

export interface ReferenceCase {
  /** Stable identifier (kebab-case). */
  id: string;
  group: ReferenceGroup;
  /** What is compared, with its unit. */
  quantity: string;
  /** The case in plain words: the wheel, speed, yaw, air, ground, lattice. */
  description: string;
  /** Full citation(s), with "from memory" where that is the truth. */
  source: string;
  strength: ReferenceStrength;
  /** The nominal reference value (null when the reference is only a bound). */
  reference: number | null;
  band: ReferenceBand;
  unit: string;
  /** A disagreement with the reference that is understood and documented but not yet fixed: why the model
   * misses and what would close it. Such a row still prints FAIL; it does not make `validate` exit 1, and
   * the tests check that it still fails (so a fix is noticed and the mark removed). */
  knownDisagreement?: string;
  compute: (solve: SolveRaw) => ModelValue;
}

/** One evaluated case: the case without its computation, plus the result; plain data (crosses a worker
 * boundary, prints as JSON). */
export interface ValidationRow extends Omit<ReferenceCase, 'compute'> {
  /** The band in words, e.g. "130 .. 250". */
  band_text: string;
  /** The model's value (null when it could not be computed: see error). */
  model: number | null;
  note: string | null;
  pass: boolean;
  error: string | null;
  /** The documented reason of a known disagreement (see ReferenceCase), or null. */
  known_disagreement: string | null;
}

export interface ValidationReport {
  format: 'coversweep-validation';
  version: 1;
  rows: ValidationRow[];
  passed: number;
  /** Every failing row, known disagreements included. */
  failed: number;
  /** Failing rows with a documented known disagreement. */
  known: number;
  /** Failing rows without one: these make `validate` exit 1. */
  unexpected: number;
}
