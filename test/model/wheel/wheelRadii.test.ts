import { describe, expect, it } from 'vitest';
import { DEMO_WHEEL } from '../../../src/model/wheel/defaults';
import { coveredAreaFraction, wheelRadii } from '../../../src/model/wheel/wheelRadii';

// Annulus geometry: area pi (ro^2 - ri^2) (no source needed). Tolerances in units of epsilon.
const tol = 16 * Number.EPSILON;

describe('wheelRadii', () => {
  it('places the regions from the tyre inward', () => {
    const r = wheelRadii(DEMO_WHEEL);
    expect(r.tyreInnerRadiusM).toBeCloseTo(0.334 - 0.025, 15);
    expect(r.rimInnerRadiusM).toBeCloseTo(0.334 - 0.025 - 0.05, 15);
    expect(r.coverOuterRadiusM - r.coverInnerRadiusM).toBe(0);
  });

  it.each(['rim', 'hub', 'centre'] as const)(
    'a %s cover holds the asked fraction of the annulus area',
    (placement) => {
      for (const fraction of [0, 0.25, 0.5, 1]) {
        const r = wheelRadii({ ...DEMO_WHEEL, coverFraction: fraction, coverPlacement: placement });
        const got = coveredAreaFraction(r);
        expect(
          Math.abs(got - fraction),
          `${placement} f=${fraction} got=${got} tol=${tol}`,
        ).toBeLessThanOrEqual(tol);
        expect(r.coverInnerRadiusM).toBeGreaterThanOrEqual(r.hubRadiusM - tol);
        expect(r.coverOuterRadiusM).toBeLessThanOrEqual(r.rimInnerRadiusM + tol);
      }
    },
  );

  it('a rim cover touches the rim, a hub cover the hub', () => {
    const rim = wheelRadii({ ...DEMO_WHEEL, coverFraction: 0.3, coverPlacement: 'rim' });
    expect(rim.coverOuterRadiusM).toBe(rim.rimInnerRadiusM);
    const hub = wheelRadii({ ...DEMO_WHEEL, coverFraction: 0.3, coverPlacement: 'hub' });
    expect(hub.coverInnerRadiusM).toBe(hub.hubRadiusM);
  });

  it('rejects a rim deeper than the wheel and a fraction outside [0, 1], naming the field', () => {
    expect(() => wheelRadii({ ...DEMO_WHEEL, rimDepthM: 0.3 })).toThrow(/rim depth/);
    expect(() => wheelRadii({ ...DEMO_WHEEL, coverFraction: 1.3 })).toThrow(/coverFraction/);
    expect(() => wheelRadii({ ...DEMO_WHEEL, outerRadiusM: -1 })).toThrow(/outerRadiusM/);
  });

  it('rejects explicit radii outside the spoked annulus', () => {
    expect(() =>
      wheelRadii({
        ...DEMO_WHEEL,
        coverPlacement: 'explicit',
        coverInnerRadiusM: 0.01,
        coverOuterRadiusM: 0.2,
      }),
    ).toThrow(/explicit cover radii/);
  });
});
