import { describe, expect, it } from 'vitest';
import { caseToModelInput, validateCase } from '../../src/compute/caseFile';
import { axisNumbers, pageStudies, type WheelInput } from '../../src/compute/study';
import { PAGE_DESIGN_SPACE } from '../../src/compute/validation/wholeWheelCases';
import { defaultCase } from '../../src/ui/defaultCase';
import { defaultView } from '../../src/ui/viewState';

// The reference row "design-space-yaw20" sweeps the page's default design space; it lives in src/compute
// (which cannot import the page), so this holds its grid to the page's own plan (consistency, no source).
describe('the design space of the reference set', () => {
  it("is the page's default design map: the same wheels at the same airspeed", () => {
    const plan = pageStudies(defaultCase(), defaultView(), null);
    expect(axisNumbers(plan.map.caseAxes[1]!)).toEqual(PAGE_DESIGN_SPACE.fractions);
    expect(axisNumbers(plan.map.caseAxes[0]!)).toEqual(PAGE_DESIGN_SPACE.rimDepthsM);
    let k = 0;
    for (const depth of PAGE_DESIGN_SPACE.rimDepthsM) {
      for (const fraction of PAGE_DESIGN_SPACE.fractions) {
        const parsed = validateCase({
          wheel: { rim_depth_m: depth, cover: { fraction, placement: 'rim' } },
          conditions: { airspeed_mps: PAGE_DESIGN_SPACE.airspeedMps, yaw_deg: PAGE_DESIGN_SPACE.yawDeg },
        });
        if (!parsed.ok) throw new Error(parsed.errors.join('; '));
        const mine = caseToModelInput(parsed.value);
        const page = plan.map.inputs[k++] as WheelInput;
        expect(mine.wheel, `depth ${depth} cover ${fraction}`).toEqual(page.wheel);
        const v = page.points[0]!.airspeedMps;
        expect(Math.abs(v - PAGE_DESIGN_SPACE.airspeedMps), `airspeed ${v}`).toBeLessThanOrEqual(1e-9);
        expect(mine.points[0]!.rhoKgPerM3).toBe(page.points[0]!.rhoKgPerM3);
      }
    }
    expect(k).toBe(plan.map.inputs.length);
  });
});
