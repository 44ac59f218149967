// Slips named from the data's own consistency when the uncalibrated model is itself well off: data made
// by the model with porosity_scale 2 and profile_drag_factor 1.7 (so the default model's drag is about
// 1.5x off), then mis-mapped. Unit factors by definition (NIST SP 811 B.8): 1 gf = 9.80665e-3 N, so
// grams read as newtons are 1000 / 9.80665 = 101.97 times too large; 1 lbf = 4.4482216152605 N.
import { describe, expect, it } from 'vitest';
import {
  convertTable,
  createModelEvaluator,
  detectSlips,
  type MapFile,
  parseCsvText,
  type SlipFlag,
  type SlipLabels,
} from '../../../src/compute/compare/index';
import { gaussian, gridPoints, testCase, truthAt } from './helpers';

const caseFile = testCase();
const points = gridPoints([8.33, 13.9]);
const FAR = { porosity_scale: 2, profile_drag_factor: 1.7 };
const truth = truthAt(caseFile, points, FAR);
const model = truthAt(caseFile, points);
const GF_PER_N = 1000 / 9.80665;
const LBF_PER_N = 1 / 4.4482216152605;

interface Slip {
  drag?: number;
  side?: number;
  sideSign?: 1 | -1;
  mapSign?: 1 | -1;
  labels?: SlipLabels;
}

function flagsFor(slip: Slip): SlipFlag[] {
  const noise = gaussian(5);
  let csv = 'yaw,speed,drag,side\n';
  points.forEach((p, i) => {
    const t = truth[i]!;
    const drag = (t.axialN + noise(0.003)) * (slip.drag ?? 1);
    const side = (t.sideN + noise(0.01)) * (slip.side ?? 1) * (slip.sideSign ?? 1);
    csv += `${(p.yawRad * 180) / Math.PI},${p.airspeedMps},${drag},${side}\n`;
  });
  const table = parseCsvText(csv);
  if (!table.ok) throw new Error(table.errors.join());
  const map: MapFile = {
    format: 'coversweep-map',
    version: 1,
    columns: {
      yaw: { quantity: 'yaw_deg', unit: 'deg' },
      speed: { quantity: 'speed', unit: 'mps' },
      drag: { quantity: 'axial_force', unit: 'N' },
      side: { quantity: 'side_force', unit: 'N' },
    },
    side_force_sign: slip.mapSign ?? 1,
    air_density_kgpm3: 1.2,
  };
  const conv = convertTable(table.value, map, 1.2);
  if (!conv.ok) throw new Error(conv.errors.join());
  const m = createModelEvaluator(caseFile, conv.value.points).evaluate();
  return detectSlips(conv.value, m, caseFile, slip.labels ? { labels: slip.labels } : {});
}

const show = (flags: SlipFlag[]) => JSON.stringify(flags, null, 1);

describe('slips on data far from the default model', () => {
  it('the data are well off the default model (the case the old model-distance rule missed)', () => {
    const ratio = truth.reduce((s, t, i) => s + t.axialN / model[i]!.axialN, 0) / truth.length;
    // Far: beyond the 1.3x tolerance around a known factor, so 101.97 x ratio is no longer "about 102".
    expect(Math.abs(Math.log(ratio)), `mean axial truth/model = ${ratio}`).toBeGreaterThan(Math.log(1.3));
  });

  it('raises no unit or sign flag on the correctly mapped file', () => {
    const flags = flagsFor({});
    expect(
      flags.filter((f) => f.code === 'unit_factor' || f.code === 'side_force_sign'),
      show(flags),
    ).toEqual([]);
  });

  it('names grams read as newtons', () => {
    const flags = flagsFor({ drag: GF_PER_N });
    const f = flags.find((x) => x.code === 'unit_factor' && x.output === 'axial_N');
    expect(f?.message ?? show(flags)).toMatch(/look like grams-force but the column is mapped as newtons/);
    expect(f!.message).toMatch(/outside what any wheel makes/);
  });

  it('names pounds-force read as newtons', () => {
    const flags = flagsFor({ side: LBF_PER_N });
    const f = flags.find((x) => x.code === 'unit_factor' && x.output === 'side_N');
    expect(f?.message ?? show(flags)).toMatch(/look like pounds-force but the column is mapped as newtons/);
  });

  it('names a flipped side-force sign, from the data alone', () => {
    const flags = flagsFor({ sideSign: -1 });
    const f = flags.find((x) => x.code === 'side_force_sign');
    expect(f?.message ?? show(flags)).toMatch(/set side_force_sign to -1/);
    expect(
      flags.filter((x) => x.code === 'unit_factor'),
      show(flags),
    ).toEqual([]);
  });

  it('names all three at once', () => {
    const flags = flagsFor({ drag: GF_PER_N, side: LBF_PER_N, sideSign: -1 });
    const summary = flags.map((f) => `${f.code}/${f.output}`).join(', ');
    expect(flags.find((x) => x.code === 'unit_factor' && x.output === 'axial_N')?.message, summary).toMatch(
      /grams-force/,
    );
    expect(flags.find((x) => x.code === 'unit_factor' && x.output === 'side_N')?.message, summary).toMatch(
      /pounds-force/,
    );
    expect(
      flags.some((x) => x.code === 'side_force_sign'),
      summary,
    ).toBe(true);
  });

  it('does not advise -1 when -1 is already chosen, and speaks a given label', () => {
    // The map already flips the sign, but the data were right: the converted side force falls with yaw.
    const flags = flagsFor({ mapSign: -1 });
    const f = flags.find((x) => x.code === 'side_force_sign');
    expect(f?.message ?? show(flags)).toMatch(/side_force_sign is -1 now.*set side_force_sign to 1\./);
    expect(f!.message).not.toMatch(/to -1/);
    const labelled = flagsFor({
      sideSign: -1,
      labels: { side_force_sign: '"Side force positive to the right"' },
    });
    const g = labelled.find((x) => x.code === 'side_force_sign')!;
    expect(g.message).toMatch(/set "Side force positive to the right" to -1/);
    expect(g.message).not.toMatch(/side_force_sign/);
    const units = flagsFor({ drag: GF_PER_N, labels: { unit: 'unit menu' } });
    expect(units.find((x) => x.code === 'unit_factor')?.message ?? show(units)).toMatch(
      /set its unit menu to "gf"/,
    );
  });
});
