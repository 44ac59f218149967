// Which imported data points the yaw plots draw: the rule "matches" of src/ui/views/dataOverlay (same
// wheel and steering key for key, airspeed and density within 1 %, yaw inside the plotted range),
// checked point by point on invented columns, with the note counting what was left out.
import { describe, expect, it } from 'vitest';
import { type CaseFile, validateCase } from '../../../src/compute/caseFile';
import type { ConvertedColumns } from '../../../src/compute/engine/dataTaskTypes';
import { dataOverlay, mergedYaws } from '../../../src/ui/views/dataOverlay';

function design(rimDepthM: number, model: Record<string, unknown> = {}): CaseFile {
  const r = validateCase({
    wheel: { rim_depth_m: rimDepthM },
    conditions: { airspeed_mps: [10], yaw_deg: [0, 5, 10], air_density_kgpm3: 1.2 },
    model,
  });
  if (!r.ok) throw new Error(r.errors.join('; '));
  return r.value;
}

function columns(rows: Array<[yaw: number, speed: number, rho: number, axial: number]>): ConvertedColumns {
  const f = (k: number) => Float64Array.from(rows.map((r) => r[k]!));
  return {
    count: rows.length,
    line: Float64Array.from(rows.map((_, i) => i + 4)),
    yaw_deg: f(0),
    airspeed_mps: f(1),
    air_density_kgpm3: f(2),
    values: { axial_N: f(3) },
  };
}

const rows: Array<[number, number, number, number]> = [
  [0, 10, 1.2, 0.5],
  [2.5, 10.05, 1.2, 0.48], // 0.5 % fast: drawn
  [5, 10.3, 1.2, 0.44], // 3 % fast: another airspeed
  [10, 10, 1.25, 0.3], // 4 % denser: another air
  [-5, 10, 1.2, 0.44], // outside 0..10 deg
];

describe('imported data on the yaw plots', () => {
  it('draws the points at the plots’ conditions and counts the rest', () => {
    const c = design(0.05);
    const o = dataOverlay(
      { caseFile: c, converted: columns(rows), label: 'run.csv' },
      c,
      10,
      1.2,
      [0, 5, 10],
    );
    expect(o?.points.map((p) => [p.yawDeg, p.values.axial_N])).toEqual([
      [0, 0.5],
      [2.5, 0.48],
    ]);
    expect(o?.note).toBe(
      'Your data (run.csv): 2 of 5 points drawn as markers; not drawn: 2 at another airspeed or air density (drawn: within 1 % of the plots’ 10.00 m/s and 1.200 kg/m³); 1 outside the plotted yaw range 0–10°.',
    );
    expect(mergedYaws([0, 5, 10], o)).toEqual([0, 2.5, 5, 10]);
  });

  it('still matches with other model options (a calibrated model), not with another wheel', () => {
    const compared = design(0.05);
    const calibrated = design(0.05, { porosity_scale: 1.7 });
    const src = { caseFile: compared, converted: columns(rows), label: 'run.csv' };
    expect(dataOverlay(src, calibrated, 10, 1.2, [0, 5, 10])?.points).toHaveLength(2);
    const other = dataOverlay(src, design(0.08), 10, 1.2, [0, 5, 10]);
    expect(other?.points).toEqual([]);
    expect(other?.note).toBe(
      'Your data (run.csv) is not drawn: it was compared with another wheel (that wheel: rim 50 mm). It is drawn on the yaw plots when the wheel and steering match the current design key for key.',
    );
  });
});
