import { describe, expect, it } from 'vitest';
import { ISA_VISCOSITY } from '../../../src/compute/validation/referenceValues';
import { sutherlandViscosity } from '../../../src/model/air/sutherlandViscosity';

describe('sutherlandViscosity', () => {
  it('gives the ISA sea-level viscosity 1.7894e-5 Pa s at 288.15 K', () => {
    // Reference: ICAO 1993 ISA, mu(288.15 K) = 1.7894e-5 Pa s. Tolerance 2e-4 relative (the ISA uses
    // beta_s = 1.458e-6, S = 110.4 K, an equivalent Sutherland form).
    const got = sutherlandViscosity(ISA_VISCOSITY.temperatureK);
    const exp = ISA_VISCOSITY.muPaS;
    const tol = ISA_VISCOSITY.tolRel;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('matches tabulated air viscosity at 300 K and 250 K', () => {
    // Reference: Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.4 (air at 1 atm),
    // from memory: 300 K -> 184.6e-7, 250 K -> 159.6e-7 Pa s. Tolerance 1 % relative (table vs law).
    for (const [T, exp] of [
      [300, 184.6e-7],
      [250, 159.6e-7],
    ] as const) {
      const got = sutherlandViscosity(T);
      const tol = 0.01;
      expect(
        Math.abs(got / exp - 1),
        `T=${T} got=${got} expected=${exp} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('rejects temperatures outside the law range', () => {
    expect(() => sutherlandViscosity(100)).toThrow(/temperatureK/);
  });
});
