import { describe, expect, it } from 'vitest';
import {
  STANDARD_ATMOSPHERE_TABLE,
  STANDARD_ATMOSPHERE_TOL_REL,
} from '../../../src/compute/validation/referenceValues';
import { standardAtmosphere } from '../../../src/model/air/standardAtmosphere';

// Reference: U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), tables at geopotential altitude; identical to
// ICAO 1993 ISA below 32 km. Values from memory of the tables (4-5 significant figures).
const TABLE = STANDARD_ATMOSPHERE_TABLE.map((r) => ({
  h: r.altitudeM,
  T: r.temperatureK,
  p: r.pressurePa,
  rho: r.densityKgPerM3,
}));

describe('standardAtmosphere', () => {
  it('reproduces the standard tables (temperature to 1e-9 K, p and rho to 2e-4 relative)', () => {
    for (const row of TABLE) {
      const got = standardAtmosphere(row.h);
      const tolT = 1e-9;
      expect(
        Math.abs(got.temperatureK - row.T),
        `h=${row.h} got T=${got.temperatureK} expected=${row.T} tol=${tolT}`,
      ).toBeLessThanOrEqual(tolT);
      const tol = STANDARD_ATMOSPHERE_TOL_REL;
      const relP = Math.abs(got.pressurePa / row.p - 1);
      expect(
        relP,
        `h=${row.h} got p=${got.pressurePa} expected=${row.p} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
      const relRho = Math.abs(got.densityKgPerM3 / row.rho - 1);
      expect(
        relRho,
        `h=${row.h} got rho=${got.densityKgPerM3} expected=${row.rho} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('rejects altitudes outside the troposphere and non-finite input', () => {
    expect(() => standardAtmosphere(11001)).toThrow(RangeError);
    expect(() => standardAtmosphere(-5001)).toThrow(/altitudeM/);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(RangeError);
  });
});
