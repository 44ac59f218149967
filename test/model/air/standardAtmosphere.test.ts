import { describe, expect, it } from 'vitest';
import { standardAtmosphere } from '../../../src/model/air/standardAtmosphere';

// Reference: U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), tables at geopotential altitude; identical to
// ICAO 1993 ISA below 32 km. Values from memory of the tables (4-5 significant figures).
const TABLE = [
  { h: 0, T: 288.15, p: 101325, rho: 1.225 },
  { h: 1000, T: 281.65, p: 89874.6, rho: 1.11164 },
  { h: 2000, T: 275.15, p: 79495.2, rho: 1.00649 },
  { h: 5000, T: 255.65, p: 54019.9, rho: 0.736116 },
  { h: 11000, T: 216.65, p: 22632.1, rho: 0.363918 },
];

describe('standardAtmosphere', () => {
  it('reproduces the standard tables (temperature to 1e-9 K, p and rho to 2e-4 relative)', () => {
    for (const row of TABLE) {
      const got = standardAtmosphere(row.h);
      const tolT = 1e-9;
      expect(
        Math.abs(got.temperatureK - row.T),
        `h=${row.h} got T=${got.temperatureK} expected=${row.T} tol=${tolT}`,
      ).toBeLessThanOrEqual(tolT);
      const tol = 2e-4;
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
