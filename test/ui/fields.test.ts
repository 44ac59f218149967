// The page's controls as data: every field reads a display value from a valid state and writes it back
// unchanged (no drift through unit conversions), and the helper parsers name bad input.
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { mapDepths, pageStudies } from '../../src/compute/study';
import { solveWheel } from '../../src/model/wheel/solveWheel';
import { toCsv } from '../../src/ui/csv';
import { defaultCase } from '../../src/ui/defaultCase';
import { FIELDS, parseNumberList, type RawJson, yawRange } from '../../src/ui/fields';
import { defaultView, validateView } from '../../src/ui/viewState';

describe('yawRange and parseNumberList', () => {
  it('builds 0..max with the max included', () => {
    expect(yawRange(2, 0.5)).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(yawRange(1, 0.3)).toEqual([0, 0.3, 0.6, 0.9, 1]);
    expect(yawRange(0, 1)).toEqual([0]);
    expect(() => yawRange(5, 0)).toThrow('yaw step: must be greater than 0 deg, got 0');
  });
  it('parses lists and names a bad item', () => {
    expect(parseNumberList('0, 0.25; 1  2', 'x')).toEqual([0, 0.25, 1, 2]);
    expect(() => parseNumberList('0, a', 'cover fractions')).toThrow('cover fractions: "a" is not a number');
  });
});

describe('fields', () => {
  for (const speedUnit of ['kmh', 'mph'] as const) {
    it(`write back what they read without changing the state (${speedUnit})`, () => {
      const ctx = { case: defaultCase(), view: { ...defaultView(), speedUnit } };
      for (const field of FIELDS) {
        if (field.visible && !field.visible(ctx)) continue; // hidden fields do not apply to this design
        const raw = structuredClone(field.target === 'case' ? ctx.case : ctx.view) as RawJson;
        field.set(raw, field.get(ctx), ctx);
        if (field.target === 'case') {
          const r = validateCase(raw);
          expect(r.ok, `${field.key}: ${!r.ok && r.errors.join('; ')}`).toBe(true);
          if (field.key === 'airMode' || field.key === 'groundMode') continue; // these switch modes
          expect(r.ok && r.value, field.key).toEqual(ctx.case);
        } else {
          expect(validateView(raw), field.key).toEqual({ ok: true, value: ctx.view });
        }
      }
    });
  }
  it('switch the air description and keep the case valid', () => {
    const ctx = { case: defaultCase(), view: defaultView() };
    const air = FIELDS.find((f) => f.key === 'airMode')!;
    for (const mode of ['altitude', 'density', 'pressure']) {
      const raw = structuredClone(ctx.case) as RawJson;
      air.set(raw, mode, ctx);
      const r = validateCase(raw);
      expect(r.ok, `${mode}: ${!r.ok && r.errors.join('; ')}`).toBe(true);
      ctx.case = r.ok ? r.value : ctx.case;
      expect(air.get(ctx)).toBe(mode);
    }
  });
});

describe('pageStudies', () => {
  it('solves the case as given first, and its sweeps contain the same wheel', () => {
    const c = defaultCase();
    const plan = pageStudies(c, defaultView(), null);
    const currentInput = plan.current.inputs[0] as Parameters<typeof solveWheel>[0];
    expect(currentInput.points.length).toBe(41);
    const current = solveWheel(currentInput).points;
    // cover fraction 0 = the demo wheel
    const family0 = solveWheel(plan.family.inputs[0] as Parameters<typeof solveWheel>[0]).points;
    for (let i = 0; i < current.length; i++) {
      // Same inputs through the same code: bit-identical (tolerance 0).
      expect(family0[i]!.axialN, `yaw index ${i}`).toBe(current[i]!.axialN);
    }
    expect(plan.map.inputs.length).toBe(11 * 6);
    expect((plan.cover.inputs[0] as Parameters<typeof solveWheel>[0]).points.length).toBe(4);
    expect(plan.baseline).toBeNull();
  });
  it('keeps the map rim depths inside what the rim model accepts and the wheel fits', () => {
    const r = validateCase({
      wheel: { outer_radius_m: 0.2, tyre_width_m: 0.02, rim_width_m: 0.03, hub_flange_radius_m: 0.03 },
      conditions: { airspeed_mps: 10, yaw_deg: 0 },
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const depths = mapDepths(r.value, { ...defaultView(), mapMaxRimDepthM: 0.3 });
    expect(depths[0]).toBeCloseTo(0.012, 12); // rim width - tyre width + 2 mm
    expect(depths[5]!).toBeLessThanOrEqual(0.2 - 0.02 - 0.03 - 0.02 + 1e-12);
  });
});

describe('csv', () => {
  it('quotes what needs quoting and leaves non-finite numbers empty', () => {
    expect(
      toCsv(
        ['a, b', 'c"d'],
        [
          [1.5, Number.NaN],
          ['x\ny', null],
        ],
      ),
    ).toBe('"a, b","c""d"\r\n1.5,\r\n"x\ny",\r\n');
  });
});
