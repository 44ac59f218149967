import { describe, expect, it } from 'vitest';
import { planarWakeNormalVelocity } from '../../../src/model/lattice/planarWakeNormalVelocity';
import { semiInfiniteSegmentVelocity } from '../../../src/model/lattice/semiInfiniteSegmentVelocity';

const out = new Float64Array(3);

describe('planarWakeNormalVelocity', () => {
  it('equals the y component of the semi-infinite vortex along -x (Katz & Plotkin sec. 2.13)', () => {
    for (const [ax, az, px, pz] of [
      [0, 0, 0.3, 0.4],
      [0.5, -0.2, -3, 0.1],
      [-1, 1, 2, -2],
    ]) {
      const got = planarWakeNormalVelocity(ax!, az!, px!, pz!);
      semiInfiniteSegmentVelocity(ax!, 0, az!, -1, 0, 0, px!, 0, pz!, 1, out);
      const tol = 8 * Number.EPSILON * Math.abs(out[1]!);
      expect(
        Math.abs(got - out[1]!),
        `A=(${ax},${az}) P=(${px},${pz}) got=${got} expected=${out[1]} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('gives 1 / (4 pi h) abreast of the start and 1 / (2 pi h) far downstream (closed forms)', () => {
    const h = 0.25;
    const abreast = planarWakeNormalVelocity(0, 0, 0, h);
    const e1 = 1 / (4 * Math.PI * h);
    expect(Math.abs(abreast - e1), `got=${abreast} expected=${e1}`).toBeLessThanOrEqual(
      4 * Number.EPSILON * e1,
    );
    const far = planarWakeNormalVelocity(0, 0, -1e5, h);
    const e2 = 1 / (2 * Math.PI * h);
    expect(Math.abs(far - e2), `got=${far} expected=${e2}`).toBeLessThanOrEqual(1e-9 * e2);
  });
});
