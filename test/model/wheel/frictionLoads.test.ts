import { describe, expect, it } from 'vitest';
import { flatPlateFriction, rotatingDiscTorque } from '../../../src/model/friction';
import { DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { emptyLoads } from '../../../src/model/wheel/componentLoads';
import { frictionLoads } from '../../../src/model/wheel/frictionLoads';
import type { FlowConditions, WheelGeometry } from '../../../src/model/wheel/types';

/** The faces' sums as first written: every face's rotating-disc torque computed at every point. */
function everyPoint(wheel: WheelGeometry, p: FlowConditions) {
  const radii = wheelRadii(wheel);
  const vInPlane = p.airspeedMps * Math.cos(p.yawRad);
  const q = 0.5 * p.rhoKgPerM3 * vInPlane * vInPlane;
  const omega = p.groundSpeedMps / radii.outerRadiusM;
  const faces: [number, number, 1 | 2][] = [[radii.rimInnerRadiusM, radii.outerRadiusM, 2]];
  if (radii.coverOuterRadiusM > radii.coverInnerRadiusM) {
    faces.push([radii.coverInnerRadiusM, radii.coverOuterRadiusM, wheel.coverSides]);
  }
  let drag = 0;
  let torque = 0;
  let reynolds = 0;
  for (const [r0, r1, sides] of faces) {
    const area = Math.PI * (r1 * r1 - r0 * r0);
    const re = (p.rhoKgPerM3 * Math.abs(vInPlane) * (area / (2 * r1))) / p.muPaS;
    if (re > reynolds) reynolds = re;
    if (re > 0) drag += flatPlateFriction(re) * q * area * sides;
    if (omega > 0) {
      torque += rotatingDiscTorque({
        omegaRadPerS: omega,
        innerRadiusM: r0,
        outerRadiusM: r1,
        rhoKgPerM3: p.rhoKgPerM3,
        muPaS: p.muPaS,
        sides,
      }).torqueNm;
    }
  }
  return { fxN: -drag * Math.sign(vInPlane), axleTorqueNm: torque, myNm: -torque, reynolds };
}

describe('frictionLoads', () => {
  it('gives the bits of the faces computed afresh at every point, in any order of points', () => {
    // The rotating-disc torque is kept per face while its inputs repeat (a sweep's yaw angles at one
    // ground speed); exact equality against computing it at every point, over interleaved designs,
    // ground speeds (0 too: no rotation), airspeeds and air.
    const wheels = [
      { ...DEMO_WHEEL },
      { ...DEMO_WHEEL, coverFraction: 0.6 },
      { ...DEMO_WHEEL, coverFraction: 0.6, coverSides: 1 as const },
    ];
    for (let i = 0; i < 36; i++) {
      const wheel = wheels[(i * 5) % 3]!;
      const p = {
        airspeedMps: [6, 13.41][i % 2]!,
        yawRad: (((i * 7) % 9) * Math.PI) / 180,
        groundSpeedMps: [13.41, 6, 0, 10][(i >> 1) % 4]!,
        rhoKgPerM3: i % 9 === 8 ? 1.1 : 1.225,
        muPaS: 1.7894e-5,
      };
      const got = emptyLoads();
      const report = frictionLoads(wheel, wheelRadii(wheel), p, got);
      const expected = everyPoint(wheel, p);
      const label = `design ${(i * 5) % 3} V=${p.airspeedMps} ground=${p.groundSpeedMps} yaw=${p.yawRad}`;
      for (const [name, g, x] of [
        ['fxN', got.fxN, expected.fxN],
        ['axleTorqueNm', got.axleTorqueNm, expected.axleTorqueNm],
        ['myNm', got.myNm, expected.myNm],
        ['reynolds', report.reynolds, expected.reynolds],
      ] as const) {
        expect(Object.is(g, x), `${label}: ${name} got=${g} expected=${x} tol=0`).toBe(true);
      }
    }
  });
});
