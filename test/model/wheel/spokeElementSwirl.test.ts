import { describe, expect, it } from 'vitest';
import { rowWakeTransportSpeed, spokeRowDrag } from '../../../src/model/sections';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { cageSwirlFraction } from '../../../src/model/wheel/cageSwirlFraction';
import { emptyLoads } from '../../../src/model/wheel/componentLoads';
import {
  SPOKE_ANGLE_STEPS,
  type SpokeRow,
  spokeAnnulusLoads,
} from '../../../src/model/wheel/spokeAnnulusLoads';
import { spokeElementSwirl } from '../../../src/model/wheel/spokeElementSwirl';
import { spokeElements } from '../../../src/model/wheel/spokeElements';
import { spokeLoads } from '../../../src/model/wheel/spokeLoads';
import { spokeRowOf } from '../../../src/model/wheel/spokeRowOf';

const rho = 1.225;
const mu = 1.7894e-5;

/**
 * Independent reference: the full consistent solution at one radius, by bisection (50 halvings) on
 * g(x) = 1 - (1 - x)(1 - delta) - a'(dQ/dr at spin omega r (1 - x)), every g evaluated with the spokes'
 * loads (drag coefficients and wake shielding included) at that spin; returns the loads [fx, fz, torque]
 * at the root, unit length, and the root.
 */
function exact(spokes: SpokeRow, r: number, omega: number, v: number, scale: number) {
  const spin = omega * r;
  const sums = new Float64Array(8);
  const loads = (x: number) => {
    sums.fill(0);
    sums[3] = Number.POSITIVE_INFINITY;
    spokeAnnulusLoads(spokes, r, spin * (1 - x), 1, sums);
    return [sums[0]!, sums[1]!, sums[2]!];
  };
  const row = new Float64Array(3);
  const s = spokes.spacingPerRadius * r;
  spokeRowDrag(
    spokes.round,
    spokes.thicknessRatio,
    spokes.refLengthM,
    s,
    spin,
    spokes.vNormalMps,
    spokes.nuM2PerS,
    row,
  );
  const delta = 1 - Math.sqrt(row[1]!);
  const u = v + rowWakeTransportSpeed(row[0]! * spokes.refLengthM, s, spin);
  const g = (x: number) =>
    1 - (1 - x) * (1 - delta) - cageSwirlFraction(Math.max(0, loads(x)[2]! * scale), r, omega, u, rho);
  if (g(0) >= 0) return { x: 0, loads: loads(0) };
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 50; i++) {
    const mid = 0.5 * (lo + hi);
    if (g(mid) < 0) lo = mid;
    else hi = mid;
  }
  const x = 0.5 * (lo + hi);
  return { x, loads: loads(x) };
}

describe('spokeElementSwirl', () => {
  it("gives the wheel's spoke loads within 1 % of the full consistent solution over the validity range", () => {
    // Yaw 0-30 deg, ground speed / airspeed 0.25-3, 16-48 spokes, round and bladed, the demo wheel: the
    // whole wheel's spoke forces (to the in-plane resultant) and torque with the swirl solved at frozen
    // drag coefficients and shieldings, against every element solved with them re-evaluated. Stated
    // bound 1 % (0.5 % seen at worst, where a through-flow moves the wakes to the edge of the next spoke);
    // the swirl itself moves the loads by 1-5 %, and the section laws carry a 5-17 % bias.
    let worst = 0;
    let swirled = 0;
    for (const section of ['round', 'bladed'] as const) {
      for (const count of [16, 32, 48]) {
        const wheel = { ...DEMO_WHEEL, spokeSection: section, spokeCount: count, coverFraction: 0 };
        const radii = wheelRadii(wheel);
        const elements = spokeElements(wheel, radii, DEFAULT_MODEL_OPTIONS);
        for (const yawDeg of [0, 2, 5, 15, 30]) {
          for (const ratio of [0.25, 1, 3]) {
            const v = 12;
            const point = {
              airspeedMps: v,
              yawRad: (yawDeg * Math.PI) / 180,
              groundSpeedMps: ratio * v,
              rhoKgPerM3: rho,
              muPaS: mu,
            };
            const spokes = spokeRowOf(wheel, point);
            const omega = point.groundSpeedMps / radii.outerRadiusM;
            const scale = (count / SPOKE_ANGLE_STEPS) * DEFAULT_MODEL_OPTIONS.profileDragFactor;
            const ref = [0, 0, 0];
            const out = new Float64Array(8);
            for (let e = 0; e < elements.radiusM.length; e++) {
              const r = elements.radiusM[e]!;
              const solved = exact(spokes, r, omega, v, scale);
              for (let i = 0; i < 3; i++) ref[i]! += solved.loads[i]! * elements.weightM[e]! * scale;
              spokeElementSwirl(spokes, r, omega, v, scale, out);
              if (solved.x > 0) {
                swirled++;
                expect(out[0]!, `r=${r}: the same elements meet an extra swirl`).toBeGreaterThan(0);
              }
            }
            const got = emptyLoads();
            spokeLoads(wheel, radii, point, DEFAULT_MODEL_OPTIONS, got);
            const force = Math.hypot(ref[0]!, ref[1]!);
            const err = Math.max(
              Math.abs(got.fxN - ref[0]!) / force,
              Math.abs(got.fzN - ref[1]!) / force,
              Math.abs(got.axleTorqueNm - ref[2]!) / Math.abs(ref[2]!),
            );
            worst = Math.max(worst, err);
            const label = `${section} N=${count} yaw=${yawDeg} ratio=${ratio}: got fx ${got.fxN} fz ${got.fzN} T ${got.axleTorqueNm}, expected ${ref.join(' ')}, tol(rel)=1e-2`;
            expect(err, label).toBeLessThanOrEqual(1e-2);
          }
        }
      }
    }
    // The sweep reaches the regime it is about: swirl added in many elements.
    expect(swirled).toBeGreaterThan(200);
    expect(worst).toBeLessThanOrEqual(1e-2);
  });
});
