/**
 * Regression tests for the model bugs the hardening property tests found (issue 7). Each was a valid
 * case file that made the solve throw instead of giving finite, flagged results.
 */
import { describe, expect, it } from 'vitest';
import { buildWheelLattice } from '../../src/model/lattice';
import { openAnnuli, solveWheel, wheelRadii } from '../../src/model/wheel';
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL } from '../../src/model/wheel/defaults';
import type { WheelInput } from '../../src/model/wheel/solveWheel';

function input(wheel: Partial<WheelInput['wheel']>, options: Partial<WheelInput['options']>): WheelInput {
  return {
    wheel: { ...DEMO_WHEEL, ...wheel },
    options: { ...DEFAULT_MODEL_OPTIONS, gridConvergence: false, ...options },
    steering: { ...DEFAULT_STEERING },
    points: [{ airspeedMps: 13.9, yawRad: 0.2, groundSpeedMps: 13.9, rhoKgPerM3: 1.225, muPaS: 1.79e-5 }],
  };
}

function allFinite(values: number[]): boolean {
  return values.every(Number.isFinite);
}

describe('model fixes found by the hardening property tests', () => {
  it('buildWheelLattice: 3 strips across a spoked wheel no longer give a zero-chord panel (singular system)', () => {
    // Before: the middle strip ran from the hub circle's bottom to its top, both crossings at x = 0.
    for (const spanCount of [2, 3, 4, 5]) {
      const lattice = buildWheelLattice({
        radiusM: 0.334,
        spanCount,
        chordCount: 2,
        ground: true,
        openAnnuliM: openAnnuli(wheelRadii(DEMO_WHEEL)),
      });
      let smallest = Number.POSITIVE_INFINITY;
      for (const a of lattice.chordLengthM) smallest = Math.min(smallest, a);
      expect(smallest, `spanCount=${spanCount} smallest chord=${smallest}`).toBeGreaterThan(0);
      expect(lattice.spanCount, `spanCount=${spanCount}`).toBeGreaterThanOrEqual(spanCount);
      expect(allFinite([...lattice.influence]), `spanCount=${spanCount}`).toBe(true);
    }
  });

  it('solveWheel: grid convergence on a 4 x 2 lattice is flagged as not converged, not thrown', () => {
    const solution = solveWheel(
      input({}, { latticeSpanCount: 4, latticeChordCount: 2, gridConvergence: true }),
    );
    const p = solution.points[0]!;
    expect(p.flags).toContain('lattice_not_converged');
    expect(Number.isFinite(p.sideN), `sideN=${p.sideN}`).toBe(true);
  });

  it('solveWheel: a rim wider than its tyre with no depth (t/c > 1) is a bluff section, finite drag', () => {
    const p = solveWheel(input({ rimDepthM: 0, rimWidthM: 0.028, tyreWidthM: 0.025 }, {})).points[0]!;
    const rim = p.components.rim_tyre;
    expect(allFinite([rim.fxN, p.axialN]), `rim fx=${rim.fxN} axial=${p.axialN}`).toBe(true);
    // It drags (resists motion): the component's force along +x is negative.
    expect(rim.fxN).toBeLessThan(0);
  });

  it('solveWheel: a cover of vanishing width (fraction 1e-200) solves like no cover', () => {
    const thin = solveWheel(
      input({ coverFraction: 1e-200, coverPlacement: 'centre' }, { latticeSpanCount: 8 }),
    );
    const none = solveWheel(input({ coverFraction: 0, coverPlacement: 'centre' }, { latticeSpanCount: 8 }));
    const got = thin.points[0]!.sideN;
    const expected = none.points[0]!.sideN;
    const tol = 1e-9 * Math.abs(expected);
    expect(Math.abs(got - expected), `sideN got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
      tol,
    );
  });

  it('solveWheel names the field, the value and the rule for non-finite or absurd input', () => {
    const cases: Array<[Partial<WheelInput['wheel']>, Partial<WheelInput['options']>, RegExp]> = [
      [
        { spokeDiameterM: Number.NaN },
        {},
        /wheel\.spokeDiameterM must be a finite number > 0 and <= 100, got NaN/,
      ],
      [{ rimWidthM: Infinity }, {}, /wheel\.rimWidthM must be .*got Infinity/],
      [
        {},
        { suctionRecovered: -0.1 },
        /options\.suctionRecovered must be a finite number within \[0, 1\], got -0\.1/,
      ],
      [{}, { latticeChordCount: 1e301 }, /options\.latticeChordCount must be an integer within \[1, 1000\]/],
      [
        { spokeSection: 'bladed', spokeWidthM: 0.002, spokeThicknessM: 0.003 },
        {},
        /wheel\.spokeThicknessM must be at most wheel\.spokeWidthM/,
      ],
    ];
    for (const [wheel, options, message] of cases) {
      expect(() => solveWheel(input(wheel, options)), String(message)).toThrow(message);
    }
    const point = input({}, {});
    point.points[0]!.airspeedMps = 5e-324;
    expect(() => solveWheel(point)).toThrow(
      /points\[0\]\.airspeedMps must be a finite number within \[0\.000001, 10000\]/,
    );
  });
});
