import { describe, expect, it } from 'vitest';
import { sutherlandViscosity } from '../../../src/model/air';
import { buildWheelLattice } from '../../../src/model/lattice';
import { cylinderDrag, tandemDragRatio } from '../../../src/model/sections';
import {
  DEMO_WHEEL,
  openAnnuli,
  panelOpenness,
  screenOpenness,
  spokeScreenForceLengthM,
  spokeScreenResistance,
  type WheelGeometry,
  wheelRadii,
} from '../../../src/model/wheel';

describe('spokeScreenResistance', () => {
  it('matches the crossflow-principle rule worked by hand', () => {
    // K = N (Cd d) / (2 pi r) * <|a + sin|>, a = omega r / V; here N 20, Cd d = 1.2 x 2 mm, r 0.15 m,
    // a 0.45: solidity 20 * 0.0024 / (2 pi 0.15) = 0.0509296; mean (2/pi)(sqrt(1 - a^2) + a asin a)
    // = 0.636620 * (0.893029 + 0.210047) = 0.702243; K = 0.0357647 (derivation in spokeScreen.ts).
    const got = spokeScreenResistance(0.15, 20, 1.2 * 0.002, 0.45, 1);
    const expected = 0.0357647;
    const tol = 1e-6;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
    expect(spokeScreenResistance(0.15, 20, 1.2 * 0.002, 0.45, 2)).toBeCloseTo(2 * got, 14);
    expect(spokeScreenResistance(0.15, 0, 0.0024, 0.45, 1)).toBe(0);
  });

  it('openness of a linear screen: o = 2 / (K + 2)', () => {
    expect(screenOpenness(0)).toBe(1);
    expect(screenOpenness(2)).toBe(0.5);
    expect(screenOpenness(1e12)).toBeLessThan(1e-11);
    expect(() => screenOpenness(-1)).toThrow(RangeError);
  });
});

describe('spokeScreenForceLengthM', () => {
  // Independent evaluation: White's cylinder fit at the reference Reynolds number (40 km/h, ISA sea
  // level, mean crossing speed V <|a + sin|>) and the wake of the spoke ahead on its centreline
  // (Schlichting's plane wake via tandemDragRatio), iterated to convergence.
  const nu = sutherlandViscosity(288.15) / 1.225;
  const reference = (d: number, count: number, r: number, a: number) => {
    const speed = ((40 / 3.6) * 2 * (Math.sqrt(1 - a * a) + a * Math.asin(a))) / Math.PI;
    const s = (2 * Math.PI * r) / count;
    let shielded = speed;
    let value = 0;
    for (let i = 0; i < 40; i++) {
      const cd = cylinderDrag((shielded * d) / nu);
      const ratio = tandemDragRatio(s, 0, cd * d, d);
      value = cd * d * ratio;
      shielded = speed * Math.sqrt(ratio);
    }
    return value;
  };

  it('round: the loads’ section law at the reference Reynolds number, shielded by the wake ahead', () => {
    for (const [count, r, a] of [
      [20, 0.15, 0.45],
      [32, 0.3, 0.9],
      [36, 0.03, 0.1],
    ] as const) {
      const wheel = { ...DEMO_WHEEL, spokeCount: count };
      const got = spokeScreenForceLengthM(wheel, r, a);
      const expected = reference(wheel.spokeDiameterM, count, r, a);
      const tol = 3e-3 * expected; // two fixed-point steps against forty
      expect(
        Math.abs(got - expected),
        `N=${count} r=${r} a=${a} got=${got} expected=${expected} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('has no spokes, no screen; rejects a radius that is not > 0', () => {
    expect(spokeScreenForceLengthM({ ...DEMO_WHEEL, spokeCount: 0 }, 0.1, 0.5)).toBe(0);
    expect(() => spokeScreenForceLengthM(DEMO_WHEEL, 0, 0.5)).toThrow(/radiusM/);
  });
});

describe('panelOpenness', () => {
  const latticeFor = (wheel: WheelGeometry) =>
    buildWheelLattice({
      radiusM: wheel.outerRadiusM,
      spanCount: 16,
      chordCount: 12,
      ground: false,
      openAnnuliM: openAnnuli(wheelRadii(wheel)),
    });
  // Open area as a fraction of the disc's area pi R^2.
  const openArea = (lattice: ReturnType<typeof latticeFor>, o: Float64Array) => {
    let a = 0;
    for (let p = 0; p < o.length; p++) a += o[p]! * lattice.areaM2[p]!;
    return a / lattice.referenceAreaM2;
  };

  it('closes every panel of a full disc', () => {
    const wheel = { ...DEMO_WHEEL, coverFraction: 1 };
    const o = panelOpenness(latticeFor(wheel), wheel, wheelRadii(wheel), 1, 1);
    expect(Math.max(...o)).toBeLessThan(1e-12);
  });

  it('without spokes opens the whole centre: open area = (rim inner radius / R)^2 (geometry)', () => {
    const wheel = { ...DEMO_WHEEL, spokeCount: 0 };
    const r = wheelRadii(wheel);
    const lattice = latticeFor(wheel);
    const got = openArea(lattice, panelOpenness(lattice, wheel, r, 1, 1));
    const expected = r.rimInnerRadiusM ** 2 / r.outerRadiusM ** 2;
    // Panels follow the region circles as polygons: the area error is second order in the panel size.
    const tol = 0.01;
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('closes the open area in proportion to the cover fraction', () => {
    const values = [0, 0.5, 1].map((coverFraction) => {
      const wheel = { ...DEMO_WHEEL, spokeCount: 0, coverFraction };
      const lattice = latticeFor(wheel);
      return openArea(lattice, panelOpenness(lattice, wheel, wheelRadii(wheel), 1, 1));
    });
    expect(Math.abs(values[1]! - values[0]! / 2)).toBeLessThan(0.02); // polygonal circles, 16 strips
    expect(values[2]!).toBeLessThan(1e-12);
  });
});
