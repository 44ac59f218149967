/**
 * The SVG writers: each figure is well-formed XML (parsed by @xmldom/xmldom, failing on any error),
 * carries every caption line and every series, and places the points where the axes say.
 */
import { DOMParser, type Element as XmlElement } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from '../../../src/compute/compare/csv';
import { defaultCase } from '../../../src/ui/defaultCase';
import type { MapData } from '../../../src/ui/designMap';
import { exportMeta } from '../../../src/ui/export/exportMeta';
import { mapSvg } from '../../../src/ui/export/mapSvg';
import { plotSvg } from '../../../src/ui/export/plotSvg';
import { tableCsv } from '../../../src/ui/export/tableCsv';
import { tableJson } from '../../../src/ui/export/tableJson';
import type { PlotSpec } from '../../../src/ui/linePlot';
import { TRUSTED_YAW_DEG } from '../../../src/ui/yawTrust';

function parseSvg(svg: string) {
  // xmldom tolerates a bare '&' in text: check for one here (every '&' must start an entity).
  expect(svg.match(/&(?!(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-f]+);)/i), 'a bare &').toBeNull();
  const errors: string[] = [];
  const doc = new DOMParser({
    onError: (level, message) => {
      if (level !== 'warning') errors.push(`${level}: ${message}`);
    },
  }).parseFromString(svg, 'image/svg+xml');
  expect(errors, 'XML errors').toEqual([]);
  const root = doc.documentElement!;
  expect(root.nodeName).toBe('svg');
  expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  return root;
}

const all = (root: XmlElement, tag: string) => Array.from(root.getElementsByTagName(tag));
const texts = (root: XmlElement) => all(root, 'text').map((t) => t.textContent ?? '');
const points = (el: XmlElement) =>
  (el.getAttribute('points') ?? '').split(' ').map((p) => p.split(',').map(Number) as [number, number]);

const CAPTION = [
  'Design: A & <B> — rim depth 82 mm',
  'CALIBRATED: fitted to run.csv (3 points)',
  'CoverSweep 0.1.0 · exported 2026-12-02 13:45 UTC',
];

function spec(): PlotSpec {
  return {
    title: 'Axial drag vs yaw',
    xLabel: 'Yaw, deg',
    yLabel: 'Axial drag, N',
    xs: [0, 10, 20, 30, 40],
    series: [
      { label: 'cover 0 "open"', stroke: '#1c6876', values: [1, 2, 3, 4, 5] },
      { label: 'cover 1', stroke: '#c2412d', dash: [4, 2], values: [2, null, 1, 0, -1] },
      { label: 'data', stroke: '#000', pointsOnly: true, values: [1.5, 2.5, null, null, null] },
      { label: 'hidden edge', stroke: '#999', noLegend: true, values: [0, 0, 0, 0, 0] },
    ],
    xIsYawDeg: true,
  };
}

describe('plotSvg', () => {
  it('is well-formed SVG with the title, every legend series, the caption lines (escaped) and the beyond-yaw shading', () => {
    const fig = plotSvg(spec(), CAPTION);
    const root = parseSvg(fig.svg);
    expect(Number(root.getAttribute('width'))).toBe(fig.width);
    expect(Number(root.getAttribute('height'))).toBe(fig.height);
    const t = texts(root);
    expect(t).toContain('Axial drag vs yaw');
    for (const line of CAPTION) expect(t, line).toContain(line);
    for (const label of ['cover 0 "open"', 'cover 1', 'data']) expect(t, label).toContain(label);
    expect(t).not.toContain('hidden edge');
    const bold = all(root, 'text').find((e) => e.textContent?.startsWith('CALIBRATED'));
    expect(bold?.getAttribute('font-weight')).toBe('700');
    // x from 0 to 40 deg: the range beyond the trusted yaw is shaded, starting at TRUSTED_YAW_DEG.
    expect(TRUSTED_YAW_DEG).toBeLessThan(40);
    expect(all(root, 'rect').filter((r) => r.getAttribute('class') === 'beyond-yaw').length).toBe(1);
  });

  it('places each series where the axes say, splitting a line at a missing value', () => {
    const root = parseSvg(plotSvg(spec(), CAPTION).svg);
    const groups = all(root, 'g').filter((g) => g.getAttribute('class') === 'series');
    expect(groups.map((g) => g.getAttribute('data-label'))).toEqual([
      'cover 0 "open"',
      'cover 1',
      'data',
      'hidden edge',
    ]);
    const line0 = all(groups[0]!, 'polyline');
    expect(line0.length).toBe(1);
    const p = points(line0[0]!);
    expect(p.length).toBe(5);
    // Equal x steps map to equal pixel steps; y = 1..5 rises linearly (SVG y grows downwards).
    const dx = p.map((q, i) => (i === 0 ? 0 : q[0] - p[i - 1]![0])).slice(1);
    const dy = p.map((q, i) => (i === 0 ? 0 : q[1] - p[i - 1]![1])).slice(1);
    for (const d of dx) expect(Math.abs(d - dx[0]!), `dx ${dx}`).toBeLessThan(0.02);
    for (const d of dy) expect(Math.abs(d - dy[0]!), `dy ${dy}`).toBeLessThan(0.02);
    expect(dy[0]).toBeLessThan(0);
    // 'cover 1' has a gap at x = 10: one lone point before it (no line) and one line of 3 after.
    const line1 = all(groups[1]!, 'polyline');
    expect(line1.length).toBe(1);
    expect(points(line1[0]!).length).toBe(3);
    expect(line1[0]!.getAttribute('stroke-dasharray')).toBe('4 2');
    // Markers only for measured data: two circles, no line.
    expect(all(groups[2]!, 'polyline').length).toBe(0);
    expect(all(groups[2]!, 'circle').length).toBe(2);
  });

  it('has no shading when the plotted yaw stays within the trusted range, and refuses ragged series', () => {
    const s = spec();
    s.xs = [0, 1, 2, 3, 4];
    expect(parseSvg(plotSvg(s, CAPTION).svg).toString()).not.toContain('beyond-yaw"');
    s.series[0]!.values = [1, 2];
    expect(() => plotSvg(s, CAPTION)).toThrow(RangeError);
  });
});

describe('mapSvg', () => {
  it('is well-formed SVG with the shaded field, contour lines, the current design and the caption', () => {
    const xs = [0, 0.25, 0.5, 0.75, 1];
    const ys = [20, 40, 60, 80];
    const colour = new Float64Array(20);
    const contour = new Float64Array(20);
    ys.forEach((y, j) => {
      xs.forEach((x, i) => {
        colour[j * 5 + i] = x * 10 + y / 10;
        contour[j * 5 + i] = x + y / 100;
      });
    });
    const data: MapData = {
      xs,
      ys,
      colour,
      colourLabel: 'Axial drag, N',
      diverging: false,
      contour,
      contourLabel: 'Side force, N',
      title: ['Design map', 'At 10° yaw'],
      current: { x: 0.5, y: 50 },
      baseline: null,
    };
    const root = parseSvg(mapSvg(data, CAPTION).svg);
    const t = texts(root);
    for (const line of [...CAPTION, 'Design map', 'At 10° yaw', 'Rim depth, mm'])
      expect(t, line).toContain(line);
    const field = all(root, 'g').find((g) => g.getAttribute('class') === 'field')!;
    expect(all(field, 'rect').length).toBeGreaterThanOrEqual(4 * 3);
    expect(all(root, 'path').length).toBeGreaterThan(0);
    expect(all(root, 'circle').filter((c) => c.getAttribute('class') === 'current').length).toBe(1);
    expect(() => mapSvg({ ...data, colour: new Float64Array(3) }, CAPTION)).toThrow(RangeError);
  });
});

describe('table files', () => {
  const meta = exportMeta(
    {
      case: { ...defaultCase(), name: 'Trial, "quoted"\nname' },
      speedUnit: 'kmh',
      calibration: {
        data: 'run.csv',
        points: 3,
        values: { porosity_scale: 2 },
        original: { porosity_scale: 1 },
      },
    },
    new Date(Date.UTC(2026, 11, 2)),
  );
  const headers = ['Yaw, deg', 'Axial drag, N', 'Note'];
  const rows = [
    [0, 1.25, 'a, b'],
    [10, Number.NaN, null],
  ];

  it('CSV: a # header block naming design, conditions, CALIBRATED, units, version and date, then the table the tool reads back', () => {
    const text = tableCsv(meta, 'Test table', headers, rows);
    const head = text.split('\r\n').filter((l) => l.startsWith('#'));
    const keys = head.map((l) => l.slice(2, l.indexOf(':')));
    expect(keys).toEqual(['table', 'design', 'conditions', 'model', 'calibrated', 'units', 'tool', 'date']);
    expect(head[1]).toContain('Trial, "quoted" name');
    expect(head[4]).toMatch(/^# calibrated: CALIBRATED — model options fitted to run\.csv/);
    expect(head[7]).toBe('# date: 2026-12-02T00:00:00Z');
    const parsed = parseCsvText(text);
    expect(parsed.ok, JSON.stringify(parsed)).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.value.headers).toEqual(headers);
    expect(parsed.value.rows).toEqual([
      ['0', '1.25', 'a, b'],
      ['10', '', ''],
    ]);
  });

  it('JSON: format, metadata and rows; a number that is not finite is null', () => {
    const doc = JSON.parse(tableJson(meta, 'Test table', headers, rows, ['At 10° yaw']));
    expect(doc.format).toBe('coversweep-table');
    expect(doc.metadata.calibrated).toBe(true);
    expect(doc.metadata.version).toBe(meta.version);
    expect(doc.metadata.notes).toEqual(['At 10° yaw']);
    expect(doc.columns).toEqual(headers);
    expect(doc.rows).toEqual([
      [0, 1.25, 'a, b'],
      [10, null, null],
    ]);
    expect(() => tableJson(meta, 'x', headers, [[1]])).toThrow(RangeError);
  });
});
