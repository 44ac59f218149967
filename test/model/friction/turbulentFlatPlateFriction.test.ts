import { describe, expect, it } from 'vitest';
import { TURBULENT_FRICTION } from '../../../src/compute/validation/referenceValues';
import { turbulentFlatPlateFriction } from '../../../src/model/friction/turbulentFlatPlateFriction';

describe('turbulentFlatPlateFriction', () => {
  it("is Prandtl's one-fifth law 0.074 Re^-0.2: 0.0029460 at Re 1e7", () => {
    // Reference: Schlichting, Boundary-Layer Theory ch. 21, C_f = 0.074 Re^(-1/5); 0.074 / 10^1.4 = 0.00294601.
    // Tolerance 1e-8 absolute (rounding of the quoted value).
    const got = turbulentFlatPlateFriction(TURBULENT_FRICTION.reynolds);
    const exp = TURBULENT_FRICTION.cf;
    const tol = TURBULENT_FRICTION.tolAbs;
    expect(Math.abs(got - exp), `Re=1e7 got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('agrees with the ITTC-1957 line within 5 % at Re 1e6..1e7', () => {
    // Reference: ITTC 1957 model-ship correlation line C_f = 0.075 / (log10 Re - 2)^2 (an independent
    // turbulent friction line); the two laws differ by a few percent in this range.
    for (const re of [1e6, 3e6, 1e7]) {
      const got = turbulentFlatPlateFriction(re);
      const exp = 0.075 / (Math.log10(re) - 2) ** 2;
      const tol = 0.05;
      expect(
        Math.abs(got / exp - 1),
        `Re=${re} got=${got} expected=${exp} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });
});
