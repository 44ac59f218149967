/**
 * The report's pure formatting: numbers with units (no made-up value for an undefined one), the date,
 * the calibration line, the validation summary recounted from its rows, and whether the last ride is
 * this design's.
 */
import { describe, expect, it } from 'vitest';
import type { RideDocument, RideFile } from '../../../src/compute/ride/index';
import type { ValidationReport, ValidationRow } from '../../../src/compute/validation/types';
import { calibrationText } from '../../../src/ui/report/calibrationText';
import { formatQuantity } from '../../../src/ui/report/formatQuantity';
import { hoistSharedNotes } from '../../../src/ui/report/hoistSharedNotes';
import { reportDateText } from '../../../src/ui/report/reportDateText';
import type { ReportFigure } from '../../../src/ui/report/reportFigureDom';
import { rideStatus } from '../../../src/ui/report/rideStatus';
import { abridged, validationSummary } from '../../../src/ui/report/validationSummary';

describe('formatQuantity', () => {
  it('prints fixed decimals with the unit, minus zero as zero, undefined as n/a', () => {
    const cases: Array<[number, number, string, string]> = [
      [1.23456, 3, 'N', '1.235 N'],
      [-0.0004, 3, 'N', '0.000 N'],
      [-0.4, 0, 'g', '0 g'],
      [-12.5, 1, 'mm', '-12.5 mm'],
      [0.25, 3, '', '0.250'],
      [10, 1, '°', '10.0°'],
      [20, 1, '°C', '20.0 °C'],
      [Number.NaN, 2, 'W', 'n/a'],
      [Number.POSITIVE_INFINITY, 2, 'W', 'n/a'],
    ];
    for (const [value, decimals, unit, expected] of cases) {
      expect(formatQuantity(value, decimals, unit), `input ${value}, ${decimals}, "${unit}"`).toBe(expected);
    }
  });

  it('refuses decimals that are not an integer 0..12', () => {
    for (const d of [-1, 1.5, 13, Number.NaN]) {
      expect(() => formatQuantity(1, d, 'N'), `decimals ${d}`).toThrow(/decimals must be an integer 0..12/);
    }
  });
});

describe('reportDateText', () => {
  it('prints the UTC date and time in ISO 8601 order', () => {
    expect(reportDateText(new Date(Date.UTC(2026, 11, 2, 14, 5, 59)))).toBe('2026-12-02 14:05 UTC');
    expect(() => reportDateText(new Date(Number.NaN))).toThrow(/valid Date/);
  });
});

describe('calibrationText', () => {
  it('marks a fitted model CALIBRATED with its data, points and values, and says so when not', () => {
    const c = calibrationText({
      data: 'tunnel.csv',
      points: 12,
      values: { porosity_scale: 1.83456, suction_recovered: 0.5 },
      original: { porosity_scale: 1, suction_recovered: 0.8 },
    });
    expect(c.calibrated).toBe(true);
    expect(c.text).toBe(
      'CALIBRATED: model fitted to tunnel.csv (12 points): porosity_scale 1.835 (was 1), suction_recovered 0.5 (was 0.8).',
    );
    for (const none of [null, undefined]) {
      const n = calibrationText(none);
      expect(n.calibrated).toBe(false);
      expect(n.text).toMatch(/^Not calibrated/);
    }
  });
});

function row(id: string, pass: boolean, known: string | null): ValidationRow {
  return {
    id,
    group: 'whole wheel',
    quantity: `quantity ${id}`,
    unit: 'm^2',
    description: 'd',
    source: 's',
    strength: 'measured',
    reference: 0.0044,
    band: [0.0029, 0.0059],
    band_text: '0.0029 .. 0.0059',
    model: pass ? 0.004 : 0.0095432581,
    note: null,
    pass,
    error: null,
    known_disagreement: known,
  } as unknown as ValidationRow;
}

function report(rows: ValidationRow[], passed = 0): ValidationReport {
  // The report's own counts are deliberately wrong (passed): the summary must recount from the rows.
  return { format: 'coversweep-validation', version: 1, rows, passed, failed: 0, known: 0, unexpected: 0 };
}

describe('validationSummary', () => {
  it('counts passing rows from the rows themselves and lists every failure with its reason', () => {
    const s = validationSummary(
      report([row('a', true, null), row('b', false, 'rolling spokes'), row('c', true, null)]),
    );
    expect(s.passed).toBe(2);
    expect(s.total).toBe(3);
    expect(s.headline).toBe('2 of 3 reference cases pass; 1 fails (1 known, documented disagreement)');
    expect(s.failures).toEqual([
      'b — quantity b: reference band 0.0029 .. 0.0059 m^2, model 0.009543 m^2; known disagreement: rolling spokes',
    ]);
  });

  it('names an unexplained failure and a row the model could not compute', () => {
    const r = row('u', false, null);
    (r as { model: number | null; error: string | null }).model = null;
    (r as { error: string | null }).error = 'lattice too large';
    const s = validationSummary(report([r, row('k', false, 'why')]));
    expect(s.headline).toBe(
      '0 of 2 reference cases pass; 2 fail (1 known, documented disagreement; 1 unexplained)',
    );
    expect(s.failures[0]).toContain('model not computed (lattice too large); UNEXPLAINED failure');
    expect(() => validationSummary(report([]))).toThrow(/no rows/);
  });

  it('says all pass without a failure clause', () => {
    expect(validationSummary(report([row('a', true, null)])).headline).toBe('1 of 1 reference cases pass');
  });
});

describe('rideStatus', () => {
  const ride = { format: 'coversweep-ride', design: { rim_depth_m: 0.08 } } as unknown as RideFile;
  const doc = { ride } as unknown as RideDocument;
  it('prints a ride only when it is the ride the page defines now', () => {
    expect(rideStatus(doc, { ok: true, value: structuredClone(ride) }).kind).toBe('current');
    const other = { ...ride, design: { rim_depth_m: 0.05 } } as unknown as RideFile;
    expect(rideStatus(doc, { ok: true, value: other }).kind).toBe('stale');
    expect(rideStatus(null, { ok: true, value: ride })).toMatchObject({ kind: 'none' });
    const bad = rideStatus(doc, { ok: false, errors: ['Rider mass: at least 30 kg'] });
    expect(bad).toMatchObject({ kind: 'invalid' });
    expect((bad as { reason: string }).reason).toContain('Rider mass: at least 30 kg');
  });
});

describe('abridged', () => {
  it('keeps a short reason, cuts a long one at its first sentence or a word, and says so', () => {
    expect(abridged('Short reason.')).toBe('Short reason.');
    expect(abridged('First sentence. Second sentence.')).toBe(
      'First sentence. (abridged; in full in the Help table)',
    );
    const long = `${'word '.repeat(100)}end`;
    const cut = abridged(long, 50);
    expect(cut).toBe(`${'word '.repeat(9)}word … (abridged; in full in the Help table)`);
  });
});

describe('hoistSharedNotes', () => {
  it('moves a note two figures share to one shared line and keeps the others', () => {
    const fig = (id: string, notes: string[]) =>
      ({
        id,
        title: id,
        alt: id,
        image: { url: '', widthPx: 1, heightPx: 1 },
        legend: [],
        notes,
      }) as ReportFigure;
    const input = [fig('a', ['x: yaw', 'shaded']), fig('b', ['x: yaw', 'shaded']), fig('c', ['x: cover'])];
    const r = hoistSharedNotes(input);
    expect(r.shared).toEqual(['x: yaw', 'shaded']);
    expect(r.figures.map((f) => f.notes)).toEqual([[], [], ['x: cover']]);
    expect(input[0]!.notes).toEqual(['x: yaw', 'shaded']);
  });
});
