import { describe, expect, it } from 'vitest';
import { tandemDragRatio } from '../../../src/model/sections';

describe('tandemDragRatio', () => {
  it('puts a cylinder 10 diameters behind another at 0.4..0.75 of its single drag', () => {
    // Tandem circular cylinders at subcritical Re, co-shedding regime: M. M. Zdravkovich (1977), J. Fluids
    // Eng. 99, 618 (review; Biermann & Herrnstein's data), and D. Sumner (2010), J. Fluids Struct. 26, 849:
    // the downstream cylinder's drag at L/d = 10 is roughly half the single value, recovering only over
    // tens of diameters (read from memory: 0.4..0.75 of the single cylinder).
    const d = 0.01;
    const got = tandemDragRatio(10 * d, 0, 1.2 * d, d);
    expect(got, `L/d=10 Cd=1.2 got=${got} expected 0.4..0.75`).toBeGreaterThanOrEqual(0.4);
    expect(got, `L/d=10 Cd=1.2 got=${got} expected 0.4..0.75`).toBeLessThanOrEqual(0.75);
    // ... and recovers monotonically with spacing (same sources).
    const far = tandemDragRatio(40 * d, 0, 1.2 * d, d);
    expect(far).toBeGreaterThan(got);
    expect(far).toBeLessThan(1);
  });

  it('is 1 off the wake (beyond 4 half-value widths) and even in the offset', () => {
    // Schlichting's plane-wake profile exp(-ln 2 (y / b_1/2)^2), b_1/2 = 0.25 (x Cd d)^(1/2): four
    // half-value widths off the centre line the deficit is 1.5e-5 of its centre value (neglected).
    const d = 0.002;
    const bHalf = 0.25 * Math.sqrt(0.05 * 1.1 * d);
    expect(tandemDragRatio(0.05, 4 * bHalf + 0.5 * d, 1.1 * d, d)).toBe(1);
    const near = tandemDragRatio(0.05, 3.9 * bHalf + 0.5 * d, 1.1 * d, d);
    expect(1 - near, `just inside: ${near}`).toBeLessThan(1e-4);
    expect(tandemDragRatio(0.05, 0.3 * bHalf, 1.1 * d, d)).toBe(
      tandemDragRatio(0.05, -0.3 * bHalf, 1.1 * d, d),
    );
    expect(tandemDragRatio(0.05, 1.5 * bHalf, 1.1 * d, d)).toBeGreaterThan(
      tandemDragRatio(0.05, 0, 1.1 * d, d),
    );
  });

  it('rejects bad input naming the argument', () => {
    expect(() => tandemDragRatio(0, 0, 1, 1)).toThrow(/distanceM/);
    expect(() => tandemDragRatio(1, Number.NaN, 1, 1)).toThrow(/offsetM/);
    expect(() => tandemDragRatio(1, 0, -1, 1)).toThrow(/dragLengthM/);
    expect(() => tandemDragRatio(1, 0, 1, 0)).toThrow(/followerWidthM/);
  });

  it('on the centre line gives the bits of the two-point mean it shortens', () => {
    // The law as written before the centre-line shortcut: 2-point Gauss-Legendre mean of (1 - u1/U)^2
    // over the follower's width with Schlichting's plane wake (0.98, 0.25, Gaussian); exact equality.
    const mean = (x: number, cdL: number, w: number) => {
      const root = Math.sqrt(x * cdL);
      const centre = (0.98 * cdL) / root;
      const b = 0.25 * root;
      const h = 0.5 * w * (1 / Math.sqrt(3));
      const share = (y: number) => {
        const eta = y / b;
        const u = 1 - Math.min(1, centre * Math.exp(-Math.LN2 * eta * eta));
        return u * u;
      };
      return 0.5 * (share(0 - h) + share(0 + h));
    };
    for (const [x, cdL, w] of [
      [0.1, 0.012, 0.01],
      [0.05, 0.0022, 0.002],
      [0.004, 0.0024, 0.002],
      [2, 1e-4, 0.001],
    ] as const) {
      const got = tandemDragRatio(x, 0, cdL, w);
      const expected = mean(x, cdL, w);
      expect(Object.is(got, expected), `x=${x} CdL=${cdL} w=${w} got=${got} expected=${expected} tol=0`).toBe(
        true,
      );
    }
  });
});
