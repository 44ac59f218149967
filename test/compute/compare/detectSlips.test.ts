import { describe, expect, it } from 'vitest';
import {
  convertTable,
  createModelEvaluator,
  detectSlips,
  type MapFile,
  parseCsvText,
  type SlipCode,
} from '../../../src/compute/compare/index';
import { gaussian, gridPoints, testCase, truthAt } from './helpers';

// Synthetic "measurements" generated from the model itself (default parameters) with small noise, then
// one slip planted at a time; the detector must name that slip and raise nothing on the clean file.
const caseFile = testCase();
const speeds = [8.33, 13.9];
const points = gridPoints(speeds);
const truth = truthAt(caseFile, points);
const R = caseFile.wheel.outer_radius_m;
const disc = Math.PI * R * R;

interface Plant {
  drag?: (axial: number, wind: number, i: number) => number;
  side?: (side: number, i: number) => number;
  speed?: (v: number) => number;
  dragHeader?: string;
  dragColumn?: MapFile['columns'][string];
}

function run(plant: Plant = {}) {
  const noise = gaussian(11);
  let csv = `yaw,speed,${plant.dragHeader ?? 'drag'},side\n`;
  points.forEach((p, i) => {
    const t = truth[i]!;
    const drag = (plant.drag ?? ((a) => a))(t.axialN + noise(0.003), t.windDragN + noise(0.003), i);
    const side = (plant.side ?? ((s) => s))(t.sideN + noise(0.01), i);
    csv += `${(p.yawRad * 180) / Math.PI},${(plant.speed ?? ((v) => v))(p.airspeedMps)},${drag},${side}\n`;
  });
  const table = parseCsvText(csv);
  if (!table.ok) throw new Error(table.errors.join());
  const map: MapFile = {
    format: 'coversweep-map',
    version: 1,
    columns: {
      yaw: { quantity: 'yaw_deg', unit: 'deg' },
      speed: { quantity: 'speed', unit: 'mps' },
      [plant.dragHeader ?? 'drag']: plant.dragColumn ?? { quantity: 'axial_force', unit: 'N' },
      side: { quantity: 'side_force', unit: 'N' },
    },
    side_force_sign: 1,
    air_density_kgpm3: 1.2,
  };
  const conv = convertTable(table.value, map, 1.2);
  if (!conv.ok) throw new Error(conv.errors.join());
  const model = createModelEvaluator(caseFile, conv.value.points).evaluate();
  return detectSlips(conv.value, model, caseFile);
}

const codes = (flags: { code: SlipCode }[]) => flags.map((f) => f.code);

describe('detectSlips on synthetic data planted with one slip each', () => {
  it('raises nothing on the clean file', () => {
    const flags = run();
    expect(flags, JSON.stringify(flags)).toEqual([]);
  });

  it('grams-force read as newtons (factor 1000 / 9.80665)', () => {
    const flags = run({ drag: (a) => (a / 9.80665) * 1000 });
    expect(codes(flags)).toContain('unit_factor');
    const f = flags.find((x) => x.code === 'unit_factor')!;
    expect(f.message).toMatch(/look like grams-force but the column is mapped as newtons/);
    expect(Math.abs(f.factor! / 101.97 - 1), `factor=${f.factor}`).toBeLessThan(0.05);
  });

  it('kilograms-force read as newtons (factor 1 / 9.81)', () => {
    const flags = run({ drag: (a) => a / 9.80665 });
    expect(flags.find((x) => x.code === 'unit_factor')?.message ?? JSON.stringify(flags)).toMatch(
      /kilograms-force/,
    );
  });

  it('pounds-force read as newtons (factor 1 / 4.45)', () => {
    const flags = run({ side: (s) => s / 4.4482216152605 });
    const f = flags.find((x) => x.code === 'unit_factor' && x.output === 'side_N');
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/pounds-force/);
  });

  it('a drag coefficient on the frontal area mapped as on the disc area', () => {
    const frontal = 2 * R * caseFile.wheel.tyre_width_m;
    const flags = run({
      dragHeader: 'Cd',
      dragColumn: { quantity: 'drag_coefficient', unit: '1', reference_area_m2: disc },
      drag: (a, _w, i) => a / (0.5 * 1.2 * points[i]!.airspeedMps ** 2 * frontal),
    });
    const f = flags.find((x) => x.code === 'reference_area');
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/frontal area/);
  });

  it('wind-axis drag mapped as axial drag (difference growing with yaw)', () => {
    const flags = run({ drag: (_a, w) => w });
    expect(codes(flags), JSON.stringify(flags)).toContain('drag_axis');
    expect(flags.find((x) => x.code === 'drag_axis')!.message).toMatch(/wind-axis drag/);
  });

  it('a flipped side-force sign', () => {
    const flags = run({ side: (s) => -s });
    expect(codes(flags)).toContain('side_force_sign');
    expect(flags.find((x) => x.code === 'side_force_sign')!.message).toMatch(/side_force_sign to -1/);
  });

  it('a side force at zero yaw (a 1.5 deg turntable offset)', () => {
    // The offset adds the side force of 1.5 deg at each point's own speed (index 5 of each speed is 10 deg).
    const flags = run({
      side: (s, i) => {
        const slope = truth[Math.floor(i / 10) * 10 + 5]!.sideN / Math.sin((10 * Math.PI) / 180);
        return s + slope * Math.sin((1.5 * Math.PI) / 180);
      },
    });
    const f = flags.find((x) => x.code === 'side_force_at_zero_yaw');
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/yaw offset of about 1\.\d deg/);
  });

  it('yaw symmetry: the same 1.5 deg offset, from the +-5 deg pairs alone', () => {
    const flags = run({
      side: (s, i) => {
        const slope = truth[Math.floor(i / 10) * 10 + 5]!.sideN / Math.sin((10 * Math.PI) / 180);
        return s + slope * Math.sin((1.5 * Math.PI) / 180);
      },
    });
    const f = flags.find((x) => x.code === 'yaw_symmetry');
    // even/odd = tan(1.5 deg)/tan(5 deg) for S ~ k sin(b + d); the planted offset is additive, so about 1.5 deg.
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/yaw offset of about 1\.[3-7] deg/);
  });

  it('yaw symmetry: a side force whose sign was lost (magnitudes)', () => {
    const flags = run({ side: (s) => Math.abs(s) });
    const f = flags.find((x) => x.code === 'yaw_symmetry');
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/may hold magnitudes/);
  });

  it('forces not scaling with dynamic pressure (a constant 0.3 N tare on the drag)', () => {
    const flags = run({ drag: (a) => a + 0.3 });
    expect(codes(flags), JSON.stringify(flags)).toContain('dynamic_pressure_scaling');
  });

  it('a speed column in km/h mapped as m/s shows as a speed-unit factor', () => {
    // The file holds km/h values but the map says m/s: the model runs 3.6 times too fast.
    const flags = run({ speed: (v) => v * 3.6 });
    // Speeds above 30 m/s are still accepted; the factor is 1/3.6^2.
    const f = flags.find((x) => x.code === 'speed_unit');
    expect(f?.message ?? JSON.stringify(flags)).toMatch(/km\/h, not m\/s/);
  });
});
