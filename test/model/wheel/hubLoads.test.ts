import { describe, expect, it } from 'vitest';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { emptyLoads } from '../../../src/model/wheel/componentLoads';
import { hubEnclosed, hubLoads } from '../../../src/model/wheel/hubLoads';

describe('hubLoads', () => {
  it('is the drag of a finite cylinder with free ends, 0.5 rho V^2 Cd(L/D) d L', () => {
    // Reference: White, Fluid Mechanics Table 7.2 (Wieselsberger; from memory): Cd = 0.68 at L/D = 2.
    const wheel = { ...DEMO_WHEEL, hubShellDiameterM: 0.04, hubShellWidthM: 0.08 };
    const out = emptyLoads();
    const V = 10;
    hubLoads(
      wheel,
      wheelRadii(wheel),
      { airspeedMps: V, yawRad: 0, groundSpeedMps: V, rhoKgPerM3: 1.2, muPaS: 1.8e-5 },
      DEFAULT_MODEL_OPTIONS,
      out,
    );
    const exp = -0.5 * 1.2 * V * V * 0.68 * 0.04 * 0.08;
    expect(Math.abs(out.fxN - exp), `got=${out.fxN} expected=${exp}`).toBeLessThanOrEqual(1e-12);
    expect(out.mzNm).toBe(0);
  });

  it('vanishes when covers on both sides reach the hub, not with one side or a rim cover', () => {
    const disc = { ...DEMO_WHEEL, coverFraction: 1, coverSides: 2 as const };
    expect(hubEnclosed(disc, wheelRadii(disc))).toBe(true);
    const oneSide = { ...disc, coverSides: 1 as const };
    expect(hubEnclosed(oneSide, wheelRadii(oneSide))).toBe(false);
    const rimCover = { ...disc, coverFraction: 0.5 };
    expect(hubEnclosed(rimCover, wheelRadii(rimCover))).toBe(false);
    const out = emptyLoads();
    hubLoads(
      disc,
      wheelRadii(disc),
      { airspeedMps: 10, yawRad: 0, groundSpeedMps: 10, rhoKgPerM3: 1.2, muPaS: 1.8e-5 },
      DEFAULT_MODEL_OPTIONS,
      out,
    );
    expect(out.fxN).toBe(0);
  });
});
