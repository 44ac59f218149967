import { describe, expect, it } from 'vitest';
import { evaluateCase } from '../../../src/compute/validation/evaluateCase';
import { memoisedSolve } from '../../../src/compute/validation/memoisedSolve';
import { REFERENCE_CASES } from '../../../src/compute/validation/referenceCases';

// The built-in reference set of `coversweep validate`: each row holds the model against a published value,
// an exact solution or a stated practice, with its band (sources in src/compute/validation). Every row must
// pass; a failing row prints the case, the model's value and the band.
const solve = memoisedSolve();

describe('the reference set (coversweep validate)', () => {
  it('has unique ids and a source, strength, unit and band on every row', () => {
    const ids = new Set(REFERENCE_CASES.map((c) => c.id));
    expect(ids.size, 'duplicate ids').toBe(REFERENCE_CASES.length);
    for (const c of REFERENCE_CASES) {
      expect(c.source.length, `${c.id}: source`).toBeGreaterThan(10);
      expect(c.description.length, `${c.id}: description`).toBeGreaterThan(10);
      expect(c.unit.length, `${c.id}: unit`).toBeGreaterThan(0);
      expect(c.band.low !== null || c.band.high !== null, `${c.id}: band`).toBe(true);
    }
  });

  for (const c of REFERENCE_CASES) {
    it(`${c.group}: ${c.id}`, () => {
      const row = evaluateCase(c, solve);
      const message = [
        `${c.id}: ${c.quantity}`,
        `case: ${c.description}`,
        `got: ${row.model ?? row.error}${row.note ? ` (${row.note})` : ''}`,
        `expected: ${c.reference === null ? '' : `${c.reference}, `}band ${row.band_text} ${c.unit}`,
        `source: ${c.source} [${c.strength}]`,
      ].join('\n  ');
      expect(row.error, message).toBeNull();
      if (c.knownDisagreement) {
        // A documented known disagreement must still fail: when a model change fixes it, this test says so
        // and the mark comes off.
        expect(row.pass, `${message}\n  known disagreement no longer fails: remove the mark`).toBe(false);
      } else {
        expect(row.pass, message).toBe(true);
      }
    });
  }
});
