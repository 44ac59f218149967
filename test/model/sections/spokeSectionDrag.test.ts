import { describe, expect, it } from 'vitest';
import { spokeSectionDrag } from '../../../src/model/sections';

describe('spokeSectionDrag', () => {
  it("round: White's cylinder fit, 1.1 at Re 1000; bladed: Hoerner's elliptic ratio 0.5 at t/c 1/2, Re 1e4", () => {
    // White, Fluid Mechanics ch. 7: 1 + 10 Re^(-2/3) = 1.1 at Re 1e3. Hoerner's elliptic cylinders (White
    // Table 7.2, from memory): t/c = 1/2 has half the circular cylinder's subcritical drag.
    const round = spokeSectionDrag(true, 1000, 1);
    expect(Math.abs(round - 1.1), `got=${round} expected=1.1 tol=1e-12`).toBeLessThanOrEqual(1e-12);
    const ratio = spokeSectionDrag(false, 1e4, 0.5) / spokeSectionDrag(true, 1e4, 1);
    expect(Math.abs(ratio - 0.5), `got=${ratio} expected=0.5 tol=1e-12`).toBeLessThanOrEqual(1e-12);
  });

  it('rejects a Reynolds number that is not finite and > 0', () => {
    expect(() => spokeSectionDrag(true, 0, 1)).toThrow(/reynolds/);
    expect(() => spokeSectionDrag(false, 100, 2)).toThrow(/thicknessToWidth/);
  });
});
