import { describe, expect, it } from 'vitest';
import {
  celsiusToKelvin,
  degToRad,
  dragAreaToGramsForce,
  G0_MPS2,
  gramsForceToNewtons,
  kmhToMps,
  mphToMps,
  mpsToKmh,
  mpsToMph,
  newtonsToGramsForce,
  radToDeg,
} from '../../src/compute/units';

const EPS = Number.EPSILON;

function close(got: number, expected: number, tol: number, input: string) {
  expect(Math.abs(got - expected), `${input} got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(
    tol,
  );
}

describe('units (exact definitions, NIST SP 811 (2008) appendix B)', () => {
  it('g0 is 9.80665 m/s^2 and 1 kgf = 9.80665 N = 1000 gf', () => {
    expect(G0_MPS2).toBe(9.80665);
    // NIST SP 811 B.8: kilogram-force = 9.80665 N (exact).
    close(newtonsToGramsForce(9.80665), 1000, 4 * 1000 * EPS, 'F=9.80665 N');
    close(gramsForceToNewtons(1000), 9.80665, 4 * 9.80665 * EPS, 'gf=1000');
  });

  it('mile per hour = 0.44704 m/s exactly (NIST SP 811 B.8)', () => {
    close(mphToMps(1), 0.44704, 2 * 0.44704 * EPS, 'mph=1');
    close(mphToMps(30), 13.4112, 2 * 13.4112 * EPS, 'mph=30');
    close(mpsToMph(13.4112), 30, 4 * 30 * EPS, 'mps=13.4112');
  });

  it('kilometre per hour = 1/3.6 m/s (definition)', () => {
    close(kmhToMps(50), 13.888888888888889, 2 * 13.9 * EPS, 'kmh=50');
    close(mpsToKmh(kmhToMps(36)), 36, 4 * 36 * EPS, 'kmh=36 round trip');
  });

  it('degrees and radians (pi rad = 180 deg) and 0 C = 273.15 K (NIST SP 811 4.2.1.1)', () => {
    close(degToRad(180), Math.PI, 2 * Math.PI * EPS, 'deg=180');
    close(radToDeg(Math.PI / 2), 90, 2 * 90 * EPS, 'rad=pi/2');
    close(celsiusToKelvin(15), 288.15, 2 * 288.15 * EPS, 'C=15');
  });

  it('grams-force of a drag area: 0.1 m^2 at 50 km/h in 1.225 kg/m^3 (hand calculation)', () => {
    // q = 0.5 * 1.225 * (50/3.6)^2 = 118.152 Pa; F = 11.8152 N; /9.80665*1000 = 1204.81 gf (hand calculation).
    const got = dragAreaToGramsForce(0.1, kmhToMps(50), 1.225);
    const expected = ((0.1 * 0.5 * 1.225 * (50 / 3.6) ** 2) / 9.80665) * 1000;
    close(got, expected, 8 * expected * EPS, 'cda=0.1 V=50 km/h rho=1.225');
    close(got, 1204.81, 0.01, 'cda=0.1 V=50 km/h rho=1.225 (hand value to 0.01 gf)');
  });
});
