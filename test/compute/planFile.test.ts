import { describe, expect, it } from 'vitest';
import {
  expandPlan,
  MAX_PLAN_CASES,
  MAX_PLAN_POINTS,
  parsePlanFile,
  rangeValues,
} from '../../src/compute/planFile';

const FAST_MODEL = { lattice_span: 8, lattice_chord: 6, grid_convergence: false };

describe('rangeValues (inclusive, robust to floating point; common practice, no source)', () => {
  it('0..1 step 0.05 gives 21 values, the last exactly 1, decimal steps printed as typed', () => {
    const v = rangeValues(0, 1, 0.05);
    expect(Array.isArray(v)).toBe(true);
    const values = v as number[];
    expect(values).toHaveLength(21);
    expect(values[20]).toBe(1);
    expect(values[3]).toBe(0.15);
    expect(values[7]).toBe(0.35);
    for (let k = 0; k < 21; k++) {
      const tol = 1e-15;
      expect(
        Math.abs(values[k]! - k * 0.05),
        `k=${k} got=${values[k]} expected=${k * 0.05} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('handles descending ranges, single values, and rejects non-whole counts and wrong signs', () => {
    expect(rangeValues(10, 0, -2.5)).toEqual([10, 7.5, 5, 2.5, 0]);
    expect(rangeValues(3, 3, 1)).toEqual([3]);
    expect(rangeValues(0.1, 0.7, 0.1)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
    expect(rangeValues(0, 1, 0.3)).toMatch(/must be a whole number/);
    expect(rangeValues(0, 1, -0.1)).toMatch(/must have the sign of to - from/);
    expect(rangeValues(0, 1, 0)).toMatch(/must not be 0/);
  });
});

describe('expandPlan', () => {
  const plan = {
    format: 'coversweep-plan',
    name: 'p',
    wheel: {
      rim_depth_m: [0.03, 0.05],
      cover: { fraction: { from: 0, to: 1, step: 0.5 }, placement: 'rim' },
    },
    conditions: { airspeed_mps: [10, 12], yaw_deg: { from: 0, to: 10, step: 5 } },
    model: FAST_MODEL,
  };

  it('is the Cartesian product in document order, last key fastest; yaw and airspeed lists stay in each case', () => {
    const r = expandPlan(plan);
    if (!r.ok) throw new Error(r.errors.join('\n'));
    const { cases, variedKeys, pointCount } = r.value;
    expect(variedKeys).toEqual(['wheel.rim_depth_m', 'wheel.cover.fraction']);
    expect(cases.map((c) => [c.varied['wheel.rim_depth_m'], c.varied['wheel.cover.fraction']])).toEqual([
      [0.03, 0],
      [0.03, 0.5],
      [0.03, 1],
      [0.05, 0],
      [0.05, 0.5],
      [0.05, 1],
    ]);
    expect(cases.map((c) => c.index)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(cases[4]!.caseFile.wheel.rim_depth_m).toBe(0.05);
    expect(cases[4]!.caseFile.wheel.cover.fraction).toBe(0.5);
    expect(cases[4]!.caseFile.conditions.yaw_deg).toEqual([0, 5, 10]);
    expect(cases[4]!.caseFile.conditions.airspeed_mps).toEqual([10, 12]);
    expect(cases[4]!.caseFile.format).toBe('coversweep-case');
    expect(pointCount).toBe(6 * 2 * 3);
  });

  it('names the key path and the case in errors', () => {
    const r = expandPlan({ ...plan, wheel: { ...plan.wheel, rim_depth_m: [0.03, 0.3] } });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]).toMatch(
      /^case 4 of 6 \(wheel\.rim_depth_m=0\.3, wheel\.cover\.fraction=0\): wheel\.rim_depth_m: .*deeper than the wheel/,
    );
    const every = expandPlan({ ...plan, model: { ...FAST_MODEL, ground: 'no' } });
    expect(every.ok === false && every.errors).toEqual([
      'model.ground: must be true or false, got "no" (in every case)',
    ]);
    const badRange = expandPlan({ ...plan, steering: { head_angle_deg: { from: 70, to: 74, step: 3 } } });
    expect(badRange.ok === false && badRange.errors[0]).toMatch(
      /^steering\.head_angle_deg: range .* must be a whole number/,
    );
    const empty = expandPlan({ ...plan, steering: { fork_offset_m: [] } });
    expect(empty.ok === false && empty.errors[0]).toMatch(
      /^steering\.fork_offset_m: a list of values to vary must not be empty/,
    );
    const version = expandPlan({ ...plan, version: 7 });
    expect(version.ok === false && version.errors[0]).toMatch(/^version: unsupported plan-file version 7/);
  });

  it('refuses plans above the point limit before expanding them', () => {
    const big = {
      wheel: {
        cover: { fraction: { from: 0, to: 1, step: 0.01 } },
        rim_depth_m: { from: 0.02, to: 0.1, step: 0.001 },
      },
      conditions: { airspeed_mps: 10, yaw_deg: { from: 0, to: 12.9, step: 0.1 } },
    };
    const r = expandPlan(big);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors[0]).toContain(`more than the limit of ${MAX_PLAN_POINTS}`);
      expect(r.errors[0]).toContain(`${101 * 81} cases x 130 points`);
    }
  });

  it('refuses plans above the case limit (memory bound) with advice', () => {
    const many = {
      wheel: {
        cover: { fraction: { from: 0, to: 1, step: 0.001 } },
        rim_depth_m: { from: 0.02, to: 0.1, step: 0.0001 },
      },
      conditions: { airspeed_mps: 10, yaw_deg: 0 },
    };
    const r = expandPlan(many);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors[0]).toContain(`${1001 * 801} cases, more than the limit of ${MAX_PLAN_CASES}`);
      expect(r.errors[0]).toContain('yaw angles and airspeeds in lists');
    }
  });

  it('parsePlanFile reports broken JSON with its position', () => {
    const r = parsePlanFile('{"wheel": [1, 2,]}');
    expect(r.ok === false && r.errors[0]).toBe(
      'plan file: invalid JSON at line 1, column 17: trailing comma before "]" (not allowed in JSON), found "]"',
    );
  });
});
