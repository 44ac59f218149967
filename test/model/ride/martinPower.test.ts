import { describe, expect, it } from 'vitest';
import { MARTIN_EXAMPLE } from '../../../src/compute/validation/referenceValues';
import { martinBearingPowerW } from '../../../src/model/ride/martinBearingPowerW';
import { martinPower } from '../../../src/model/ride/martinPower';

describe('martinPower (Martin, Milliken, Cobb, McFadden & Coggan 1998, J. Appl. Biomech. 14, 276-291)', () => {
  it('reproduces a hand-worked example', () => {
    // Inputs: v_g = 10 m/s in still air (V_A = 10 m/s), rho = 1.2 kg/m^3, C_D A = 0.25 m^2, F_W = 0.0044 m^2,
    // C_RR = 0.004, m = 80 kg, gradient 2 %, g = 9.81 m/s^2, I = 0.14 kg m^2, r = 0.311 m,
    // speed 9.9 -> 10.1 m/s over 20 s, E_C = 0.976.
    // By hand:
    //   P_AT = 0.5 x 1.2 x 0.2544 x 10^2 x 10                    = 152.64 W
    //   P_RR = 10 x cos(atan 0.02) x 0.004 x 80 x 9.81 = 31.392 x 0.99980006 = 31.385724 W
    //   P_WB = 10 x (91 + 87) x 1e-3                            = 1.78 W
    //   P_PE = 10 x 80 x 9.81 x sin(atan 0.02) = 7848 x 0.019996001 = 156.928616 W
    //   P_KE = 0.5 x (80 + 0.14 / 0.311^2) x (10.1^2 - 9.9^2) / 20 = 0.5 x 81.447462 x 0.2 = 8.144746 W
    //   net  = 350.879086 W; P_TOT = 350.879086 / 0.976 = 359.507260 W
    const got = martinPower(MARTIN_EXAMPLE.input);
    const tol = MARTIN_EXAMPLE.tolRel; // relative: the hand values carry 8-9 significant digits
    const e = MARTIN_EXAMPLE.expected;
    const checks: [string, number, number][] = [
      ['aeroW', got.aeroW, e.aeroW],
      ['rollingW', got.rollingW, e.rollingW],
      ['bearingW', got.bearingW, e.bearingW],
      ['gravityW', got.gravityW, e.gravityW],
      ['kineticW', got.kineticW, e.kineticW],
      ['netW', got.netW, e.netW],
      ['totalW', got.totalW, e.totalW],
    ];
    for (const [name, g, e] of checks) {
      expect(Math.abs(g - e) / e, `${name}: got=${g} expected=${e} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });

  it('bearing loss at 10 m/s is 1.78 W (Martin et al. 1998 eq. 5, hand-worked)', () => {
    const got = martinBearingPowerW(10);
    expect(Math.abs(got - 1.78), `got=${got} expected=1.78`).toBeLessThanOrEqual(1e-14);
  });

  it('rejects an efficiency above 1, naming it', () => {
    expect(() =>
      martinPower({
        groundSpeedMps: 10,
        airVelocityAlongMps: 10,
        rhoKgPerM3: 1.2,
        cdaM2: 0.25,
        wheelRotationAreaM2: 0,
        crr: 0.004,
        massKg: 80,
        gradient: 0,
        gravityMps2: 9.81,
        wheelInertiaKgM2: 0.14,
        wheelRadiusM: 0.311,
        initialSpeedMps: 10,
        finalSpeedMps: 10,
        intervalS: 1,
        drivetrainEfficiency: 1.2,
      }),
    ).toThrow(/drivetrainEfficiency=1.2/);
  });
});
