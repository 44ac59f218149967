import { describe, expect, it } from 'vitest';
import { COLUMN_NAMES, COMPONENT_FIELDS, SCALAR_COLUMNS } from '../../../src/compute/engine/columns';
import {
  FLAG_CODES,
  POINT_COLUMN_COUNT,
  packPoints,
  unpackPoints,
} from '../../../src/compute/engine/packPoints';
import { COMPONENT_NAMES, type PointResult, solveWheel } from '../../../src/model/wheel';
import { smallSweep } from './fixtures';

describe('packPoints / unpackPoints', () => {
  it('round-trips every output bit-exactly, flags included', () => {
    const input = smallSweep([0.5], [0.05])[0]!;
    input.points.push({ ...input.points[0]!, yawRad: (40 * Math.PI) / 180 }); // raises a validity flag
    const solution = solveWheel(input);
    const packed = packPoints(solution.points);
    expect(packed.length).toBe(solution.points.length * POINT_COLUMN_COUNT);
    const back = unpackPoints(packed, solution.points.length);
    expect(back).toEqual(solution.points);
    expect(back[back.length - 1]!.flags).toContain('yaw_beyond_range');
  });

  it('puts every field at its column of the column table (columns.ts)', () => {
    // A synthetic point whose every number is distinct: its column's name's position, plus 0.5.
    const at = (name: string) => COLUMN_NAMES.indexOf(name) + 0.5;
    const point = { flags: [FLAG_CODES[1]!, FLAG_CODES[3]!], components: {} } as Record<string, unknown>;
    for (const key of SCALAR_COLUMNS) point[key] = at(key);
    for (const c of COMPONENT_NAMES) {
      const loads = {} as Record<string, number>;
      for (const f of COMPONENT_FIELDS) loads[f] = at(`${c}.${f}`);
      (point.components as Record<string, unknown>)[c] = loads;
    }
    const packed = packPoints([point as unknown as PointResult]);
    COLUMN_NAMES.forEach((name, i) => {
      const expected = name === 'flagBits' ? 0b1010 : i + 0.5;
      expect(packed[i], `column ${i} ${name}`).toBe(expected);
    });
  });

  it('rejects a buffer of the wrong length', () => {
    expect(() => unpackPoints(new Float64Array(3), 1)).toThrow(RangeError);
  });
});
