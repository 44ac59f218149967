/**
 * The design study's exports: its table in the page's input units (rim depth in mm, a unit in every
 * numeric header) at full precision, and its trade-off plot as a well-formed SVG with the front and limit.
 */
import { DOMParser } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import type { StudyDocument } from '../../../src/compute/design/index';
import { plotSvg } from '../../../src/ui/export/plotSvg';
import { designColumns, designTableData } from '../../../src/ui/study/designTable';
import { tradeOffData, tradeOffSpec } from '../../../src/ui/study/tradeOffPlot';

/** A hand-made study over cover fraction and rim depth (m, as the study result holds it). */
function doc(): StudyDocument {
  const design = (index: number, cover: number, depthM: number, time: number, steer: number) => ({
    index,
    design: { cover_fraction: cover, rim_depth_m: depthM },
    objectives: { time_s: time, steering_gust_Nm: steer },
    saved_vs_baseline: { time_s: 100 - time, steering_gust_Nm: 1 - steer },
    violation: 0,
    meets_limits: true,
  });
  const designs = [design(0, 0, 0.03, 99, 1), design(1, 0.5, 0.0625, 95, 1.5), design(2, 1, 0.09, 90, 3)];
  return {
    objective: { id: 'time_s', label: 'Time over the ride', unit: 's', description: '' },
    limits: [
      {
        id: 'steering_gust_Nm',
        label: 'Steering moment',
        unit: 'N m',
        description: '',
        max: 2.5,
        source: '',
      },
    ],
    variables: [
      { id: 'cover_fraction', unit: '1', min: 0, max: 1 },
      { id: 'rim_depth_m', unit: 'm', min: 0.03, max: 0.09 },
    ],
    optimum: { ...designs[1]! },
    front: {
      handling: { id: 'steering_gust_Nm', label: 'Steering moment', unit: 'N m', description: '' },
      points: [designs[0]!, designs[1]!],
      limit_sweep: [],
    },
    designs,
    cautions: [],
  } as unknown as StudyDocument;
}

describe('design study exports', () => {
  it('the table: rim depth in mm (the inputs’ unit), a unit in every numeric header, full precision', () => {
    const t = designTableData(doc(), designColumns(doc()));
    expect(t.headers).toEqual([
      'Design #',
      'Role',
      'Cover fraction (–)',
      'Rim depth (mm)',
      'Time over the ride (s)',
      'Steering moment (N m)',
      'Time over the ride saved (s)',
    ]);
    // 0.0625 m is 62.5 mm exactly.
    expect(t.rows[1]).toEqual([1, 'optimum', 0.5, 62.5, 95, 1.5, 5]);
    expect(t.rows.map((r) => r[3])).toEqual([30, 62.5, 90]);
  });

  it('the trade-off plot: the same points as the page’s plot, the limit as a marker, as well-formed SVG', () => {
    const d = doc();
    const spec = tradeOffSpec(d);
    const data = tradeOffData(d);
    expect(spec.xs).toEqual(Array.from(data.data[0] as ArrayLike<number>));
    expect(spec.series.map((s) => s.label)).toEqual(['every design', 'the front', 'the optimum']);
    expect(spec.markersX?.xs).toEqual([2.5]);
    const errors: string[] = [];
    const svg = plotSvg(spec, ['Study: 3 designs']).svg;
    const root = new DOMParser({
      onError: (level, m) => level !== 'warning' && errors.push(m),
    }).parseFromString(svg, 'image/svg+xml').documentElement!;
    expect(errors).toEqual([]);
    const labels = Array.from(root.getElementsByTagName('g'))
      .filter((g) => g.getAttribute('class') === 'series')
      .map((g) => g.getAttribute('data-label'));
    expect(labels).toEqual(['every design', 'the front', 'the optimum']);
    expect(svg).toContain('Study: 3 designs');
  });
});
