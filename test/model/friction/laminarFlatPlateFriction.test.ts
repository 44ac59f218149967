import { describe, expect, it } from 'vitest';
import { BLASIUS_FRICTION } from '../../../src/compute/validation/referenceValues';
import { laminarFlatPlateFriction } from '../../../src/model/friction/laminarFlatPlateFriction';

describe('laminarFlatPlateFriction', () => {
  it('is Blasius 1.328/sqrt(Re): 0.0041995 at Re 1e5', () => {
    // Reference: Blasius (1908), Schlichting, Boundary-Layer Theory ch. 7: C_f = 1.328 / sqrt(Re).
    // 1.328 / sqrt(1e5) = 0.00419953...; tolerance 1e-7 absolute (the quoted value's rounding).
    const got = laminarFlatPlateFriction(BLASIUS_FRICTION.reynolds);
    const exp = BLASIUS_FRICTION.cf;
    const tol = BLASIUS_FRICTION.tolAbs;
    expect(Math.abs(got - exp), `Re=1e5 got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('rejects non-positive Reynolds numbers', () => {
    expect(() => laminarFlatPlateFriction(0)).toThrow(/reynolds/);
  });
});
