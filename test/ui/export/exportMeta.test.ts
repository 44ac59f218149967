/** The caption builder: what every export says about itself (design, conditions, model, CALIBRATED, version, date). */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultCase } from '../../../src/ui/defaultCase';
import { captionLines } from '../../../src/ui/export/captionLines';
import { exportMeta } from '../../../src/ui/export/exportMeta';
import { wrapText } from '../../../src/ui/export/wrapText';

const PKG_VERSION = (
  JSON.parse(readFileSync(resolve(__dirname, '../../../package.json'), 'utf8')) as { version: string }
).version;
const DATE = new Date(Date.UTC(2026, 11, 2, 13, 45, 7));

function edited() {
  const c = defaultCase();
  return {
    ...c,
    name: 'Trial wheel <b>&</b> "B"',
    wheel: { ...c.wheel, rim_depth_m: 0.082 },
    conditions: { ...c.conditions, airspeed_mps: [0.44704 * 30], yaw_deg: [0, 5, 10] },
  };
}

describe('exportMeta and captionLines', () => {
  it('name the design with its geometry in mm, the conditions, the model options, the version from package.json and the date', () => {
    const c = edited();
    const meta = exportMeta({ case: c, speedUnit: 'mph' }, DATE);
    expect(meta.version, `package.json says ${PKG_VERSION}`).toBe(PKG_VERSION);
    expect(meta.date).toBe('2026-12-02T13:45:07Z');
    expect(meta.design.name).toBe(c.name);
    expect(meta.design.summary).toContain('rim depth 82 mm');
    expect(meta.design.summary).toContain(
      `outer radius ${Number((c.wheel.outer_radius_m * 1000).toPrecision(6))} mm`,
    );
    // 30 mph is 13.4112 m/s exactly (1 mph = 0.44704 m/s by definition): read back as 30 mph.
    expect(meta.conditions.summary).toContain('airspeed 30 mph');
    expect(meta.conditions.summary).toContain('yaw 0, 5, 10°');
    expect(meta.model.summary).toContain(`porosity scale ${c.model.porosity_scale}`);
    expect(meta.model.summary).toContain(`lattice ${c.model.lattice_span} × ${c.model.lattice_chord}`);
    expect(meta.calibrated).toBe(false);
    const lines = captionLines(meta, ['Map at 10° yaw']);
    expect(lines[0]).toBe(`Design: ${c.name} — ${meta.design.summary}`);
    expect(lines.some((l) => l.includes('CALIBRATED'))).toBe(false);
    expect(lines).toContain('Map at 10° yaw');
    expect(lines.at(-1)).toMatch(
      new RegExp(`^CoverSweep ${PKG_VERSION.replace(/\./g, '\\.')} · exported 2026-12-02 13:45 UTC`),
    );
  });

  it('say CALIBRATED, with the data and the fitted values, only while a calibration is applied', () => {
    const c = edited();
    const calibration = {
      data: 'tunnel-run.csv',
      points: 30,
      values: { porosity_scale: 1.8 },
      original: { porosity_scale: 1 },
    };
    const meta = exportMeta({ case: c, speedUnit: 'kmh', calibration }, DATE);
    expect(meta.calibrated).toBe(true);
    const lines = captionLines(meta);
    const mark = lines.filter((l) => l.startsWith('CALIBRATED'));
    expect(mark.length, lines.join('\n')).toBe(1);
    expect(mark[0]).toContain('tunnel-run.csv (30 points)');
    expect(mark[0]).toContain('porosity_scale 1.8 (was 1)');
    expect(
      captionLines(exportMeta({ case: c, speedUnit: 'kmh', calibration: null }, DATE)).join(' '),
    ).not.toContain('CALIBRATED');
  });

  it('refuse an invalid date', () => {
    expect(() => exportMeta({ case: defaultCase(), speedUnit: 'kmh' }, new Date(Number.NaN))).toThrow(
      RangeError,
    );
  });

  it('wrapText breaks at spaces within the width and keeps every word', () => {
    const text = 'one two three four five six seven eight nine ten';
    const lines = wrapText(text, 12);
    for (const l of lines) expect(l.length, l).toBeLessThanOrEqual(12);
    expect(lines.join(' ')).toBe(text);
    expect(wrapText('averyveryverylongword x', 5)).toEqual(['averyveryverylongword', 'x']);
    expect(() => wrapText('x', 0)).toThrow(RangeError);
  });
});
