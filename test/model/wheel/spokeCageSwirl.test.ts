import { describe, expect, it } from 'vitest';
import { spokeRowDrag } from '../../../src/model/sections';
import { rowWakeTransportSpeed } from '../../../src/model/sections/rowWakeTransportSpeed';
import { DEFAULT_MODEL_OPTIONS, DEMO_WHEEL, spokeCageSwirl, wheelRadii } from '../../../src/model/wheel';
import { emptyLoads } from '../../../src/model/wheel/componentLoads';
import { spokeLoads } from '../../../src/model/wheel/spokeLoads';

const rho = 1.225;
const mu = 1.7894e-5;
/** The 32-spoke wheel of the `martin-rotation-area` row: R 0.34 m, 23 mm tyre, 20 mm rim, round 2 mm spokes. */
const wheel = {
  ...DEMO_WHEEL,
  outerRadiusM: 0.34,
  tyreWidthM: 0.023,
  rimDepthM: 0.02,
  rimWidthM: 0.02,
  spokeCount: 32,
  spokeSection: 'round' as const,
  spokeDiameterM: 0.002,
  coverFraction: 0,
};
const V = 40 / 3.6;
const point = (airspeedMps: number, yawDeg: number) => ({
  airspeedMps,
  yawRad: (yawDeg * Math.PI) / 180,
  groundSpeedMps: V,
  rhoKgPerM3: rho,
  muPaS: mu,
});

describe('spokeCageSwirl', () => {
  it("head-on, the spokes' merged wake already holds the cage's swirl: nothing is added", () => {
    // Rolling at 40 km/h the air flushed edgewise through the disc at V (Glauert's momentum theory) carries
    // the torque off with a mean swirl of 1-3 % of omega r, far below the 19-54 % at the spoke plane in the
    // merged wake of the spokes ahead (Schlichting's law); the same holds in still air, where the wakes'
    // own spreading flushes the cage. Invariant of the model: mean <= plane swirl, no extra swirl.
    for (const airspeed of [V, 0]) {
      const s = spokeCageSwirl(wheel, wheelRadii(wheel), point(airspeed, 0), DEFAULT_MODEL_OPTIONS);
      expect(s.radiusM.length).toBe(6);
      for (let e = 0; e < s.radiusM.length; e++) {
        const [mean, plane] = [s.meanSwirl[e]!, s.planeSwirl[e]!];
        expect(s.extraSwirl[e], `V=${airspeed} r=${s.radiusM[e]} extra`).toBe(0);
        expect(mean, `V=${airspeed} r=${s.radiusM[e]} mean=${mean} plane=${plane}`).toBeLessThan(plane);
        if (airspeed > 0) expect(mean).toBeLessThan(0.04);
      }
    }
  });

  it("at yaw the wakes leave the plane and the spokes meet the balance's swirl (checked through spokeLoads)", () => {
    // At 15 deg the through-flow carries each spoke's wake off the plane (plane swirl 0) and the spokes
    // meet the mean swirl of Glauert's annulus balance, dQ/dr = 4 pi rho U omega r^3 a', with U the airspeed
    // plus the spreading of their wakes. Independent path: the loads of a thin spoke annulus around each
    // radius (spokeLoads, the whole solve) must give the torque per radius that carries that swirl off.
    // The balance is solved to 1e-4 in the swirl fraction; the thin annulus (+-0.5 mm): 2e-4 absolute.
    const flow = point(V, 15);
    const s = spokeCageSwirl(wheel, wheelRadii(wheel), flow, DEFAULT_MODEL_OPTIONS);
    const omega = V / wheel.outerRadiusM;
    const row = new Float64Array(3);
    for (const e of [0, 2, 5]) {
      const r = s.radiusM[e]!;
      expect(s.planeSwirl[e]!).toBeLessThan(1e-6);
      const a = s.extraSwirl[e]!;
      expect(a, `r=${r}`).toBeGreaterThan(0.005);
      const half = 5e-4;
      const ring = {
        ...wheel,
        hubFlangeRadiusM: r - half,
        rimDepthM: wheel.outerRadiusM - wheel.tyreWidthM - (r + half),
      };
      const out = emptyLoads();
      spokeLoads(ring, wheelRadii(ring), flow, DEFAULT_MODEL_OPTIONS, out);
      const torquePerRadius = out.axleTorqueNm / (2 * half);
      const spacing = (2 * Math.PI * r) / wheel.spokeCount;
      spokeRowDrag(
        true,
        1,
        0.002,
        spacing,
        omega * r,
        flow.airspeedMps * Math.sin(flow.yawRad),
        mu / rho,
        row,
      );
      const u = V + rowWakeTransportSpeed(row[0]! * 0.002, spacing, omega * r);
      const exp = torquePerRadius / (4 * Math.PI * rho * u * omega * r ** 3);
      expect(Math.abs(a - exp), `r=${r} got=${a} expected=${exp} tol=2e-4`).toBeLessThanOrEqual(2e-4);
    }
  });

  it('a wheel without spokes has no cage swirl', () => {
    const bare = { ...wheel, spokeCount: 0 };
    const s = spokeCageSwirl(bare, wheelRadii(bare), point(V, 0), DEFAULT_MODEL_OPTIONS);
    expect(s.radiusM.length).toBe(0);
  });
});
