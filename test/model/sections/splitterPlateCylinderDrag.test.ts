import { describe, expect, it } from 'vitest';
import { splitterPlateCylinderDrag } from '../../../src/model/sections/splitterPlateCylinderDrag';

describe('splitterPlateCylinderDrag', () => {
  it('follows the cylinder-with-splitter-plate data', () => {
    // Reference: Apelt, West & Szewczyk 1973, J. Fluid Mech. 61:187 (L/D <= 2) and Apelt & West 1975,
    // J. Fluid Mech. 71:145 (L/D to 7), Re 1e4..5e4; values read from memory of their curves, so the
    // tolerance is their reading uncertainty, 0.06 absolute.
    const CASES = [
      { ratio: 0, exp: 1.15 },
      { ratio: 1, exp: 0.77 },
      { ratio: 2, exp: 0.64 },
      { ratio: 5, exp: 0.6 },
    ];
    for (const c of CASES) {
      const got = splitterPlateCylinderDrag(c.ratio);
      const tol = 0.06;
      expect(
        Math.abs(got - c.exp),
        `L/D=${c.ratio} got=${got} expected=${c.exp} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('falls monotonically with plate length and is held beyond the data (invariant)', () => {
    let last = Number.POSITIVE_INFINITY;
    for (let r = 0; r <= 10; r += 0.25) {
      const cd = splitterPlateCylinderDrag(r);
      expect(cd, `L/D=${r} got=${cd} previous=${last}`).toBeLessThanOrEqual(last);
      last = cd;
    }
    expect(splitterPlateCylinderDrag(Number.POSITIVE_INFINITY)).toBe(splitterPlateCylinderDrag(7));
  });

  it('checks its argument', () => {
    expect(() => splitterPlateCylinderDrag(-1)).toThrow(RangeError);
    expect(() => splitterPlateCylinderDrag(Number.NaN)).toThrow(RangeError);
  });
});
