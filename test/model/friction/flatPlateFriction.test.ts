import { describe, expect, it } from 'vitest';
import { flatPlateFriction } from '../../../src/model/friction/flatPlateFriction';

describe('flatPlateFriction', () => {
  it('is Blasius below transition (0.0041995 at Re 1e5)', () => {
    // Reference: Blasius, Schlichting ch. 7, 1.328/sqrt(1e5); tolerance 1e-7 absolute.
    const got = flatPlateFriction(1e5);
    expect(Math.abs(got - 0.0041995), `got=${got} expected=0.0041995 tol=1e-7`).toBeLessThanOrEqual(1e-7);
  });

  it("matches Schlichting's transitional law with A = 1700 at Re 1e7 within 1 %", () => {
    // Reference: Schlichting ch. 21, C_f = 0.455/(log Re)^2.58 - 1700/Re for Re_t = 5e5:
    // 0.0030037 - 0.00017 = 0.0028337 (by hand). Our A is 1614 (continuity), so tolerance 1 % relative.
    const got = flatPlateFriction(1e7, 5e5);
    const exp = 0.0028337;
    const tol = 0.01;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('is continuous at the transition Reynolds number (jump < 1e-6 relative)', () => {
    // Common practice, no source: the mixed law should have no jump; our A is chosen for continuity.
    for (const ret of [3e5, 5e5, 1e6, 3e6]) {
      const below = flatPlateFriction(ret, ret);
      const above = flatPlateFriction(ret * (1 + 1e-9), ret);
      const tol = 1e-6;
      expect(
        Math.abs(above / below - 1),
        `Re_t=${ret} below=${below} above=${above} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('stays laminar with transitionReynolds = Infinity and tends to the turbulent law far above transition', () => {
    const lam = flatPlateFriction(1e7, Number.POSITIVE_INFINITY);
    expect(Math.abs(lam - 1.328 / Math.sqrt(1e7)), `got=${lam}`).toBeLessThanOrEqual(1e-15);
    // Reference: Schlichting ch. 21 - at Re 1e9 the laminar deficit A/Re is 0.1 %; within 0.2 % of 0.455/9^2.58.
    const got = flatPlateFriction(1e9);
    const exp = 0.455 / 9 ** 2.58;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=2e-3`).toBeLessThanOrEqual(2e-3);
  });

  it('rejects invalid arguments', () => {
    expect(() => flatPlateFriction(-1)).toThrow(/reynolds/);
    expect(() => flatPlateFriction(1e6, 100)).toThrow(/transitionReynolds/);
  });
});
