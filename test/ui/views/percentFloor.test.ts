// The percent difference against a reference baseline whose axial drag crosses zero: left empty (NaN)
// where |reference| is below PERCENT_FLOOR_FRACTION of its curve's largest magnitude, finite and exact
// elsewhere. Expected values are worked by hand from the definition 100 (design - ref) / |ref|.
import { describe, expect, it } from 'vitest';
import type { PointResult } from '../../../src/compute/study/modelResults';
import { defaultCase } from '../../../src/ui/defaultCase';
import { OUTPUTS } from '../../../src/ui/outputs';
import { defaultView } from '../../../src/ui/viewState';
import { compared, PERCENT_FLOOR_FRACTION, type Present } from '../../../src/ui/views/present';

const point = (axialN: number) => ({ axialN, airspeedMps: 13.9 }) as PointResult;

function ctxWith(reference: number[]): Present {
  return {
    state: { case: defaultCase(), view: defaultView(), baseline: null },
    units: { speed: 'kmh', force: 'N', area: 'cm2', referenceSpeedMps: 13.9 },
    mode: 'percent',
    referenceCurve: reference.map(point),
  };
}

describe('percent difference against a reference crossing zero', () => {
  it('is exact where the reference is clear of zero and empty within the floor', () => {
    expect(PERCENT_FLOOR_FRACTION).toBe(0.05);
    const ref = [1.0, 0.5, 0.02, -0.3];
    const design = [1.1, 0.6, 0.1, -0.2];
    const ctx = ctxWith(ref);
    const got = design.map((d, i) => compared(ctx, OUTPUTS.axial, point(d), point(ref[i]!), 'percent'));
    // 100 (1.1 - 1) / 1 = 10; 100 (0.6 - 0.5) / 0.5 = 20; |0.02| < 0.05 x 1.0: empty; 100 (0.1) / 0.3.
    const expected = [10, 20, Number.NaN, 100 / 3];
    got.forEach((g, i) => {
      if (Number.isNaN(expected[i]!))
        expect(g, `point ${i}: ref ${ref[i]}, got ${g}, expected empty`).toBeNaN();
      else
        expect(
          Math.abs(g - expected[i]!),
          `point ${i}: got ${g}, expected ${expected[i]} +- 1e-9`,
        ).toBeLessThan(1e-9);
    });
  });

  it('stays bounded across a zero crossing sampled finely (no spike)', () => {
    // A reference falling linearly through zero, sampled so some points land within 1e-6 of it.
    const ref = Array.from({ length: 401 }, (_, i) => 0.8 - i * 0.004);
    const ctx = ctxWith(ref);
    const largest = 0.8;
    for (let i = 0; i < ref.length; i++) {
      const p = ref[i]! + 0.05;
      const g = compared(ctx, OUTPUTS.axial, point(p), point(ref[i]!), 'percent');
      // Where drawn, |ref| >= 0.05 x 0.8 = 0.04, so |100 x 0.05 / ref| <= 125 %.
      if (Number.isNaN(g)) expect(Math.abs(ref[i]!), `ref ${ref[i]} left empty`).toBeLessThan(0.05 * largest);
      else expect(Math.abs(g), `ref ${ref[i]}, got ${g} %, bound 125 %`).toBeLessThanOrEqual(125 + 1e-9);
    }
  });
});
