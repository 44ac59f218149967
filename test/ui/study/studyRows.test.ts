import { describe, expect, it } from 'vitest';
import type { StudyDocument } from '../../../src/compute/design/index';
import { designColumns } from '../../../src/ui/study/designTable';
import { optimumLines } from '../../../src/ui/study/optimumSummary';
import { cellText, headerText, nearestPoint, sortRows, studyRows } from '../../../src/ui/study/studyRows';
import { tradeOffData } from '../../../src/ui/study/tradeOffPlot';

/** A hand-made study result: four designs, design 2 the optimum, designs 0 and 2 on the front. */
function doc(): StudyDocument {
  const design = (index: number, cover: number, time: number | null, steer: number, meets = true) => ({
    index,
    design: { cover_fraction: cover },
    objectives: { time_s: time, steering_gust_Nm: steer },
    saved_vs_baseline: { time_s: time === null ? null : 100 - time, steering_gust_Nm: 1 - steer },
    violation: meets ? 0 : 0.2,
    meets_limits: meets,
  });
  const designs = [
    design(0, 0, 99, 1),
    design(1, 0.5, null, 2),
    design(2, 0.3, 95, 1.5),
    design(3, 1, 90, 3, false),
  ];
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
    variables: [{ id: 'cover_fraction', unit: '1', min: 0, max: 1 }],
    optimum: { ...designs[2]! },
    front: {
      handling: { id: 'steering_gust_Nm', label: 'Steering moment', unit: 'N m', description: '' },
      points: [designs[0]!, designs[2]!],
      limit_sweep: [],
    },
    designs,
    cautions: ['be careful'],
  } as unknown as StudyDocument;
}

describe('study view helpers (no DOM)', () => {
  it('rows carry their role: the optimum, the front, the other designs', () => {
    expect(studyRows(doc()).map((r) => r.role)).toEqual(['front', 'design', 'optimum', 'design']);
  });

  it('sorting: numbers in either direction, missing values last both ways, ties in evaluation order', () => {
    const rows = studyRows(doc());
    const col = { key: 'time_s', label: 'Time', unit: 's', from: 'objectives' as const };
    expect(sortRows(rows, col, true).map((r) => r.index)).toEqual([3, 2, 0, 1]);
    expect(sortRows(rows, col, false).map((r) => r.index)).toEqual([0, 2, 3, 1]);
    const cover = { key: 'cover_fraction', label: 'Cover', unit: '1', from: 'design' as const };
    expect(sortRows(rows, cover, true).map((r) => r.index)).toEqual([0, 2, 1, 3]);
    expect(rows.map((r) => r.index)).toEqual([0, 1, 2, 3]);
  });

  it('cell and header text: four significant figures, a dash for missing, units in brackets unless dimensionless', () => {
    expect(cellText(3418.1954707)).toBe('3418');
    expect(cellText(0.31250000001)).toBe('0.3125');
    expect(cellText(null)).toBe('—');
    expect(cellText(1.5e-7)).toBe('1.500e-7');
    expect(headerText('Time', 's')).toBe('Time (s)');
    expect(headerText('Cover fraction', '1')).toBe('Cover fraction');
  });

  it('the nearest point to a click within the radius, else -1', () => {
    const pts = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 3 },
    ];
    expect(nearestPoint(pts, 9, 1, 5)).toBe(1);
    expect(nearestPoint(pts, 10, 2.6, 5)).toBe(2);
    expect(nearestPoint(pts, 50, 50, 5)).toBe(-1);
  });

  it('the trade-off data: designs by increasing handling figure, savings, the front and the optimum, the limit', () => {
    const t = tradeOffData(doc());
    // Design 1 has no time: left out.
    expect(t.indices).toEqual([0, 2, 3]);
    expect(t.data[0]).toEqual([1, 1.5, 3]);
    expect(t.data[1]).toEqual([1, 5, 10]);
    expect(t.data[2]).toEqual([1, 5, null]);
    expect(t.data[3]).toEqual([null, 5, null]);
    expect(t.limit).toBe(2.5);
  });

  it('the table columns: the variables, the objective and limited figures once each, the saving', () => {
    expect(designColumns(doc()).map((c) => `${c.from}:${c.key}`)).toEqual([
      'design:cover_fraction',
      'objectives:time_s',
      'objectives:steering_gust_Nm',
      'saved:time_s',
    ]);
  });
});

describe('optimum summary lines', () => {
  it('the design, the objective with its uncertainty and saving, each limit with its source', () => {
    const d = doc() as unknown as Record<string, unknown>;
    const optimum = d.optimum as Record<string, unknown>;
    optimum.uncertainty = [{ id: 'time_s', absolute: 1.2 }];
    d.feasible = true;
    d.search = { evaluations: 4, lattice_span: 12, lattice_chord: 6 };
    (d.limits as Record<string, unknown>[])[0]!.source = 'the study file (no default)';
    expect(optimumLines(d as unknown as StudyDocument)).toEqual([
      'Optimum: cover fraction 0.3',
      'Time over the ride (s): 95 ± 1.2 (lattice); saved against the baseline: 5',
      'Steering moment (N m): 1.5, limit 2.5: the study file (no default)',
      '4 designs evaluated on a 12 x 6 lattice',
    ]);
  });
});
