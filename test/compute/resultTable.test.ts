import { describe, expect, it } from 'vitest';
import { type ResultDocument, solveCase, validateCase } from '../../src/compute/caseFile';
import {
  csvField,
  parseCsvLine,
  resultColumnNames,
  resultsToCsv,
  tableColumns,
} from '../../src/compute/resultTable';

describe('result table columns (the documented order)', () => {
  it('varied keys first, then results, components, uncertainty, flags and error', () => {
    const cols = tableColumns(['wheel.cover.fraction', 'wheel.rim_depth_m']);
    expect(cols.slice(0, 6)).toEqual([
      'wheel.cover.fraction',
      'wheel.rim_depth_m',
      'yaw_deg',
      'airspeed_mps',
      'ground_speed_mps',
      'air_density_kgpm3',
    ]);
    const r = resultColumnNames();
    expect(r.slice(0, 20)).toEqual([
      'yaw_deg',
      'airspeed_mps',
      'ground_speed_mps',
      'air_density_kgpm3',
      'axial_N',
      'side_N',
      'vertical_N',
      'wind_drag_N',
      'wind_lift_N',
      'cp_x_m',
      'cp_z_m',
      'yaw_moment_Nm',
      'roll_moment_Nm',
      'steering_moment_Nm',
      'axle_torque_Nm',
      'power_W',
      'cda_axial_m2',
      'cda_axial_cm2',
      'axial_gf_ref',
      'axial_gf_30mph',
    ]);
    expect(r.slice(20, 24)).toEqual([
      'surface_axial_N',
      'surface_side_N',
      'surface_vertical_N',
      'surface_axle_torque_Nm',
    ]);
    expect(r.slice(-8)).toEqual([
      'hub_axial_N',
      'hub_side_N',
      'hub_vertical_N',
      'hub_axle_torque_Nm',
      'gci_axial_N',
      'gci_side_N',
      'flags',
      'error',
    ]);
    expect(r).toHaveLength(20 + 6 * 4 + 4);
  });
});

describe('CSV fields (RFC 4180 quoting, shortest round-trip numbers)', () => {
  it('prints numbers so they read back exactly, null and non-finite as empty', () => {
    for (const x of [0.1, 1 / 3, -2.5e-17, 123456789.123, 5e-324]) {
      expect(Number(csvField(x)), `x=${x}`).toBe(x);
    }
    expect(csvField(null)).toBe('');
    expect(csvField(Number.NaN)).toBe('');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField(true)).toBe('true');
    expect(parseCsvLine('1,"a,b","say ""hi""",,x\n')).toEqual(['1', 'a,b', 'say "hi"', '', 'x']);
  });

  it('one row per case and yaw point, values equal to the document', () => {
    const c = validateCase({
      wheel: { spokes: { section: 'bladed' } },
      conditions: { airspeed_mps: 12, yaw_deg: [0, 10] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: false },
    });
    if (!c.ok) throw new Error(c.errors.join('\n'));
    const doc: ResultDocument = solveCase(c.value);
    const csv = resultsToCsv(
      [{ varied: { 'wheel.spokes.section': 'bladed' }, document: doc }],
      ['wheel.spokes.section'],
    );
    const lines = csv.trimEnd().split('\n');
    expect(lines).toHaveLength(3);
    const header = parseCsvLine(lines[0]!);
    const row = parseCsvLine(lines[2]!);
    expect(row[0]).toBe('bladed');
    const r = doc.results[1]!;
    expect(Number(row[header.indexOf('axial_N')])).toBe(r.axial_N);
    expect(Number(row[header.indexOf('spokes_axle_torque_Nm')])).toBe(r.components.spokes.axle_torque_Nm);
    expect(row[header.indexOf('cp_x_m')]).toBe(String(r.cp_x_m));
    expect(parseCsvLine(lines[1]!)[header.indexOf('cp_x_m')]).toBe('');
    expect(row[header.indexOf('flags')]).toBe(r.flags.join(';'));
  });

  it("every field of every row reads back as the document's value, in the column order", () => {
    const c = validateCase({
      conditions: { airspeed_mps: [8, 12], yaw_deg: [0, 7.5, 15] },
      model: { lattice_span: 8, lattice_chord: 6, grid_convergence: true },
    });
    if (!c.ok) throw new Error(c.errors.join('\n'));
    const doc: ResultDocument = solveCase(c.value);
    const keys = ['note', 'wheel.cover.fraction'];
    const varied = { note: '=a, "b"', 'wheel.cover.fraction': 0.25 };
    const lines = resultsToCsv([{ varied, document: doc }], keys)
      .trimEnd()
      .split('\n');
    const header = parseCsvLine(lines[0]!);
    expect(lines).toHaveLength(1 + doc.results.length);
    doc.results.forEach((r, i) => {
      const fields = parseCsvLine(`${lines[i + 1]!}\n`);
      expect(fields, `row ${i}: ${lines[i + 1]}`).toHaveLength(header.length);
      const expected: string[] = ['\'=a, "b"', '0.25'];
      for (const name of resultColumnNames()) {
        const component = Object.keys(r.components).find((c) => name.startsWith(`${c}_`)) as
          | keyof typeof r.components
          | undefined;
        const scalars = r as unknown as Record<string, number | null>;
        const value =
          name === 'gci_axial_N'
            ? r.uncertainty.axial_N
            : name === 'gci_side_N'
              ? r.uncertainty.side_N
              : name === 'flags'
                ? r.flags.join(';')
                : name === 'error'
                  ? ''
                  : name in scalars
                    ? scalars[name]!
                    : r.components[component!][name.slice(component!.length + 1) as 'axial_N'];
        expected.push(value === null ? '' : String(value));
      }
      expect(fields, `row ${i}`).toEqual(expected);
    });
  });
});
