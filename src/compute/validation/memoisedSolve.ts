import { solveCase, validateCase } from '../caseFile';
import type { SolveRaw } from './types';

/**
 * A solve function for reference cases: a plain case object (case-file keys) through validateCase and
 * solveCase, the path `coversweep solve` takes; a case that breaks the file rules throws with every
 * message. Each distinct case is solved once per function.
 */
export function memoisedSolve(): SolveRaw {
  const cache = new Map<string, ReturnType<SolveRaw>>();
  return (raw) => {
    const key = JSON.stringify(raw);
    let document = cache.get(key);
    if (!document) {
      const parsed = validateCase(raw);
      if (!parsed.ok) throw new Error(`invalid reference case: ${parsed.errors.join('; ')}`);
      document = solveCase(parsed.value);
      cache.set(key, document);
    }
    return document;
  };
}
