import { describe, expect, it } from 'vitest';
import { convertTable, type MapFile, parseCsvText } from '../../../src/compute/compare/index';

const map: MapFile = {
  format: 'coversweep-map',
  version: 1,
  columns: {
    'Yaw [deg]': { quantity: 'yaw_deg', unit: 'deg' },
    'Speed [km/h]': { quantity: 'speed', unit: 'kmh' },
    'Drag [g]': { quantity: 'axial_force', unit: 'gf' },
    'CdA [cm2]': { quantity: 'drag_area_wind', unit: 'cm2' },
    'Side [lbf]': { quantity: 'side_force', unit: 'lbf' },
  },
  side_force_sign: -1,
  air_density_kgpm3: 1.2,
};

function table(text: string) {
  const t = parseCsvText(text);
  if (!t.ok) throw new Error(t.errors.join());
  return t.value;
}

describe('convertTable', () => {
  it("converts every unit to SI and the tool's axes (definitions; relative 4 epsilon)", () => {
    const t = table('Yaw [deg],Speed [km/h],Drag [g],CdA [cm2],Side [lbf]\n10,36,100,200,1\n');
    const r = convertTable(t, map, 1.225);
    if (!r.ok) throw new Error(r.errors.join());
    const p = r.value.points[0]!;
    const q = 0.5 * 1.2 * 10 * 10;
    const checks: [string, number, number][] = [
      ['yaw', p.yawRad, (10 * Math.PI) / 180],
      ['speed', p.airspeedMps, 10],
      ['axial (100 gf)', p.values.axial_N!, 0.980665],
      ['wind drag (200 cm2 x q)', p.values.wind_drag_N!, 0.02 * q],
      ['side (1 lbf, sign -1)', p.values.side_N!, -4.4482216152605],
    ];
    for (const [name, got, exp] of checks) {
      const tol = 4 * Number.EPSILON * Math.abs(exp);
      expect(Math.abs(got - exp), `${name}: got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
    expect(p.rhoKgPerM3).toBe(1.2);
    expect(r.value.outputs).toEqual(['axial_N', 'wind_drag_N', 'side_N']);
  });

  it('reports text in numeric columns and missing columns by line and header', () => {
    const bad = convertTable(
      table('Yaw [deg],Speed [km/h],Drag [g],CdA [cm2],Side [lbf]\n10,36,heavy,200,1\n,36,1,1,1\n'),
      map,
      1.2,
    );
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors[0]).toBe('line 2, column "Drag [g]": "heavy" is not a number (axial_force)');
      expect(bad.errors[1]).toMatch(/^line 3, column "Yaw \[deg\]": empty, but the yaw angle is required/);
    }
    const missing = convertTable(table('Yaw [deg],Speed [km/h]\n1,2\n'), map, 1.2);
    expect(missing.ok).toBe(false);
    if (!missing.ok)
      expect(missing.errors[0]).toMatch(/^map columns\.Drag \[g\]: no column "Drag \[g\]" in the data file/);
  });

  it('skips empty measured cells but keeps the row', () => {
    const r = convertTable(
      table('Yaw [deg],Speed [km/h],Drag [g],CdA [cm2],Side [lbf]\n0,36,100,,\n'),
      map,
      1.2,
    );
    if (!r.ok) throw new Error(r.errors.join());
    expect(Object.keys(r.value.points[0]!.values)).toEqual(['axial_N']);
  });
});
