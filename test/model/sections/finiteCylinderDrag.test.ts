import { describe, expect, it } from 'vitest';
import { finiteCylinderDrag } from '../../../src/model/sections/finiteCylinderDrag';

describe('finiteCylinderDrag', () => {
  it('reproduces the finite-cylinder table', () => {
    // Reference: Wieselsberger's data as tabulated in F. M. White, Fluid Mechanics, Table 7.2 (from
    // memory): L/D 1: 0.64, 2: 0.68, 5: 0.74, 10: 0.82, 40: 0.98. The table's own values: 1e-12.
    const CASES = [
      { ratio: 1, exp: 0.64 },
      { ratio: 2, exp: 0.68 },
      { ratio: 5, exp: 0.74 },
      { ratio: 10, exp: 0.82 },
      { ratio: 40, exp: 0.98 },
    ];
    for (const c of CASES) {
      const got = finiteCylinderDrag(c.ratio);
      expect(Math.abs(got - c.exp), `L/D=${c.ratio} got=${got} expected=${c.exp}`).toBeLessThanOrEqual(1e-12);
    }
  });

  it('tends to the 2-D cylinder value 1.20 for a very long cylinder (Hoerner ch. 3, from memory)', () => {
    const got = finiteCylinderDrag(1e9);
    expect(Math.abs(got - 1.2), `got=${got} expected=1.2`).toBeLessThanOrEqual(1e-6);
  });

  it('rises monotonically with length (invariant) and checks its argument', () => {
    let last = 0;
    for (let r = 0.5; r < 200; r *= 1.3) {
      const cd = finiteCylinderDrag(r);
      expect(cd, `L/D=${r}`).toBeGreaterThanOrEqual(last);
      last = cd;
    }
    expect(() => finiteCylinderDrag(0)).toThrow(RangeError);
  });
});
