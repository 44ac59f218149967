import { describe, expect, it } from 'vitest';
import { turbulentFlatPlateFriction } from '../../../src/model/friction';
import { streamlineSectionDrag } from '../../../src/model/sections';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { emptyLoads } from '../../../src/model/wheel/componentLoads';
import { rimTyreLoads, rimTyreSection } from '../../../src/model/wheel/rimTyreLoads';

describe('rimTyreLoads', () => {
  it('head-on: strip theory integrates to 0.5 rho V^2 Cd c R (8/3)', () => {
    // With u_r = -V cos(theta), the x force integrates |cos|^3 over a turn: 8/3 (calculus). Section
    // Cd from Hoerner's streamline formula (Fluid-Dynamic Drag ch. 6) with the turbulent plate Cf.
    const rho = 1.2;
    const mu = 1.8e-5;
    const V = 12;
    const wheel = { ...DEMO_WHEEL };
    const radii = wheelRadii(wheel);
    const { chordM, thicknessM } = rimTyreSection(wheel);
    const cd = streamlineSectionDrag(
      thicknessM / chordM,
      turbulentFlatPlateFriction((rho * V * chordM) / mu),
    );
    const rMid = radii.outerRadiusM - chordM / 2;
    const expected = -0.5 * rho * V * V * cd * chordM * rMid * (8 / 3);
    const out = emptyLoads();
    rimTyreLoads(
      wheel,
      radii,
      { airspeedMps: V, yawRad: 0, groundSpeedMps: V, rhoKgPerM3: rho, muPaS: mu },
      DEFAULT_MODEL_OPTIONS,
      out,
    );
    const tol = 2e-3 * Math.abs(expected);
    expect(
      Math.abs(out.fxN - expected),
      `got=${out.fxN} expected=${expected} tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
    expect(Math.abs(out.fzN)).toBeLessThan(1e-12);
    expect(out.axleTorqueNm).toBe(0);
  });

  it('falls as cos^2 of yaw (only the in-plane flow meets the section)', () => {
    const wheel = { ...DEMO_WHEEL };
    const radii = wheelRadii(wheel);
    const at = (yawRad: number) => {
      const out = emptyLoads();
      rimTyreLoads(
        wheel,
        radii,
        { airspeedMps: 12, yawRad, groundSpeedMps: 12, rhoKgPerM3: 1.2, muPaS: 1.8e-5 },
        DEFAULT_MODEL_OPTIONS,
        out,
      );
      return out.fxN;
    };
    const ratio = at(0.3) / at(0);
    // Reynolds number also falls with cos(yaw); its effect on Cf is small (Re^-0.2).
    expect(ratio).toBeGreaterThan(Math.cos(0.3) ** 2);
    expect(ratio).toBeLessThan(Math.cos(0.3) ** 1.7);
  });
});
