import { describe, expect, it } from 'vitest';
import { airDensity } from '../../../src/model/air/airDensity';

describe('airDensity', () => {
  it('dry air at 15 C, 101325 Pa gives the ISA sea-level density 1.2250 kg/m^3', () => {
    // Reference: ICAO 1993 ISA sea-level density 1.2250 kg/m^3. Tolerance 1e-4 relative (the standard's R
    // is 287.05287, ours 287.058).
    const got = airDensity({ temperatureK: 288.15, pressurePa: 101325, relativeHumidity: 0 });
    const exp = 1.225;
    const tol = 1e-4;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('humid air at 20 C, 101325 Pa, 50 % RH matches the CIPM-2007 equation', () => {
    // Reference: CIPM-2007 air-density equation (Picard, Davis, Glaeser & Fujii 2008, Metrologia 45, 149-155),
    // evaluated by hand with its coefficients (from memory) at x_CO2 = 400 ppm: 1.19931 kg/m^3.
    // Our ideal-gas mixture omits the compressibility (Z = 0.99961) and enhancement factors: tolerance 1e-3 rel.
    const got = airDensity({ temperatureK: 293.15, pressurePa: 101325, relativeHumidity: 0.5 });
    const exp = 1.19931;
    const tol = 1e-3;
    expect(Math.abs(got / exp - 1), `got=${got} expected=${exp} tol(rel)=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('humidity lowers density (water vapour is lighter than dry air)', () => {
    const dry = airDensity({ temperatureK: 303.15, pressurePa: 100000, relativeHumidity: 0 });
    const wet = airDensity({ temperatureK: 303.15, pressurePa: 100000, relativeHumidity: 1 });
    expect(wet, `dry=${dry} wet=${wet}`).toBeLessThan(dry);
  });

  it('rejects invalid humidity and pressure', () => {
    expect(() => airDensity({ temperatureK: 288.15, pressurePa: 101325, relativeHumidity: 1.5 })).toThrow(
      /relativeHumidity/,
    );
    expect(() => airDensity({ temperatureK: 288.15, pressurePa: -1, relativeHumidity: 0 })).toThrow(
      /pressurePa/,
    );
  });
});
