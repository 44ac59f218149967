/**
 * The report's tables from the model's numbers: the headline figures (grams at the reference speed,
 * the rotational power, the yaw columns), the design's geometry in engineering units, and the ride
 * figures' differences.
 */
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../../src/compute/caseFile';
import type { RideDocument } from '../../../src/compute/ride/index';
import type { PointResult } from '../../../src/compute/study/modelResults';
import { geometryGroups } from '../../../src/ui/report/geometryGroups';
import { headlineTable } from '../../../src/ui/report/headlineTable';
import { rideTable } from '../../../src/ui/report/rideTable';

function point(yawDeg: number, over: Partial<PointResult> = {}): PointResult {
  return {
    yawRad: (yawDeg * Math.PI) / 180,
    airspeedMps: 10,
    groundSpeedMps: 10,
    rhoKgPerM3: 1.2,
    axialN: 1,
    sideN: yawDeg / 10,
    verticalN: 0,
    windDragN: 1,
    windLiftN: 0,
    cpXM: yawDeg === 0 ? Number.NaN : 0.05,
    cpZM: yawDeg === 0 ? Number.NaN : 0.1,
    yawMomentNm: 0,
    rollMomentNm: 0,
    steeringMomentNm: 0.0123,
    axleTorqueNm: 0.02,
    powerW: 12,
    cdaAxialM2: 1 / 60,
    components: {} as PointResult['components'],
    uncertaintyAxialN: Number.NaN,
    uncertaintySideN: Number.NaN,
    flags: [],
    ...over,
  };
}

const cell = (t: { rows: string[][] }, label: RegExp, col: number) =>
  t.rows.find((r) => label.test(r[0]!))?.[col];

/** A headline cell: the row of a yaw angle (its first cell), the column by its head. */
function at(t: { head: string[]; rows: string[][] }, yaw: string, head: RegExp): string | undefined {
  const c = t.head.findIndex((h) => head.test(h));
  return t.rows.find((r) => r[0] === yaw)?.[c];
}

describe('headlineTable', () => {
  const yaws = [0, 2.5, 5, 7.5, 9, 12, 19, 25];
  const pts = yaws.map((y) => point(y));

  it('takes the yaw angles nearest 0, 10 and 20 deg as its rows', () => {
    expect(headlineTable(pts, 10, 'kmh').rows.map((r) => r[0])).toEqual(['0.0°', '9.0°', '19.0°']);
    // A design with one yaw angle gives one row, not three copies.
    expect(headlineTable([point(10)], 10, 'kmh').rows.map((r) => r[0])).toEqual(['10.0°']);
  });

  it('gives grams-force at the reference speed: F (Vref/V)^2 / g0', () => {
    // 1 N at 10 m/s is (13.8889/10)^2 N = 1.92901 N at 50 km/h; / 9.80665 m/s^2 (CGPM 1901) = 196.70 gf.
    const t = headlineTable(pts, 50 / 3.6, 'kmh');
    expect(at(t, '0.0°', /^Axial drag\ng at 50\.0 km\/h$/)).toBe('197');
    // At the reference speed itself, 1 N is 1000 / 9.80665 = 101.97 gf.
    expect(at(headlineTable(pts, 10, 'kmh'), '0.0°', /\ng at/)).toBe('102');
  });

  it('reads the rotational power as P - F_x V_ground, which is T omega when P = F_x V + T V / R', () => {
    const R = 0.335;
    const p = point(0, {
      axialN: 1.5,
      axleTorqueNm: 0.04,
      groundSpeedMps: 12,
      powerW: 1.5 * 12 + (0.04 * 12) / R,
    });
    const t = headlineTable([p], 10, 'kmh');
    expect(at(t, '0.0°', /^Rotation\npower, W$/)).toBe(((0.04 * 12) / R).toFixed(2));
    expect(at(t, '0.0°', /^Aero\npower, W$/)).toBe((18 + (0.04 * 12) / R).toFixed(2));
  });

  it('gives drag area in cm² and m², centre of pressure in mm, n/a where undefined', () => {
    const t = headlineTable(pts, 10, 'kmh');
    expect(at(t, '0.0°', /^CdA\ncm²$/)).toBe('166.7');
    expect(at(t, '0.0°', /^CdA\nm²$/)).toBe('0.01667');
    expect(at(t, '0.0°', /^CP ahead\nmm$/)).toBe('n/a');
    expect(at(t, '9.0°', /^CP ahead\nmm$/)).toBe('50.0');
    expect(at(t, '9.0°', /^Steering\nmoment, N m$/)).toBe('0.0123');
    expect(at(t, '9.0°', /^± side\nN$/)).toBe('n/a');
    expect(
      at(headlineTable([point(10, { uncertaintySideN: 0.1214 })], 10, 'kmh'), '10.0°', /^± side\nN$/),
    ).toBe('0.121');
    expect(() => headlineTable([], 10, 'kmh')).toThrow(/points must not be empty/);
    expect(() => headlineTable(pts, 0, 'kmh')).toThrow(/referenceSpeedMps must be > 0/);
  });
});

describe('geometryGroups', () => {
  it('prints the case file in mm, degrees and the chosen speed unit', () => {
    const r = validateCase({
      name: 'g',
      wheel: { rim_depth_m: 0.08, cover: { fraction: 0.5, placement: 'rim', sides: 2 } },
      conditions: { airspeed_mps: [13.8889], yaw_deg: [0, 10, 20] },
    });
    if (!r.ok) throw new Error(r.errors.join('; '));
    const groups = geometryGroups(r.value, 1.2, 'kmh');
    const rows = new Map(groups.flatMap((g) => g.rows.map((x) => [x.label, x.value] as const)));
    expect(rows.get('Rim depth')).toBe('80.0 mm');
    expect(rows.get('Covered fraction')).toBe('0.500 (50.0 %)');
    expect(rows.get('Airspeed')).toBe('50.0 km/h (13.89 m/s)');
    expect(rows.get('Yaw')).toBe('0.0° to 20.0°, 3 angles');
    expect(
      geometryGroups(r.value, 1.2, 'mph')
        .flatMap((g) => g.rows)
        .find((x) => x.label === 'Airspeed')?.value,
    ).toBe('31.1 mph (13.89 m/s)');
    expect(() => geometryGroups(r.value, 0, 'kmh')).toThrow(/rhoKgPerM3 must be > 0/);
  });
});

describe('rideTable', () => {
  it('gives design, baseline and their difference with units, grams from the wind-averaged drag area', () => {
    const d = {
      air_density_kgpm3: 1.2,
      constant_speed_mps: 10,
      constant_power_W: 250,
      distance_m: 40000,
      power_W: { design: 250.04, baseline: 252.5 },
      time_s: { design: 3600, baseline: 3610.25 },
      wind_averaged_axial_N: { design: 1, baseline: 1.1 },
      // 0.01 m^2 at 50 km/h and 1.2 kg/m^3: 0.5 * 1.2 * 13.8889^2 * 0.01 / 9.80665 * 1000 = 118.0 gf.
      wind_averaged_cda_m2: { design: 0.01, baseline: 0.011 },
      wind_averaged_side_N: { design: 2, baseline: 1 },
      aero_share: { design: 0.8, baseline: 0.81 },
      lean_deg: { design: 1.5, baseline: 1 },
      gust_impulse_Ns: { design: 3, baseline: 2 },
      gust: { factor: 1.5, duration_s: 1 },
      trail_m: { design: 0.058, baseline: 0.058 },
      steering: null,
      position: 'rear',
      yaw_p90_deg: 12,
      yaw_mean_deg: 6,
      yaw_beyond_validity_fraction: 0,
      wind: { mean_speed_mps: 3, hub_mean_speed_mps: 1.3, hub_height_m: 0.335 },
      flags: [],
      cautions: [],
    } as unknown as RideDocument;
    const t = rideTable(d, 'kmh', 50 / 3.6);
    expect(t.rows[0]).toEqual(['Power at 36.0 km/h (constant speed)', '250.0 W', '252.5 W', '-2.5 W']);
    expect(cell(t, /grams at 50\.0 km\/h/, 1)).toBe('118 g');
    expect(cell(t, /^Aerodynamic share/, 3)).toBe('-1.0 %');
    expect(cell(t, /^Trail/, 1)).toBe('58.0 mm');
    expect(t.notes).toContain('Rear wheel: no steering moment.');
  });
});
