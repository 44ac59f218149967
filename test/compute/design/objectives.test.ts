import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { designContext } from '../../../src/compute/design/designContext';
import { evaluateDesign } from '../../../src/compute/design/evaluateDesign';
import { OBJECTIVES } from '../../../src/compute/design/objectives/index';
import { J1252_WIND_MPS, j1252AxialN } from '../../../src/compute/design/objectives/j1252AxialN';
import { sideP90N } from '../../../src/compute/design/objectives/sideP90N';
import { rideHubStates } from '../../../src/compute/design/rideHubStates';
import type { DesignContext, DesignRide } from '../../../src/compute/design/types';
import {
  type RideCurve,
  type RideDocument,
  type RideFile,
  solveRide,
  validateRide,
} from '../../../src/compute/ride/index';

// biome-ignore lint/suspicious/noExplicitAny: a free-form JSON document edited by the tests
type Ride = Record<string, any>;
const example = JSON.parse(
  readFileSync(new URL('../../../public/examples/ride.json', import.meta.url), 'utf8'),
);

function rideOf(change: (r: Ride) => void = () => {}): RideFile {
  const r = structuredClone(example);
  change(r);
  const p = validateRide(r);
  if (!p.ok) throw new Error(p.errors.join('\n'));
  return p.value;
}

/** Axial force cdA q and side force sideN sin(yaw) q / q_ref at every yaw (loads scale with q). */
function syntheticCurve(cdaM2: number, rho: number, vRef: number, sideN: number): RideCurve {
  const n = 91;
  const yawRad = Float64Array.from({ length: n }, (_, i) =>
    i === n - 1 ? Math.PI / 2 : (i * Math.PI) / 180,
  );
  return {
    yawRad,
    axialN: new Float64Array(n).fill(cdaM2 * 0.5 * rho * vRef * vRef),
    sideN: Float64Array.from(yawRad, (b) => sideN * Math.sin(b)),
    rollMomentNm: new Float64Array(n),
    steeringMomentNm: new Float64Array(n),
    axleTorqueNm: new Float64Array(n),
    referenceAirspeedMps: vRef,
    outerRadiusM: 0.334,
    flags: Array.from(yawRad, () => [] as string[]),
  };
}

function syntheticRide(ride: RideFile, curve: RideCurve, speedMps: number, rho: number): DesignRide {
  const context = {
    ride,
    rhoKgPerM3: rho,
    hubStates: rideHubStates(ride),
    gustDirectionsRad: [],
  } as unknown as DesignContext;
  const doc = { constant_speed_mps: speedMps, shield: 1 } as RideDocument;
  return { ride, doc, curve, context };
}

describe('ride objectives against independent checks', () => {
  it('SAE J1252 (1981): a yaw-independent cdA averages to cdA q_ground (1 + (w / v)^2) over uniform directions, w = 7 mph', () => {
    const rho = 1.2;
    const v = 11;
    const cda = 0.012;
    const got = j1252AxialN.compute(syntheticRide(rideOf(), syntheticCurve(cda, rho, 10, 0), v, rho));
    const expected = cda * 0.5 * rho * v * v * (1 + (J1252_WIND_MPS / v) ** 2);
    const tol = 1e-12;
    expect(
      Math.abs(got / expected - 1),
      `v ${v} m/s: got ${got} N, expected ${expected} N, tolerance ${tol} relative`,
    ).toBeLessThan(tol);
    expect(J1252_WIND_MPS).toBeCloseTo(3.12928, 5); // 7 mph = 7 x 0.44704 m/s (exact by definition of the mile)
  });

  it('90th-percentile side force of a one-state wind equals the wind triangle by hand: |F| = s w |sin psi| V_a / v_ref^2', () => {
    const rho = 1.2;
    const vRef = 10;
    const s = 20;
    const w = 4;
    const psiDeg = 70;
    const ride = rideOf((r) => {
      r.wind = {
        speed_mps: w,
        direction_deg: psiDeg,
        reference_height_m: 1,
        hub_height_m: 1,
        roughness_length_m: 0.03,
      };
    });
    const v = 12;
    const got = sideP90N.compute(syntheticRide(ride, syntheticCurve(0, rho, vRef, s), v, rho));
    const psi = (psiDeg * Math.PI) / 180;
    const va = Math.hypot(v + w * Math.cos(psi), w * Math.sin(psi));
    const expected = (s * w * Math.abs(Math.sin(psi)) * va) / (vRef * vRef);
    // The curve is tabulated every 1 deg and read by interpolation: sin(yaw) between nodes is within 2e-5.
    const tol = 1e-4;
    expect(
      Math.abs(got / expected - 1),
      `got ${got} N, expected ${expected} N, tolerance ${tol} relative`,
    ).toBeLessThan(tol);
  });

  it("time, power, wind-averaged drag and lean equal the ride's own result for the same design (two paths)", () => {
    const ride = rideOf();
    const doc = solveRide(ride);
    const e = evaluateDesign(designContext(ride), ride.design, {});
    expect(e.objectives.time_s).toBe(doc.time_s.design);
    expect(e.objectives.power_W).toBe(doc.power_W.design);
    expect(e.objectives.wind_axial_N).toBe(doc.wind_averaged_axial_N.design);
    expect(e.objectives.lean_gust_deg).toBe(Math.abs(doc.lean_deg.design!));
    expect(e.objectives.side_gust_N).toBe(Math.abs(doc.gust.side_N.design!));
    expect(Object.keys(e.objectives)).toEqual(OBJECTIVES.map((o) => o.id));
  });

  it('handling figures grow with the wind; the J1252 figure at a given speed does not depend on the ride wind', () => {
    const lattice = { span: 12, chord: 6 };
    const rows = [2, 4, 6].map((w) => {
      const ride = rideOf((r) => {
        r.ride = { speed_mps: 11, distance_m: 40000 };
        r.wind.speed_mps = w;
        r.design.cover.fraction = 0.6;
      });
      return evaluateDesign(designContext(ride, lattice), ride.design, {}).objectives;
    });
    for (const id of ['side_p90_N', 'side_gust_N', 'steering_gust_Nm', 'lean_gust_deg', 'power_W']) {
      const values = rows.map((r) => r[id]!);
      expect(
        values[1]! > values[0]! && values[2]! > values[1]!,
        `${id} at wind 2, 4, 6 m/s: ${values.join(', ')}`,
      ).toBe(true);
    }
    expect(rows[1]!.j1252_axial_N).toBe(rows[0]!.j1252_axial_N);
    expect(rows[2]!.j1252_axial_N).toBe(rows[0]!.j1252_axial_N);
  });

  it('a rear wheel has no steering-moment objective', () => {
    const ride = rideOf((r) => {
      r.position = 'rear';
    });
    const e = evaluateDesign(designContext(ride, { span: 8, chord: 4 }), ride.design, {});
    expect('steering_gust_Nm' in e.objectives).toBe(false);
    expect(Number.isFinite(e.objectives.time_s)).toBe(true);
  });
});
