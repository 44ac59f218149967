import { describe, expect, it } from 'vitest';
import { PRANDTL_SCHLICHTING_FRICTION } from '../../../src/compute/validation/referenceValues';
import { prandtlSchlichtingFriction } from '../../../src/model/friction/prandtlSchlichtingFriction';

describe('prandtlSchlichtingFriction', () => {
  it('gives 0.455/7^2.58 = 0.0030037 at Re 1e7', () => {
    // Reference: Schlichting, Boundary-Layer Theory ch. 21, C_f = 0.455 / (log10 Re)^2.58, evaluated by hand
    // (log10 1e7 = 7 -> 7^2.58 = 151.48); tolerance 1e-7 absolute.
    const got = prandtlSchlichtingFriction(PRANDTL_SCHLICHTING_FRICTION.reynolds);
    const exp = PRANDTL_SCHLICHTING_FRICTION.cf;
    const tol = PRANDTL_SCHLICHTING_FRICTION.tolAbs;
    expect(Math.abs(got - exp), `Re=1e7 got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('agrees with the ITTC-1957 line within 5 % over 1e6..1e9', () => {
    // Reference: ITTC 1957 line 0.075/(log10 Re - 2)^2, an independent turbulent friction correlation.
    for (const re of [1e6, 1e7, 1e8, 1e9]) {
      const got = prandtlSchlichtingFriction(re);
      const exp = 0.075 / (Math.log10(re) - 2) ** 2;
      const tol = 0.05;
      expect(
        Math.abs(got / exp - 1),
        `Re=${re} got=${got} expected=${exp} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('rejects Re below 1e3', () => {
    expect(() => prandtlSchlichtingFriction(10)).toThrow(/reynolds/);
  });
});
