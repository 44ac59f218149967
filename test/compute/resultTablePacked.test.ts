import { describe, expect, it } from 'vitest';
import { caseToModelInput, solutionToDocument, validateCase } from '../../src/compute/caseFile';
import { COLUMN_COUNT, columnIndex } from '../../src/compute/engine/columns';
import { FLAG_CODES, packPoints, unpackPoints } from '../../src/compute/engine/packPoints';
import type { PlanValue } from '../../src/compute/planFile';
import { documentCsvLines } from '../../src/compute/resultTable';
import { packedCsvBytes, packedCsvLines } from '../../src/compute/resultTablePacked';
import { solveWheel } from '../../src/model/wheel';

// The invariant held here: the packed path writes exactly the text of the document path it replaces in
// the command line's sweep (documentCsvLines of solutionToDocument of the unpacked points).

function documentPath(
  packed: Float64Array,
  pointCount: number,
  caseFile: Parameters<typeof solutionToDocument>[0],
  surface: Parameters<typeof solutionToDocument>[1]['surface'],
  keys: string[],
  varied: Record<string, PlanValue>,
): string {
  const points = unpackPoints(packed, pointCount);
  return documentCsvLines(solutionToDocument(caseFile, { surface, points }), keys, varied);
}

function solved(raw: unknown) {
  const c = validateCase(raw);
  if (!c.ok) throw new Error(c.errors.join('\n'));
  const solution = solveWheel(caseToModelInput(c.value));
  return { caseFile: c.value, surface: solution.surface, packed: packPoints(solution.points) };
}

describe('packedCsvLines: the CSV lines of a case straight from its packed rows', () => {
  it('writes the same text as the document path for solved cases (with and without the GCI)', () => {
    const cases = [
      {
        wheel: { spokes: { section: 'bladed' }, cover: { fraction: 0.4, placement: 'rim', sides: 2 } },
        conditions: { airspeed_mps: [8, 13.41], yaw_deg: [0, 7.5, 15, 20] },
        model: { lattice_span: 8, lattice_chord: 6, grid_convergence: true },
      },
      {
        conditions: { airspeed_mps: 12, yaw_deg: [0, 10], reference_speed_kmh: 40 },
        model: { lattice_span: 8, lattice_chord: 6, grid_convergence: false },
      },
    ];
    const keys = ['note', 'wheel.cover.fraction', 'missing'];
    const varied = { note: '=a, "b"', 'wheel.cover.fraction': 0.25 };
    for (const raw of cases) {
      const { caseFile, surface, packed } = solved(raw);
      const n = packed.length / COLUMN_COUNT;
      const got = packedCsvLines(packed, n, caseFile, keys, varied);
      const expected = documentPath(packed, n, caseFile, surface, keys, varied);
      expect(got, `case ${JSON.stringify(raw)}`).toBe(expected);
      expect(got.split('\n')).toHaveLength(n + 1);
    }
  });

  it('writes the same text for non-finite values, negative zero, every flag and off-grid yaw angles', () => {
    const { caseFile, surface, packed } = solved({
      conditions: { airspeed_mps: [10], yaw_deg: [0, 5, 10] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: false },
    });
    const specials = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, 5e-324, 1e21];
    const edited = Float64Array.from(packed);
    // Row 0: special values in every column but the flags; row 1: every flag; row 2: a yaw off the grid.
    for (let j = 0; j < COLUMN_COUNT; j++) edited[j] = specials[j % specials.length]!;
    edited[columnIndex('flagBits')] = 0;
    edited[COLUMN_COUNT + columnIndex('flagBits')] = 2 ** FLAG_CODES.length - 1;
    edited[2 * COLUMN_COUNT + columnIndex('yawRad')] = 0.123;
    const got = packedCsvLines(edited, 3, caseFile, ['k'], { k: 1 });
    expect(got).toBe(documentPath(edited, 3, caseFile, surface, ['k'], { k: 1 }));
    // Two points of a three-point grid: yaw from the model's angle, as the document does.
    const two = edited.subarray(COLUMN_COUNT);
    expect(packedCsvLines(two, 2, caseFile, [], {})).toBe(documentPath(two, 2, caseFile, surface, [], {}));
  });

  it('writes the same text as bytes, and for a case larger than every one before (its buffer grows)', () => {
    const { caseFile, surface, packed } = solved({
      conditions: { airspeed_mps: [10], yaw_deg: [0, 5, 10] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: false },
    });
    const rows = 1000;
    const big = new Float64Array(rows * COLUMN_COUNT);
    for (let r = 0; r < rows; r++)
      big.set(packed.subarray((r % 3) * COLUMN_COUNT, ((r % 3) + 1) * COLUMN_COUNT), r * COLUMN_COUNT);
    const expected = documentPath(big, rows, caseFile, surface, ['k'], { k: 'é' });
    expect(new TextDecoder().decode(packedCsvBytes(big, rows, caseFile, ['k'], { k: 'é' }))).toBe(expected);
    const larger = Float64Array.from({ length: 2 * big.length }, (_, j) => big[j % big.length]!);
    expect(packedCsvLines(larger, 2 * rows, caseFile, ['k'], { k: 'é' })).toBe(expected + expected);
  });

  it('refuses packed data that is not whole rows', () => {
    const { caseFile, packed } = solved({
      conditions: { airspeed_mps: [10], yaw_deg: [0] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: false },
    });
    expect(() => packedCsvLines(packed, 2, caseFile, [], {})).toThrow(/not 2 packed rows/);
  });
});
