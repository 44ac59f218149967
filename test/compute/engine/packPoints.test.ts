import { describe, expect, it } from 'vitest';
import { POINT_COLUMN_COUNT, packPoints, unpackPoints } from '../../../src/compute/engine/packPoints';
import { solveWheel } from '../../../src/model/wheel';
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

  it('rejects a buffer of the wrong length', () => {
    expect(() => unpackPoints(new Float64Array(3), 1)).toThrow(RangeError);
  });
});
