import { describe, expect, it } from 'vitest';
import { MARTIN_EXAMPLE } from '../../../src/compute/validation/referenceValues';
import { martinPower } from '../../../src/model/ride/martinPower';
import { ridePower } from '../../../src/model/ride/ridePower';
import { speedForPower } from '../../../src/model/ride/speedForPower';
import type { RideSetup, WheelYawCurve } from '../../../src/model/ride/types';
import { wheelYawCurveLoads } from '../../../src/model/ride/wheelYawCurveLoads';

function curveOf(axialN: number, torqueNm: number, vRef: number): WheelYawCurve {
  const n = 91;
  const yawRad = Float64Array.from({ length: n }, (_, i) => (i * Math.PI) / 2 / (n - 1));
  return {
    yawRad,
    axialN: new Float64Array(n).fill(axialN),
    sideN: Float64Array.from(yawRad, (b) => 30 * Math.sin(2 * b)),
    rollMomentNm: Float64Array.from(yawRad, (b) => -10 * Math.sin(2 * b)),
    steeringMomentNm: Float64Array.from(yawRad, (b) => 2 * Math.sin(2 * b)),
    axleTorqueNm: new Float64Array(n).fill(torqueNm),
    referenceAirspeedMps: vRef,
    outerRadiusM: 0.334,
  };
}

const setup: RideSetup = {
  massKg: 80,
  riderCdaM2: 0.25,
  crr: 0.004,
  drivetrainEfficiency: 0.976,
  rhoKgPerM3: 1.2,
  gradient: 0.02,
  wheelShield: 1,
  gravityMps2: 9.81,
};

describe('wheelYawCurveLoads', () => {
  it('interpolates linearly in |yaw|, odd loads follow the sign of yaw, loads scale with V^2 (dimensional analysis)', () => {
    const c = curveOf(1, 0.1, 10);
    const out = wheelYawCurveLoads(c, 20, (-0.5 * Math.PI) / 180);
    // Between 0 and 1 deg of the table: side = 4 x (-(30 sin 2deg)/2).
    const exp = 4 * -(30 * Math.sin((2 * Math.PI) / 180)) * 0.5;
    expect(Math.abs(out.sideN - exp), `got=${out.sideN} expected=${exp}`).toBeLessThanOrEqual(1e-12);
    expect(out.axialN).toBe(4);
    expect(out.mirrored).toBe(false);
  });
});

describe('ridePower', () => {
  it('in still air with a load-free wheel equals Martin et al. 1998 without F_W and kinetic terms (hand-checked against martinPower)', () => {
    const got = ridePower(setup, curveOf(0, 0, 10), 10, 0, 0, 0);
    const m = martinPower({
      ...MARTIN_EXAMPLE.input,
      wheelRotationAreaM2: 0,
      initialSpeedMps: 10,
      finalSpeedMps: 10,
      intervalS: 1,
    });
    // Martin's P_TOT for these inputs by hand: (150 + 31.385724 + 1.78 + 156.928616) / 0.976 = 340.094340 / 0.976 = 348.457316 W.
    expect(
      Math.abs(got.pedalW - 348.457316) / 348.457316,
      `got=${got.pedalW} expected=348.457316 tol=2e-7`,
    ).toBeLessThanOrEqual(2e-7);
    expect(
      Math.abs(got.pedalW - m.totalW),
      `ridePower=${got.pedalW} martinPower=${m.totalW}`,
    ).toBeLessThanOrEqual(1e-9);
  });

  it("adds the wheel's power s F v + T v / R (definition of rotational power, axle torque x angular speed)", () => {
    const base = ridePower(setup, curveOf(0, 0, 10), 10, 0, 0, 0);
    const rear = ridePower({ ...setup, wheelShield: 0.75 }, curveOf(2, 0.05, 10), 10, 0, 0, 0);
    const exp = 0.75 * 2 * 10 + (0.05 * 10) / 0.334;
    const got = rear.netW - base.netW;
    expect(Math.abs(got - exp), `got=${got} expected=${exp}`).toBeLessThanOrEqual(1e-10);
  });
});

describe('speedForPower', () => {
  it('inverts a cubic power law exactly: v = (P / k)^(1/3) (closed form)', () => {
    const k = 0.15;
    const got = speedForPower((v) => k * v ** 3, 300, 40, 0.5);
    const exp = (300 / k) ** (1 / 3);
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=1e-8`).toBeLessThanOrEqual(1e-8);
    expect(speedForPower((v) => k * v ** 3, 1e6, 40, 0.5)).toBeNaN();
  });

  it('at constant power a small drag-area change in an aerodynamics-dominated ride changes time by about one third of it (P ~ CdA v^3; common practice, no source)', () => {
    const flat: RideSetup = { ...setup, gradient: 0, crr: 0.002 };
    const c0 = curveOf(0, 0, 12);
    const timeFor = (cda: number) => {
      const s = { ...flat, riderCdaM2: cda };
      return 1 / speedForPower((v) => ridePower(s, c0, v, 0, 0, 0).pedalW, 400, 40, 0.5);
    };
    const t0 = timeFor(0.25);
    const t1 = timeFor(0.25 * 1.01);
    const ratio = (t1 / t0 - 1) / 0.01;
    // Rolling and bearing losses take ~10 % here, so the ratio sits a little below 1/3.
    expect(ratio, `time change / drag-area change got=${ratio} expected ~0.30..0.334`).toBeGreaterThan(0.29);
    expect(ratio, `time change / drag-area change got=${ratio} expected ~0.30..0.334`).toBeLessThanOrEqual(
      1 / 3 + 1e-3,
    );
  });
});
