import { describe, expect, it } from 'vitest';
import { cageSwirlFraction } from '../../../src/model/wheel/cageSwirlFraction';

describe('cageSwirlFraction', () => {
  it("recovers the swirl of Glauert's ideal rotor from its annulus torque", () => {
    // Glauert's ideal rotor with wake rotation (J. F. Manwell, J. G. McGowan, A. L. Rogers, Wind Energy
    // Explained, ch. 3, from memory): at axial induction a = 0.3 the tangential induction is
    // a' = (1 - 3a) / (4a - 1) = 0.5 at local speed ratio lambda_r^2 = (1 - a)(4a - 1)^2 / (1 - 3a) = 0.28,
    // and blade-element momentum theory gives the annulus torque dQ = 4 a' (1 - a) rho U pi r^3 Omega dr
    // (the air passing the disc at U (1 - a)). Fed that torque and that through-flow, the balance must give
    // a' back. Exact formula: 1e-12 relative.
    const a = 0.3;
    const aPrime = (1 - 3 * a) / (4 * a - 1);
    const lambdaR2 = ((1 - a) * (4 * a - 1) ** 2) / (1 - 3 * a);
    // The quoted pair satisfies Glauert's relation a'(1 + a') lambda_r^2 = a (1 - a) (guards the memory).
    expect(Math.abs(aPrime * (1 + aPrime) * lambdaR2 - a * (1 - a))).toBeLessThan(1e-12);
    const rho = 1.225;
    const windMps = 8;
    const r = 12;
    const omega = (Math.sqrt(lambdaR2) * windMps) / r;
    const torquePerRadius = 4 * aPrime * (1 - a) * rho * windMps * Math.PI * r ** 3 * omega;
    const got = cageSwirlFraction(torquePerRadius, r, omega, windMps * (1 - a), rho);
    expect(Math.abs(got / aPrime - 1), `got=${got} expected=${aPrime} tol(rel)=1e-12`).toBeLessThanOrEqual(
      1e-12,
    );
  });

  it('is the angular momentum the flushed air carries off: torque = mass flow x far-wake swirl x r', () => {
    // Invariant (Euler's turbine equation for the annulus): dQ/dr = (rho U 2 pi r)(2 a' omega r) r.
    const rho = 1.2;
    const r = 0.2;
    const omega = 30;
    const u = 11;
    const got = cageSwirlFraction(0.05, r, omega, u, rho);
    const back = rho * u * 2 * Math.PI * r * (2 * got * omega * r) * r;
    expect(Math.abs(back / 0.05 - 1), `got=${back} expected=0.05`).toBeLessThanOrEqual(1e-12);
  });

  it('names the field and the rule of bad input', () => {
    expect(() => cageSwirlFraction(-1, 0.2, 30, 10, 1.2)).toThrow(
      /torquePerRadiusNmPerM=-1: must be finite and >= 0/,
    );
    expect(() => cageSwirlFraction(1, 0, 30, 10, 1.2)).toThrow(/radiusM=0/);
    expect(() => cageSwirlFraction(1, 0.2, 0, 10, 1.2)).toThrow(/omegaRadPerS=0/);
    expect(() => cageSwirlFraction(1, 0.2, 30, 0, 1.2)).toThrow(/throughflowMps=0: must be finite and > 0/);
    expect(() => cageSwirlFraction(1, 0.2, 30, 10, Number.NaN)).toThrow(/rhoKgPerM3=NaN/);
  });
});
