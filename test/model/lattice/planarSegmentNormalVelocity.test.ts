import { describe, expect, it } from 'vitest';
import { planarSegmentNormalVelocity } from '../../../src/model/lattice/planarSegmentNormalVelocity';
import { segmentVelocity } from '../../../src/model/lattice/segmentVelocity';

const out = new Float64Array(3);

describe('planarSegmentNormalVelocity', () => {
  it('equals the y component of the 3-D Biot-Savart segment law for coplanar points (Katz & Plotkin eq. 10.115)', () => {
    const cases = [
      [0, 0, 0, 1, 0.3, 0.4],
      [0.2, -0.1, -0.3, 0.5, -1, 2],
      [1, 1, 1, 1.5, 0.2, 1.2],
      [0, 0, 1e-3, 0, 1e-3, 5e-4],
    ];
    for (const [ax, az, bx, bz, px, pz] of cases) {
      const got = planarSegmentNormalVelocity(ax!, az!, bx!, bz!, px!, pz!);
      segmentVelocity(ax!, 0, az!, bx!, 0, bz!, px!, 0, pz!, 1, out);
      const tol = 16 * Number.EPSILON * Math.abs(out[1]!);
      expect(
        Math.abs(got - out[1]!),
        `case=${[ax, az, bx, bz, px, pz]} got=${got} expected=${out[1]} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('returns zero on the segment line', () => {
    expect(planarSegmentNormalVelocity(0, 0, 1, 1, 0.5, 0.5)).toBe(0);
    expect(planarSegmentNormalVelocity(0, 0, 0, 0, 0.5, 0.5)).toBe(0);
  });
});
