import { describe, expect, it } from 'vitest';
import { rotatingDiscMomentCoefficient } from '../../../src/model/friction/rotatingDiscMomentCoefficient';
import { rotatingDiscTorque } from '../../../src/model/friction/rotatingDiscTorque';

describe('rotatingDiscMomentCoefficient', () => {
  it('is 3.87/sqrt(Re) below transition and 0.146 Re^-0.2 far above (Schlichting)', () => {
    // Reference: Schlichting, Boundary-Layer Theory chs. 5 and 21. Laminar to 1e-3 relative (3.8704 vs 3.87);
    // at Re = 1e9 the laminar core (x_t^4 = 9e-8) is negligible: 1e-3 relative.
    const lam = rotatingDiscMomentCoefficient(1e5);
    const expLam = 3.87 / Math.sqrt(1e5);
    expect(Math.abs(lam / expLam - 1), `got=${lam} expected=${expLam} tol(rel)=1e-3`).toBeLessThanOrEqual(
      1e-3,
    );
    const turb = rotatingDiscMomentCoefficient(1e9);
    const expTurb = 0.146 * 1e9 ** -0.2;
    expect(Math.abs(turb / expTurb - 1), `got=${turb} expected=${expTurb} tol(rel)=1e-3`).toBeLessThanOrEqual(
      1e-3,
    );
  });

  it('agrees with rotatingDiscTorque for a full disc with transition (1e-12 relative)', () => {
    const rho = 1.2;
    const mu = 1.8e-5;
    const R = 0.34;
    const omega = 80;
    const re = (omega * R * R * rho) / mu;
    const t = rotatingDiscTorque({
      omegaRadPerS: omega,
      innerRadiusM: 0,
      outerRadiusM: R,
      rhoKgPerM3: rho,
      muPaS: mu,
      sides: 2,
    });
    const exp = t.torqueNm / (0.5 * rho * omega * omega * R ** 5);
    const got = rotatingDiscMomentCoefficient(re);
    expect(Math.abs(got / exp - 1), `Re=${re} got=${got} expected=${exp} tol(rel)=1e-12`).toBeLessThanOrEqual(
      1e-12,
    );
  });
});
