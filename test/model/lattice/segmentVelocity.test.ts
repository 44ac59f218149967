import { describe, expect, it } from 'vitest';
import { segmentVelocity } from '../../../src/model/lattice/segmentVelocity';

const EPS = Number.EPSILON;
const out = new Float64Array(3);

describe('segmentVelocity (Biot-Savart, Katz & Plotkin eq. 10.115)', () => {
  it('gives 2 sqrt(2) Gamma / (pi a) at the centre of a square ring of side a (Katz & Plotkin sec. 2.13, closed form)', () => {
    // Four sides, each at distance a/2 seen under +-45 deg: Gamma/(4 pi a/2) (cos45 + cos45) each.
    const a = 0.7;
    const gamma = 2.5;
    const corners = [
      [0, 0],
      [a, 0],
      [a, a],
      [0, a],
    ];
    let vz = 0;
    for (let i = 0; i < 4; i++) {
      const [ax, ay] = corners[i]!;
      const [bx, by] = corners[(i + 1) % 4]!;
      segmentVelocity(ax!, ay!, 0, bx!, by!, 0, a / 2, a / 2, 0, gamma, out);
      vz += out[2]!;
      expect(Math.abs(out[0]!) + Math.abs(out[1]!), 'in-plane components vanish').toBeLessThanOrEqual(1e-15);
    }
    const expected = (2 * Math.SQRT2 * gamma) / (Math.PI * a);
    const tol = 8 * EPS * expected;
    // Counter-clockwise in the x-y plane: the velocity inside is along +z (right-hand rule).
    expect(Math.abs(vz - expected), `got=${vz} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('tends to the infinite line Gamma / (2 pi h) for a long segment (Katz & Plotkin sec. 2.13)', () => {
    const gamma = 1.3;
    const h = 0.2;
    const halfLength = 1e4;
    segmentVelocity(0, 0, -halfLength, 0, 0, halfLength, h, 0, 0, gamma, out);
    const expected = gamma / (2 * Math.PI * h);
    // Finite length: v = Gamma/(2 pi h) * L / sqrt(L^2 + h^2), relative deficit h^2 / (2 L^2) = 2e-10.
    const tol = 1e-9 * expected;
    // Vortex along +z, point on +x: velocity along +y.
    expect(Math.abs(out[1]! - expected), `got=${out[1]} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
    expect(Math.abs(out[0]!), 'vx').toBe(0);
  });

  it('gives the finite-segment closed form Gamma/(4 pi h)(cos b1 - cos b2) off the segment (Katz & Plotkin eq. 2.68)', () => {
    // Segment from (0,0,0) to (1,0,0), point (0.3, 0.4, 0): cos b1 = 0.3/0.5, cos b2 = -0.7/sqrt(0.65).
    segmentVelocity(0, 0, 0, 1, 0, 0, 0.3, 0.4, 0, 1, out);
    const expected = (1 / (4 * Math.PI * 0.4)) * (0.3 / 0.5 + 0.7 / Math.sqrt(0.65));
    const tol = 8 * EPS * expected;
    expect(Math.abs(out[2]! - expected), `got=${out[2]} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
  });

  it('returns zero on the segment line and for a zero-length segment (core cut-off)', () => {
    segmentVelocity(0, 0, 0, 1, 0, 0, 0.5, 0, 0, 1, out);
    expect([...out], 'on the segment').toEqual([0, 0, 0]);
    segmentVelocity(0, 0, 0, 1, 0, 0, 2, 0, 0, 1, out);
    expect([...out], 'on the extension').toEqual([0, 0, 0]);
    segmentVelocity(1, 1, 1, 1, 1, 1, 0, 0, 0, 1, out);
    expect([...out], 'zero length').toEqual([0, 0, 0]);
  });

  it('checks its output buffer', () => {
    expect(() => segmentVelocity(0, 0, 0, 1, 0, 0, 0, 1, 0, 1, new Float64Array(2))).toThrow(/out.length=2/);
  });
});
