import { describe, expect, it } from 'vitest';
import { planeWakeDeficit, splitterPlateCylinderDrag } from '../../../src/model/sections';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, wheelRadii } from '../../../src/model/wheel';
import { addForceAt, emptyLoads } from '../../../src/model/wheel/componentLoads';
import { rimTyreLoads, rimTyreSection } from '../../../src/model/wheel/rimTyreLoads';
import type { FlowConditions, WheelGeometry } from '../../../src/model/wheel/types';

const RHO = 1.2;
const MU = 1.8e-5;

function axialAt(wheel: WheelGeometry, yawRad: number, V = 12): number {
  const out = emptyLoads();
  rimTyreLoads(
    wheel,
    wheelRadii(wheel),
    { airspeedMps: V, yawRad, groundSpeedMps: V, rhoKgPerM3: RHO, muPaS: MU },
    DEFAULT_MODEL_OPTIONS,
    out,
  );
  return -out.fxN;
}

describe('rimTyreLoads', () => {
  it('front arc alone (rear shielded) integrates to 0.5 rho V^2 Cd t r (4/3)', () => {
    // Crossflow principle (Hoerner, Fluid-Dynamic Drag ch. 3): with u_r = -V cos(theta) the x force of the
    // front half-ring integrates |cos|^3 over half a turn: 4/3 (calculus). The rear arc sits in the front
    // arc's wake; its share lies between 0 (fully shielded) and the front arc's (no wake). So the whole
    // ring lies between 1x and 2x the front arc: checked with the section's Cd from the splitter-plate data.
    const wheel = { ...DEMO_WHEEL };
    const radii = wheelRadii(wheel);
    const section = rimTyreSection(wheel, radii);
    const cd = splitterPlateCylinderDrag(section.plateLengthM / section.thicknessM);
    const V = 12;
    const front = 0.5 * RHO * V * V * cd * section.thicknessM * section.forceRadiusM * (4 / 3);
    const got = axialAt(wheel, 0, V);
    expect(got > front * 1.2 && got < front * 2, `got=${got} front arc=${front}`).toBe(true);
    // Far from the front arc's wake (yaw 20 deg, drift 2 x tan 20 ~ 0.2 m >> wake width ~1 cm) the rear arc
    // is unshielded: the ring gives 2 x front arc x cos^2(beta) (tolerance: the residual wake, 1 %).
    const b = (20 * Math.PI) / 180;
    const yawed = axialAt(wheel, b, V);
    const exp = 2 * front * Math.cos(b) ** 2;
    expect(Math.abs(yawed / exp - 1), `got=${yawed} expected=${exp}`).toBeLessThanOrEqual(0.01);
  });

  it('does not see a rim hidden under a full cover (the section is the cover)', () => {
    // A rim inside a full cover changes neither the section's solid length beyond 7 D (the data's end)
    // nor its thickness: the ring's drag changes only through its mid radius (< 10 %).
    const disc = { ...DEMO_WHEEL, coverFraction: 1, coverSides: 2 as const };
    const shallow = axialAt({ ...disc, rimDepthM: 0.02 }, 0);
    const deep = axialAt({ ...disc, rimDepthM: 0.06 }, 0);
    expect(Math.abs(deep / shallow - 1), `20 mm: ${shallow} N, 60 mm: ${deep} N`).toBeLessThan(0.1);
    const open = axialAt({ ...DEMO_WHEEL, rimDepthM: 0.02 }, 0);
    expect(open, `open ${open} vs covered ${shallow}`).toBeGreaterThan(shallow);
  });

  it('rises as the rear arc leaves the front arc wake with yaw (before cos^2 wins)', () => {
    const wheel = { ...DEMO_WHEEL };
    const at0 = axialAt(wheel, 0);
    const at10 = axialAt(wheel, (10 * Math.PI) / 180);
    expect(at10, `0 deg ${at0} N, 10 deg ${at10} N`).toBeGreaterThan(at0);
  });

  it('gives the bits of the loop that computes every wake at every point, in any order of points', () => {
    // The loop as first written: each rear-arc element's wake deficit evaluated at each point (no
    // shielding kept per ring and yaw), forces added with addForceAt; exact equality over interleaved
    // rings, yaw angles (a reversed in-plane flow too) and airspeeds.
    const loop = (wheel: WheelGeometry, p: FlowConditions) => {
      const out = emptyLoads();
      const section = rimTyreSection(wheel, wheelRadii(wheel));
      const t = section.thicknessM;
      const vInPlane = p.airspeedMps * Math.cos(p.yawRad);
      const cdSection =
        splitterPlateCylinderDrag(section.plateLengthM / t) * DEFAULT_MODEL_OPTIONS.profileDragFactor;
      const drift = Math.abs(Math.tan(p.yawRad));
      const dragLength = cdSection * t;
      const rMid = section.forceRadiusM;
      const arc = (rMid * 2 * Math.PI) / 72;
      for (let k = 0; k < 72; k++) {
        const theta = ((k + 0.5) * 2 * Math.PI) / 72;
        const c = Math.cos(theta);
        const sn = Math.sin(theta);
        const ur = -vInPlane * c;
        let cd = cdSection;
        if (c * Math.sign(vInPlane) < 0) {
          const distance = 2 * rMid * Math.abs(c);
          const deficit = planeWakeDeficit(distance, distance * drift, dragLength);
          cd *= (1 - deficit) * (1 - deficit);
        }
        const f = 0.5 * p.rhoKgPerM3 * cd * t * Math.abs(ur) * ur * arc;
        addForceAt(out, f * c, 0, f * sn, rMid * c, 0, rMid * sn);
      }
      return out;
    };
    const wheels = [
      { ...DEMO_WHEEL },
      { ...DEMO_WHEEL, rimDepthM: 0.08 },
      { ...DEMO_WHEEL, coverFraction: 0.5 },
    ];
    for (let i = 0; i < 40; i++) {
      const wheel = wheels[(i * 5) % 3]!;
      const yawDeg = [0, 2.5, 10, 20, 170][i % 5]!;
      const p = {
        airspeedMps: [6, 13.41, 9][i % 3]!,
        yawRad: (yawDeg * Math.PI) / 180,
        groundSpeedMps: 9,
        rhoKgPerM3: RHO,
        muPaS: MU,
      };
      const got = emptyLoads();
      rimTyreLoads(wheel, wheelRadii(wheel), p, DEFAULT_MODEL_OPTIONS, got);
      const expected = loop(wheel, p);
      for (const key of Object.keys(expected) as (keyof typeof expected)[]) {
        expect(
          Object.is(got[key], expected[key]),
          `ring ${(i * 5) % 3} yaw=${yawDeg} V=${p.airspeedMps} ${key} got=${got[key]} expected=${expected[key]} tol=0`,
        ).toBe(true);
      }
    }
  });
});
