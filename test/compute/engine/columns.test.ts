import { describe, expect, it } from 'vitest';
import {
  COMPONENT_NAMES,
  caseToModelInput,
  RESULT_SCALAR_KEYS,
  type ResultDocument,
  solveCase,
  validateCase,
} from '../../../src/compute/caseFile';
import { COLUMN_NAMES, columnIndex, RESULT_COLUMNS } from '../../../src/compute/engine/columns';
import { packPoints } from '../../../src/compute/engine/packPoints';
import { resultColumnNames } from '../../../src/compute/resultTable';
import { solveWheel } from '../../../src/model/wheel/solveWheel';

// The one column table (consistency with the result document and the CSV; no source needed).
describe('the column table', () => {
  it('has one column per scalar, the flag bits and seven per component, in COMPONENT_NAMES order', () => {
    expect(COLUMN_NAMES.length).toBe(19 + 1 + 7 * COMPONENT_NAMES.length);
    expect(new Set(COLUMN_NAMES).size).toBe(COLUMN_NAMES.length);
    COMPONENT_NAMES.forEach((c, k) => {
      expect(columnIndex(`${c}.fxN`), c).toBe(20 + 7 * k);
    });
  });
  it('names for each column with a document name the same number the result document and the CSV print', () => {
    const r = validateCase({
      wheel: { cover: { fraction: 0.5 } },
      conditions: { airspeed_mps: [10, 14], yaw_deg: [0, 12] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: true },
    });
    if (!r.ok) throw new Error(r.errors.join('; '));
    const doc: ResultDocument = solveCase(r.value);
    const packed = packPoints(solveWheel(caseToModelInput(r.value)).points);
    const csv = resultColumnNames();
    const withDocument = RESULT_COLUMNS.filter((c) => c.document !== undefined);
    expect(withDocument.length).toBeGreaterThan(15);
    doc.results.forEach((row, i) => {
      for (const c of withDocument) {
        const name = c.document!;
        expect(csv, name).toContain(name);
        const printed =
          name === 'gci_axial_N'
            ? row.uncertainty.axial_N
            : name === 'gci_side_N'
              ? row.uncertainty.side_N
              : (row as unknown as Record<string, number | null>)[name];
        expect(RESULT_SCALAR_KEYS.includes(name as never) || name.startsWith('gci_'), name).toBe(true);
        const value = packed[i * COLUMN_NAMES.length + columnIndex(c.name)]!;
        // Bit for bit where the document prints a finite number; null where the model's number is not.
        expect(printed, `point ${i} ${c.name} -> ${name}`).toBe(Number.isFinite(value) ? value : null);
      }
    });
  });
});
