import { describe, expect, it } from 'vitest';
import { interpolateTable } from '../../../src/model/sections/interpolateTable';

describe('interpolateTable', () => {
  it('is exact at the nodes, linear between them and held outside (invariants)', () => {
    const xs = [0, 1, 3];
    const ys = [2, 4, 0];
    expect(interpolateTable(xs, ys, 1)).toBe(4);
    expect(interpolateTable(xs, ys, 0.5)).toBe(3);
    expect(interpolateTable(xs, ys, 2)).toBe(2);
    expect(interpolateTable(xs, ys, -5)).toBe(2);
    expect(interpolateTable(xs, ys, 10)).toBe(0);
    expect(() => interpolateTable([0], [1], 0)).toThrow(RangeError);
  });
});
