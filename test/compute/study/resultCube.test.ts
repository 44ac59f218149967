import { describe, expect, it } from 'vitest';
import { COLUMN_COUNT, COLUMN_NAMES, columnIndex } from '../../../src/compute/engine/columns';
import { ResultCube } from '../../../src/compute/study/resultCube';
import type { StudyAxis } from '../../../src/compute/study/studyPlan';

// Invariants of a row-major strided view (the layout of scijs ndarray; common practice, no source):
// cell (i0, i1, ..., column c) sits at ((i0 * n1 + i1) * ...) * COLUMN_COUNT + c of the buffer.
const axes: StudyAxis[] = [
  { name: 'rimDepth', unit: 'm', values: [0.03, 0.06, 0.09] },
  { name: 'coverFraction', unit: '1', values: [0, 0.5] },
  { name: 'yaw', unit: 'deg', values: [0, 5, 10, 15] },
];
const n = 3 * 2 * 4;
const data = Float64Array.from({ length: n * COLUMN_COUNT }, (_, i) => i);
const cube = ResultCube.fromPacked(axes, data);
const at = (d: number, f: number, y: number, column: string) =>
  ((d * 2 + f) * 4 + y) * COLUMN_COUNT + columnIndex(column);

describe('ResultCube', () => {
  it('reads a cell by axis name as the row-major offset', () => {
    for (let d = 0; d < 3; d++)
      for (let f = 0; f < 2; f++)
        for (let y = 0; y < 4; y++) {
          const got = cube.pick({ rimDepth: d, coverFraction: f, yaw: y }).column('sideN').value();
          expect(got, `d ${d} f ${f} y ${y}`).toBe(at(d, f, y, 'sideN'));
        }
  });
  it('picks in any order and keeps the other axes, over the same buffer (no copy)', () => {
    const a = cube.pick({ yaw: 2 }).pick({ rimDepth: 1 });
    const b = cube.pick({ rimDepth: 1, yaw: 2 });
    expect(a.axes.map((x) => x.name)).toEqual(['coverFraction']);
    expect(a.column('axialN').values()).toEqual(b.column('axialN').values());
    expect(a.data).toBe(data);
    expect([...a.column('axialN').values()]).toEqual([at(1, 0, 2, 'axialN'), at(1, 1, 2, 'axialN')]);
  });
  it('gives a column over the remaining axes row-major, and a cell row as a subarray', () => {
    const v = cube.pick({ coverFraction: 1 }).column('powerW').values();
    expect(v.length).toBe(12);
    expect(v[7]).toBe(at(1, 1, 3, 'powerW'));
    const row = cube.pick({ rimDepth: 2, coverFraction: 0, yaw: 1 }).row();
    expect(row.buffer).toBe(data.buffer);
    expect(row[0]).toBe(at(2, 0, 1, COLUMN_NAMES[0]!));
    expect(row.length).toBe(COLUMN_COUNT);
  });
  it("reads a column by its result document's name too (axial_N is axialN)", () => {
    const a = cube.pick({ rimDepth: 2, coverFraction: 1, yaw: 3 });
    expect(a.column('axial_N').value()).toBe(a.column('axialN').value());
    expect(a.column('steering_moment_Nm').value()).toBe(at(2, 1, 3, 'steeringMomentNm'));
  });
  it('finds the nearest axis value', () => {
    expect(cube.nearest('yaw', 6)).toBe(1);
    expect(cube.nearest('yaw', 100)).toBe(3);
  });
  it('refuses unknown axes, out-of-range indices, unknown columns and a wrong buffer size, naming them', () => {
    expect(() => cube.pick({ speed: 0 })).toThrow(
      /axis "speed" is not an axis of this cube \(axes: rimDepth/,
    );
    expect(() => cube.pick({ yaw: 4 })).toThrow(/yaw: index must be an integer from 0 to 3, got 4/);
    expect(() => cube.column('drag')).toThrow(/column "drag" is not a result column/);
    expect(() => cube.pick({ yaw: 0 }).column('axialN').value()).toThrow(/pick every axis/);
    expect(() => ResultCube.fromPacked(axes, new Float64Array(5))).toThrow(/5 values do not fill/);
  });
});
