import { describe, expect, it } from 'vitest';
import { ROTATING_DISC_MOMENT } from '../../../src/compute/validation/referenceValues';
import { rotatingDiscMomentCoefficient } from '../../../src/model/friction/rotatingDiscMomentCoefficient';
import { rotatingDiscTorque } from '../../../src/model/friction/rotatingDiscTorque';

describe('rotatingDiscMomentCoefficient', () => {
  it('is 3.87/sqrt(Re) below transition and 0.146 Re^-0.2 far above (Schlichting)', () => {
    // Reference: Schlichting, Boundary-Layer Theory chs. 5 and 21. Laminar to 1e-3 relative (3.8704 vs 3.87);
    // at Re = 1e9 the laminar core (x_t^4 = 9e-8) is negligible: 1e-3 relative.
    const { laminar, turbulent, tolRel } = ROTATING_DISC_MOMENT;
    const lam = rotatingDiscMomentCoefficient(laminar.reynolds);
    const expLam = laminar.cm;
    expect(
      Math.abs(lam / expLam - 1),
      `got=${lam} expected=${expLam} tol(rel)=${tolRel}`,
    ).toBeLessThanOrEqual(tolRel);
    const turb = rotatingDiscMomentCoefficient(turbulent.reynolds);
    const expTurb = turbulent.cm;
    expect(
      Math.abs(turb / expTurb - 1),
      `got=${turb} expected=${expTurb} tol(rel)=${tolRel}`,
    ).toBeLessThanOrEqual(tolRel);
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
