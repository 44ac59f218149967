import { describe, expect, it } from 'vitest';
import {
  DEFAULT_MODEL_OPTIONS,
  DEFAULT_STEERING,
  DEMO_WHEEL,
  type FlowConditions,
  type ModelOptions,
  solveWheel,
  type WheelGeometry,
} from '../../../src/model/wheel';

const deg = Math.PI / 180;
const coarse: ModelOptions = {
  ...DEFAULT_MODEL_OPTIONS,
  latticeSpanCount: 12,
  latticeChordCount: 8,
  gridConvergence: false,
};
const point = (yawDeg: number, v = 13.41, rho = 1.225): FlowConditions => ({
  airspeedMps: v,
  yawRad: yawDeg * deg,
  groundSpeedMps: v,
  rhoKgPerM3: rho,
  muPaS: 1.79e-5,
});
const solve = (wheel: WheelGeometry, points: FlowConditions[], options = coarse) =>
  solveWheel({ wheel, options, steering: DEFAULT_STEERING, points });

describe('solveWheel', () => {
  it('is mirror-symmetric: yaw -> -yaw flips side force and moments, keeps axial force and torque', () => {
    // Geometry and flow are mirror images about the wheel plane (symmetry; no source needed).
    const wheel = { ...DEMO_WHEEL, coverFraction: 0.6 };
    const [a, b] = solve(wheel, [point(12), point(-12)]).points;
    const tol = 1e-12;
    for (const key of [
      'axialN',
      'axleTorqueNm',
      'powerW',
      'verticalN',
      'windDragN',
      'cpXM',
      'cpZM',
    ] as const) {
      expect(Math.abs(a![key] - b![key]), `${key}: ${a![key]} vs ${b![key]}`).toBeLessThanOrEqual(
        tol * Math.max(1, Math.abs(a![key])),
      );
    }
    for (const key of ['sideN', 'yawMomentNm', 'rollMomentNm', 'steeringMomentNm', 'windLiftN'] as const) {
      expect(Math.abs(a![key] + b![key]), `${key}: ${a![key]} vs ${b![key]}`).toBeLessThanOrEqual(
        tol * Math.max(1, Math.abs(a![key])),
      );
    }
  });

  it('makes no side force at zero yaw', () => {
    const [p] = solve({ ...DEMO_WHEEL, coverFraction: 1 }, [point(0)]).points;
    expect(Math.abs(p!.sideN)).toBeLessThan(1e-12);
    expect(Number.isNaN(p!.cpXM)).toBe(true);
  });

  it('lifting-surface loads scale exactly with dynamic pressure; the whole wheel nearly so', () => {
    // Potential-flow loads are proportional to rho V^2 (Katz & Plotkin, linear theory). Section and
    // friction drag scale with q times a Reynolds-number factor that changes slowly (Hoerner).
    const wheel = { ...DEMO_WHEEL, coverFraction: 0.5 };
    const [slow, fast, dense, slow0, fast0] = solve(wheel, [
      point(10, 8),
      point(10, 16),
      point(10, 8, 1.0),
      point(0, 8),
      point(0, 16),
    ]).points;
    const ratioV = 4;
    expect(fast!.components.surface.fyN / slow!.components.surface.fyN).toBeCloseTo(ratioV, 12);
    expect(fast!.components.vortex.fyN / slow!.components.vortex.fyN).toBeCloseTo(ratioV, 12);
    expect(slow!.components.surface.fyN / dense!.components.surface.fyN).toBeCloseTo(1.225, 12);
    // Head-on (at yaw the axial force is a small difference of thrust and drag: no clean scaling).
    const axialRatio = fast0!.axialN / slow0!.axialN;
    expect(Math.abs(axialRatio / ratioV - 1), `axial ratio ${axialRatio}`).toBeLessThan(0.15);
    expect(Math.abs(fast!.sideN / slow!.sideN / ratioV - 1)).toBeLessThan(0.01);
  });

  it('sums its components, and power is axial force x ground speed + torque x omega', () => {
    const [p] = solve({ ...DEMO_WHEEL, coverFraction: 0.3 }, [point(8)]).points;
    const parts = Object.values(p!.components);
    const sum = (f: (c: (typeof parts)[number]) => number) => parts.reduce((s, c) => s + f(c), 0);
    expect(p!.axialN).toBeCloseTo(-sum((c) => c.fxN), 12);
    expect(p!.sideN).toBeCloseTo(
      sum((c) => c.fyN),
      12,
    );
    expect(p!.axleTorqueNm).toBeCloseTo(
      sum((c) => c.axleTorqueNm),
      12,
    );
    const omega = p!.groundSpeedMps / DEMO_WHEEL.outerRadiusM;
    expect(p!.powerW).toBeCloseTo(p!.axialN * p!.groundSpeedMps + p!.axleTorqueNm * omega, 10);
    expect(p!.cdaAxialM2).toBeCloseTo(p!.axialN / (0.5 * 1.225 * 13.41 ** 2), 12);
  });

  it('turns drag and lift into wind axes by a rotation through the yaw angle', () => {
    const [p] = solve({ ...DEMO_WHEEL, coverFraction: 1 }, [point(15)]).points;
    const b = 15 * deg;
    // Force magnitude is the same in both axes.
    const body = Math.hypot(p!.axialN, p!.sideN);
    const wind = Math.hypot(p!.windDragN, p!.windLiftN);
    expect(wind).toBeCloseTo(body, 12);
    expect(p!.windDragN).toBeCloseTo(p!.axialN * Math.cos(b) + p!.sideN * Math.sin(b), 12);
  });

  it('covering the spokes raises side force and lowers head-on drag, monotonically', () => {
    // Expected trend of covered wheels (common practice, no source): a solid disc carries more
    // lifting load; removing exposed spokes removes their crossflow drag.
    const fractions = [0, 0.25, 0.5, 0.75, 1];
    const side = fractions.map(
      (f) => solve({ ...DEMO_WHEEL, coverFraction: f }, [point(10)]).points[0]!.sideN,
    );
    const axial0 = fractions.map(
      (f) => solve({ ...DEMO_WHEEL, coverFraction: f }, [point(0)]).points[0]!.axialN,
    );
    for (let i = 1; i < fractions.length; i++) {
      expect(side[i]!, `side ${side}`).toBeGreaterThan(side[i - 1]!);
      expect(axial0[i]!, `axial ${axial0}`).toBeLessThan(axial0[i - 1]!);
    }
  });

  it('gives the solid disc without ground the thin circular wing slope (Kinner 1937; from memory 1.790)', () => {
    const options = { ...DEFAULT_MODEL_OPTIONS, ground: false, gridConvergence: false };
    const s = solve({ ...DEMO_WHEEL, coverFraction: 1 }, [point(1)], options).surface;
    const tol = 0.01 * 1.79;
    expect(
      Math.abs(s.sideSlopePerRad - 1.79),
      `got=${s.sideSlopePerRad} expected=1.790 tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
    // The ground image raises the slope (a wing on a reflecting wall; Katz & Plotkin ground effect).
    const g = solve({ ...DEMO_WHEEL, coverFraction: 1 }, [point(1)], { ...options, ground: true }).surface;
    expect(g.sideSlopePerRad).toBeGreaterThan(s.sideSlopePerRad * 1.2);
  });

  it('stays finite at its edges and flags what lies outside its range', () => {
    const edgeWheels: WheelGeometry[] = [
      { ...DEMO_WHEEL, spokeCount: 0 },
      { ...DEMO_WHEEL, coverFraction: 1, coverPlacement: 'hub' },
      {
        ...DEMO_WHEEL,
        rimDepthM: DEMO_WHEEL.outerRadiusM - DEMO_WHEEL.tyreWidthM - DEMO_WHEEL.hubFlangeRadiusM - 1e-3,
      },
    ];
    for (const wheel of edgeWheels) {
      const { points } = solve(wheel, [point(0), point(90), point(-90), point(10, 0.5), point(10, 60, 0.5)]);
      for (const p of points) {
        for (const [k, v] of Object.entries(p)) {
          // cp is NaN without side force and uncertainty NaN when not computed: both print as null.
          const optional = ['cpXM', 'cpZM', 'uncertaintyAxialN', 'uncertaintySideN'].includes(k);
          if (typeof v === 'number' && !optional) expect(Number.isFinite(v), `${k}=${v}`).toBe(true);
        }
      }
      expect(points[1]!.flags).toContain('yaw_beyond_range');
      expect(points[3]!.flags).toContain('airspeed_beyond_range');
      expect(points[4]!.flags).toContain('airspeed_beyond_range');
    }
  });

  it('reports a grid-convergence index of its lattice when asked', () => {
    const s = solve({ ...DEMO_WHEEL, coverFraction: 1 }, [point(5)], { ...coarse, gridConvergence: true });
    expect(s.surface.convergence).not.toBeNull();
    expect(s.surface.convergence!.gciRelative).toBeGreaterThan(0);
    expect(s.points[0]!.uncertaintySideN).toBeGreaterThan(0);
  });

  it('rejects bad points with a RangeError naming the field', () => {
    expect(() => solve(DEMO_WHEEL, [{ ...point(0), airspeedMps: -1 }])).toThrow(/airspeedMps/);
    expect(() => solve(DEMO_WHEEL, [{ ...point(0), yawRad: 2 }])).toThrow(/yawRad/);
  });
});
