import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { RIDE_CAUTIONS } from '../../../src/compute/ride/cautions';
import { evaluateRide } from '../../../src/compute/ride/evaluateRide';
import { solveRide } from '../../../src/compute/ride/index';
import type { RideCurve, RideCurves } from '../../../src/compute/ride/rideCurves';
import { type RideFile, validateRide } from '../../../src/compute/ride/rideFile';
import { logWindProfileRatio } from '../../../src/model/wind/logWindProfileRatio';

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

/** A wheel with a yaw-independent axial coefficient: axial = cdA q at every yaw, side = k sin(yaw) q/q_ref. */
function constantCurve(cdaM2: number, rho: number, vRef: number, sideN = 0): RideCurve {
  const n = 91;
  const yawRad = Float64Array.from({ length: n }, (_, i) =>
    i === n - 1 ? Math.PI / 2 : (i * Math.PI) / 180,
  );
  return {
    yawRad,
    axialN: new Float64Array(n).fill(cdaM2 * 0.5 * rho * vRef * vRef),
    sideN: Float64Array.from(yawRad, (b) => sideN * Math.sin(b)),
    rollMomentNm: Float64Array.from(yawRad, (b) => -0.3 * sideN * Math.sin(b)),
    steeringMomentNm: Float64Array.from(yawRad, (b) => 0.05 * sideN * Math.sin(b)),
    axleTorqueNm: new Float64Array(n),
    referenceAirspeedMps: vRef,
    outerRadiusM: 0.334,
    flags: Array.from(yawRad, () => [] as string[]),
  };
}

function curvesOf(design: RideCurve, baseline: RideCurve, rho: number, v: number): RideCurves {
  return { design, baseline, referenceSpeedMps: v, rhoKgPerM3: rho, referenceSpeedCapped: false };
}

describe('evaluateRide with synthetic curves', () => {
  it('SAE J1252 identity end to end: uniform wind at one speed gives cdA (1 + (w_hub / v)^2) (SAE J1252, 1981)', () => {
    const ride = rideOf((r) => {
      r.ride = { speed_mps: 11, distance_m: 10000 };
      r.wind = { speed_mps: 6, direction_deg: 'uniform' };
    });
    const rho = 1.2;
    const c = constantCurve(0.01, rho, 11);
    const doc = evaluateRide(ride, curvesOf(c, c, rho, 11));
    const wHub = 6 * logWindProfileRatio(0.334, 10, 0.03);
    const exp = 0.01 * (1 + (wHub / 11) ** 2);
    const got = doc.wind_averaged_cda_m2.design!;
    expect(
      Math.abs(got - exp) / exp,
      `w_hub=${wHub} got=${got} expected=${exp} tol=1e-12`,
    ).toBeLessThanOrEqual(1e-12);
    // The largest yaw met is arcsin(w_hub / v) (wind triangle): the 90 % quantile lies below it.
    const maxDeg = (Math.asin(wHub / 11) * 180) / Math.PI;
    expect(doc.yaw_p90_deg!, `p90=${doc.yaw_p90_deg} max=${maxDeg}`).toBeLessThanOrEqual(maxDeg + 1e-9);
    expect(doc.yaw_p90_deg!, `p90=${doc.yaw_p90_deg} max=${maxDeg}`).toBeGreaterThan(0.8 * maxDeg);
    // Same wheel on both sides: no differences (exact).
    expect(doc.delta_power_W).toBe(0);
    expect(doc.delta_time_s).toBe(0);
    // The yaw density integrates to 1 over 0..90 deg.
    const integral = doc.yaw_density.reduce((a, b) => a + b.density_per_deg * 1, 0); // 1-deg bins
    expect(Math.abs(integral - 1), `integral=${integral}`).toBeLessThanOrEqual(1e-9);
  });

  it('in still air at constant power the baseline holds the power exactly, and a drag-area cut changes time by about a third of the aero-power change (common practice, no source)', () => {
    const ride = rideOf((r) => {
      r.ride = { power_W: 350, distance_m: 40000 };
      r.wind = { speed_mps: 0, direction_deg: 0 };
      r.rider.crr = 0.003;
    });
    const rho = 1.2;
    const base = constantCurve(0.012, rho, 12);
    const design = constantCurve(0.006, rho, 12);
    const doc = evaluateRide(ride, curvesOf(design, base, rho, 12));
    // Constant speed is the baseline's speed at 350 W: its pedal power there is 350 W.
    expect(
      Math.abs(doc.power_W.baseline! - 350),
      `baseline power=${doc.power_W.baseline}`,
    ).toBeLessThanOrEqual(1e-6);
    const ratio = doc.delta_time_fraction! / doc.delta_aero_power_fraction!;
    expect(ratio, `time fraction / aero fraction = ${ratio}`).toBeGreaterThan(0.28);
    expect(ratio, `time fraction / aero fraction = ${ratio}`).toBeLessThan(0.34);
    expect(doc.delta_time_s!).toBeLessThan(0);
    expect(doc.aero_share.baseline!).toBeGreaterThan(0.8);
    expect(doc.lean_deg.design).toBe(0);
  });

  it('a rear wheel has no steering summary and its axial force is shielded', () => {
    const ride = rideOf((r) => {
      r.position = 'rear';
      r.rear_shield = 0.5;
      r.ride = { speed_mps: 10, distance_m: 1000 };
      r.wind = { speed_mps: 0, direction_deg: 0 };
    });
    const c = constantCurve(0.01, 1.2, 10);
    const doc = evaluateRide(ride, curvesOf(c, c, 1.2, 10));
    expect(doc.steering).toBeNull();
    const exp = 0.5 * 0.01 * 0.5 * 1.2 * 100;
    expect(
      Math.abs(doc.wind_averaged_axial_N.design! - exp),
      `got=${doc.wind_averaged_axial_N.design} expected=${exp}`,
    ).toBeLessThanOrEqual(1e-12);
  });

  it('a course turns the compass wind into relative directions per segment (wind FROM west, heading north: from the left)', () => {
    const ride = rideOf((r) => {
      r.ride = { speed_mps: 10 };
      r.wind = { speed_mps: 5, direction_deg: 270 };
      r.course = [
        { length_m: 1000, heading_deg: 0, gradient: 0 },
        { length_m: 1000, heading_deg: 90, gradient: 0 },
      ];
    });
    const c = constantCurve(0.01, 1.2, 10, 20);
    const doc = evaluateRide(ride, curvesOf(c, c, 1.2, 10));
    const s = doc.segments!;
    expect(s.length).toBe(2);
    expect(s[0]!.wind_from_relative_deg).toBe(-90);
    expect(s[0]!.yaw_deg!).toBeLessThan(0);
    expect(s[1]!.wind_from_relative_deg).toBe(180);
    expect(Math.abs(s[1]!.yaw_deg!)).toBeLessThanOrEqual(1e-12);
  });
});

describe('solveRide with the wheel model (example file)', () => {
  it('gives finite figures, a disc front with more side force than the spoked wheel, and the cautions', () => {
    const doc = solveRide(rideOf());
    for (const key of ['delta_power_W', 'delta_time_s', 'yaw_p90_deg'] as const) {
      expect(Number.isFinite(doc[key]), `${key}=${doc[key]}`).toBe(true);
    }
    for (const key of [
      'wind_averaged_axial_N',
      'wind_averaged_side_N',
      'lean_deg',
      'gust_impulse_Ns',
    ] as const) {
      expect(
        Number.isFinite(doc[key].design) && Number.isFinite(doc[key].baseline),
        `${key}=${JSON.stringify(doc[key])}`,
      ).toBe(true);
    }
    expect(doc.wind_averaged_side_N.design!).toBeGreaterThan(doc.wind_averaged_side_N.baseline!);
    expect(doc.lean_deg.design!).toBeGreaterThan(doc.lean_deg.baseline!);
    expect(doc.cautions).toEqual([...RIDE_CAUTIONS]);
    expect(doc.steering!.curve.length).toBe(91);
    expect(Math.abs(doc.trail_m.design! - 0.0550579)).toBeLessThanOrEqual(1e-7);
    expect(() => JSON.stringify(doc)).not.toThrow();
  });
});
