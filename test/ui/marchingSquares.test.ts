// Marching squares (Lorensen & Cline 1987, 2-D form): crossing points by linear interpolation along
// cell edges. For a linear field the contour is exact, so segments must lie on the true line to a few
// epsilon of the grid coordinates.
import { describe, expect, it } from 'vitest';
import { marchingSquares, niceLevels } from '../../src/ui/marchingSquares';

const EPS = Number.EPSILON;

describe('marchingSquares', () => {
  it('traces the exact line of a linear field (f = x + 2y, level 3.3)', () => {
    const nx = 5;
    const ny = 4;
    const v = new Float64Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) v[j * nx + i] = i + 2 * j;
    const level = 3.3;
    const segs = marchingSquares(v, nx, ny, level);
    expect(segs.length % 4).toBe(0);
    expect(segs.length).toBeGreaterThan(0);
    const tol = 8 * EPS * 10;
    for (let s = 0; s < segs.length; s += 2) {
      const got = segs[s]! + 2 * segs[s + 1]!;
      expect(
        Math.abs(got - level),
        `point ${segs[s]},${segs[s + 1]} got=${got} expected=${level} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('closes a ring around a single peak (one segment per crossed cell)', () => {
    const nx = 3;
    const ny = 3;
    const v = [0, 0, 0, 0, 1, 0, 0, 0, 0];
    const segs = marchingSquares(v, nx, ny, 0.5);
    expect(segs.length / 4).toBe(4);
    // Each crossing is halfway along an edge leaving the centre.
    const points = new Set<string>();
    for (let s = 0; s < segs.length; s += 2) points.add(`${segs[s]},${segs[s + 1]}`);
    expect([...points].sort()).toEqual(['0.5,1', '1,0.5', '1,1.5', '1.5,1'].sort());
  });

  it('resolves saddles by the cell average and skips NaN cells', () => {
    // Saddle: corners a, c high, b, d low; average above the level joins a and c.
    const high = marchingSquares([1, 0, 0, 1], 2, 2, 0.4); // a=1 b=0 c=1 (j=1,i=1) d=0 (j=1,i=0)
    expect(high.length / 4).toBe(2);
    const low = marchingSquares([1, 0, 0, 1], 2, 2, 0.6);
    expect(low.length / 4).toBe(2);
    expect(high).not.toEqual(low);
    expect(marchingSquares([Number.NaN, 0, 1, 1], 2, 2, 0.5)).toEqual([]);
  });

  it('checks its arguments', () => {
    expect(() => marchingSquares([1, 2, 3], 2, 2, 0)).toThrow(RangeError);
    expect(() => marchingSquares([1, 2], 1, 2, 0)).toThrow(/nx=1/);
    expect(() => marchingSquares([1, 2, 3, 4], 2, 2, Number.NaN)).toThrow(/level=NaN/);
  });
});

describe('niceLevels (common practice, no source)', () => {
  it('steps by 1, 2, 2.5 or 5 times a power of ten, nearest the count asked for', () => {
    expect(niceLevels(0, 1, 5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceLevels(7.3, 19.9, 6)).toEqual([8, 10, 12, 14, 16, 18]);
    expect(niceLevels(7.3, 19.9, 5)).toEqual([7.5, 10, 12.5, 15, 17.5]);
    expect(niceLevels(-0.031, 0.012, 4)).toEqual([-0.03, -0.02, -0.01, 0, 0.01]);
    expect(niceLevels(1, 1)).toEqual([]);
    expect(niceLevels(Number.NaN, 1)).toEqual([]);
  });
});
