import { describe, expect, it } from 'vitest';
import { flatPlateFriction } from '../../../src/model/friction/flatPlateFriction';
import { prandtlSchlichtingFriction } from '../../../src/model/friction/prandtlSchlichtingFriction';
import { streamlineSectionDrag } from '../../../src/model/sections/streamlineSectionDrag';

describe('streamlineSectionDrag', () => {
  it('reproduces the NACA 0012 minimum drag at Re 6e6 within 15 %', () => {
    // Reference: Abbott & von Doenhoff, Theory of Wing Sections, NACA 0012 smooth, Re 6e6: c_d0 ~ 0.0054-0.0060
    // (from memory; 0.0058 used). C_f from the flat-plate law with transition at 40 % chord (Re_x = 2.4e6), an
    // assumption of the order of natural transition on a smooth 4-digit section (from memory).
    const cf = flatPlateFriction(6e6, 2.4e6);
    const got = streamlineSectionDrag(0.12, cf);
    const exp = 0.0058;
    const tol = 0.15;
    expect(
      Math.abs(got / exp - 1),
      `t/c=0.12 Cf=${cf} got=${got} expected=${exp} tol(rel)=${tol}`,
    ).toBeLessThanOrEqual(tol);
    // Fully turbulent C_f gives an upper bound above the smooth-model value (common practice, no source).
    const turb = streamlineSectionDrag(0.12, prandtlSchlichtingFriction(6e6));
    expect(turb, `fully turbulent ${turb} should exceed smooth ${exp}`).toBeGreaterThan(exp);
  });

  it('is 2 Cf (1 + 2 t/c + 60 (t/c)^4) (exact formula, 4 epsilon relative)', () => {
    // Reference: Hoerner, Fluid-Dynamic Drag ch. 6 (from memory). t/c = 0.2, Cf = 0.004:
    // 0.008 * (1 + 0.4 + 0.096) = 0.011968.
    const got = streamlineSectionDrag(0.2, 0.004);
    const exp = 0.011968;
    const tol = 4 * Number.EPSILON * exp;
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    // Zero thickness is the flat plate wetted on both sides: 2 Cf.
    expect(streamlineSectionDrag(0, 0.003)).toBe(0.006);
  });

  it('rejects invalid arguments', () => {
    expect(() => streamlineSectionDrag(-0.1, 0.004)).toThrow(/thicknessToChord/);
    expect(() => streamlineSectionDrag(0.1, 0)).toThrow(/skinFrictionCoefficient/);
  });
});
