import { describe, expect, it } from 'vitest';
import { rotatingDiscTorque } from '../../../src/model/friction/rotatingDiscTorque';

const rho = 1.225;
const mu = 1.7894e-5;
const nu = mu / rho;

function momentCoefficient(torqueNm: number, omega: number, radius: number): number {
  return torqueNm / (0.5 * rho * omega * omega * radius ** 5);
}

describe('rotatingDiscTorque', () => {
  it('full laminar disc, both sides, reproduces C_M = 3.87/sqrt(Re) within 1e-3 relative', () => {
    // Reference: Schlichting, Boundary-Layer Theory ch. 5 (von Karman, Cochran): C_M = 3.87 / sqrt(Re).
    const R = 0.3;
    for (const omega of [5, 20, 40]) {
      const t = rotatingDiscTorque({
        omegaRadPerS: omega,
        innerRadiusM: 0,
        outerRadiusM: R,
        rhoKgPerM3: rho,
        muPaS: mu,
        sides: 2,
        transitionReynolds: Number.POSITIVE_INFINITY,
      });
      const re = (omega * R * R) / nu;
      const got = momentCoefficient(t.torqueNm, omega, R);
      const exp = 3.87 / Math.sqrt(re);
      const tol = 1e-3;
      expect(
        Math.abs(got / exp - 1),
        `Re=${re} got=${got} expected=${exp} tol(rel)=${tol}`,
      ).toBeLessThanOrEqual(tol);
    }
  });

  it('full turbulent disc, both sides, reproduces C_M = 0.146 Re^-0.2 (1e-12 relative)', () => {
    // Reference: Schlichting, Boundary-Layer Theory ch. 21 (von Karman's turbulent disc): C_M = 0.146 Re^(-1/5).
    const R = 0.35;
    const omega = 60;
    // A tiny transition Re puts the whole disc (but for r < 1e-6 m) in the turbulent region.
    const t = rotatingDiscTorque({
      omegaRadPerS: omega,
      innerRadiusM: 0,
      outerRadiusM: R,
      rhoKgPerM3: rho,
      muPaS: mu,
      sides: 2,
      transitionReynolds: 1e-12,
    });
    const re = (omega * R * R) / nu;
    const got = momentCoefficient(t.torqueNm, omega, R);
    const exp = 0.146 * re ** -0.2;
    const tol = 1e-12;
    expect(
      Math.abs(got / exp - 1),
      `Re=${re} got=${got} expected=${exp} tol(rel)=${tol}`,
    ).toBeLessThanOrEqual(tol);
  });

  it('laminar annulus equals the difference of two discs; one side is half of two (8 epsilon relative)', () => {
    // Exact identity of the integral (common practice, no source).
    const base = {
      omegaRadPerS: 30,
      rhoKgPerM3: rho,
      muPaS: mu,
      transitionReynolds: Number.POSITIVE_INFINITY,
    };
    const outer = rotatingDiscTorque({ ...base, innerRadiusM: 0, outerRadiusM: 0.3, sides: 1 }).torqueNm;
    const inner = rotatingDiscTorque({ ...base, innerRadiusM: 0, outerRadiusM: 0.1, sides: 1 }).torqueNm;
    const ann = rotatingDiscTorque({ ...base, innerRadiusM: 0.1, outerRadiusM: 0.3, sides: 1 }).torqueNm;
    const both = rotatingDiscTorque({ ...base, innerRadiusM: 0.1, outerRadiusM: 0.3, sides: 2 }).torqueNm;
    const exp = outer - inner;
    const tol = 8 * Number.EPSILON * outer;
    expect(Math.abs(ann - exp), `annulus got=${ann} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    expect(Math.abs(both - 2 * ann), `two sides got=${both} expected=${2 * ann}`).toBeLessThanOrEqual(tol);
  });

  it('with transition: laminar inside r_t, turbulent outside, continuous as r_t crosses the rim', () => {
    // r_t = sqrt(Re_t nu / omega) (Schlichting: transition near Re ~ 3e5).
    const R = 0.35;
    const omega = 50;
    const t = rotatingDiscTorque({
      omegaRadPerS: omega,
      innerRadiusM: 0,
      outerRadiusM: R,
      rhoKgPerM3: rho,
      muPaS: mu,
      sides: 2,
    });
    const rt = Math.sqrt((3e5 * nu) / omega);
    expect(
      Math.abs(t.transitionRadiusM - rt),
      `rt got=${t.transitionRadiusM} expected=${rt}`,
    ).toBeLessThanOrEqual(1e-15);
    expect(t.laminarTorqueNm).toBeGreaterThan(0);
    expect(t.laminarTorqueNm).toBeLessThan(t.torqueNm);
    // Transition exactly at the rim: same torque whether the rim is counted laminar or turbulent.
    const reRim = (omega * R * R) / nu;
    const a = rotatingDiscTorque({ ...argsAt(omega, R), transitionReynolds: reRim * (1 - 1e-9) }).torqueNm;
    const b = rotatingDiscTorque({ ...argsAt(omega, R), transitionReynolds: reRim * (1 + 1e-9) }).torqueNm;
    expect(Math.abs(a / b - 1), `a=${a} b=${b} tol(rel)=1e-6`).toBeLessThanOrEqual(1e-6);
  });

  it('is zero at rest and rejects bad radii', () => {
    expect(rotatingDiscTorque({ ...argsAt(0, 0.3) }).torqueNm).toBe(0);
    expect(() => rotatingDiscTorque({ ...argsAt(10, 0.3), innerRadiusM: 0.4 })).toThrow(/outerRadiusM/);
    expect(() => rotatingDiscTorque({ ...argsAt(-1, 0.3) })).toThrow(/omegaRadPerS/);
  });
});

function argsAt(omega: number, R: number) {
  return {
    omegaRadPerS: omega,
    innerRadiusM: 0,
    outerRadiusM: R,
    rhoKgPerM3: rho,
    muPaS: mu,
    sides: 2 as const,
  };
}
