/**
 * The ride and handling figures of an evaluated ride, as the road panel shows them: each for the design,
 * the ride's baseline and their difference, with units (watts at the constant speed, time at the
 * constant power, wind-averaged axial drag in N and grams at the reference speed, the aerodynamic share
 * of the power, yaw met at the hub, lean and gust impulse in the design gust, trail, and for a front
 * wheel the steering moment's slope and sign changes). Grams from the wind-averaged drag area at the
 * reference speed and the ride's air density (dragAreaToGramsForce, as the road panel).
 */
import type { Pair, RideDocument } from '../../compute/ride/index';
import { dragAreaToGramsForce } from '../../compute/units';
import { speedFromMps, speedUnitText } from '../displayUnits';
import type { SpeedUnit } from '../viewState';
import { formatQuantity as q } from './formatQuantity';
import type { ReportTable } from './reportTypes';

const num = (x: number | null | undefined) => (x === null || x === undefined ? Number.NaN : x);

function pairRow(label: string, p: Pair, f: (x: number) => string, scale = 1): string[] {
  const d = num(p.design) * scale;
  const b = num(p.baseline) * scale;
  return [label, f(d), f(b), f(d - b)];
}

function degList(xs: readonly number[]): string {
  return xs.length > 0 ? xs.map((x) => q(x, 1, '°')).join(', ') : 'none';
}

export function rideTable(d: RideDocument, speedUnit: SpeedUnit, referenceSpeedMps: number): ReportTable {
  if (!(referenceSpeedMps > 0)) {
    throw new RangeError(`rideTable: referenceSpeedMps must be > 0, got ${referenceSpeedMps}`);
  }
  const su = speedUnitText(speedUnit);
  const rho = num(d.air_density_kgpm3);
  const speed = q(speedFromMps(num(d.constant_speed_mps), speedUnit), 1, su);
  const ref = q(speedFromMps(referenceSpeedMps, speedUnit), 1, su);
  const grams: Pair = {
    design: dragAreaToGramsForce(num(d.wind_averaged_cda_m2.design), referenceSpeedMps, rho),
    baseline: dragAreaToGramsForce(num(d.wind_averaged_cda_m2.baseline), referenceSpeedMps, rho),
  };
  const rows = [
    pairRow(`Power at ${speed} (constant speed)`, d.power_W, (x) => q(x, 1, 'W')),
    pairRow(
      `Time over ${q(d.distance_m / 1000, 2, 'km')} at ${q(num(d.constant_power_W), 0, 'W')}`,
      d.time_s,
      (x) => q(x, 1, 's'),
    ),
    pairRow(`Wind-averaged axial drag at ${speed}`, d.wind_averaged_axial_N, (x) => q(x, 3, 'N')),
    pairRow(`Wind-averaged axial drag, grams at ${ref}`, grams, (x) => q(x, 0, 'g')),
    pairRow('Wind-averaged side force (magnitude)', d.wind_averaged_side_N, (x) => q(x, 3, 'N')),
    pairRow('Aerodynamic share of the power', d.aero_share, (x) => q(x, 1, '%'), 100),
    pairRow(`Lean to hold a ${q(d.gust.factor, 2, '×')} gust`, d.lean_deg, (x) => q(x, 2, '°')),
    pairRow(`Gust impulse (${q(d.gust.duration_s, 2, 's')})`, d.gust_impulse_Ns, (x) => q(x, 2, 'N s')),
    pairRow('Trail', d.trail_m, (x) => q(x, 1, 'mm'), 1000),
  ];
  const s = d.steering;
  if (s !== null) {
    rows.push(
      pairRow(
        `Steering moment slope at small yaw (${q(num(s.airspeed_mps), 2, 'm/s')})`,
        { design: s.design.slope_Nm_per_deg, baseline: s.baseline.slope_Nm_per_deg },
        (x) => q(x, 2, 'N mm/°'),
        1000,
      ),
    );
    rows.push([
      'Steering moment sign changes',
      degList(s.design.sign_changes_deg),
      degList(s.baseline.sign_changes_deg),
      '',
    ]);
  }
  const notes = [
    `Yaw at the wheel: 90 % of the riding time below ${q(num(d.yaw_p90_deg), 1, '°')}, mean ${q(num(d.yaw_mean_deg), 1, '°')}; ${q(num(d.yaw_beyond_validity_fraction) * 100, 1, '%')} of the time beyond the model's trusted yaw. Wind ${q(num(d.wind.mean_speed_mps), 1, 'm/s')} at the station height, ${q(num(d.wind.hub_mean_speed_mps), 2, 'm/s')} at the ${q(d.wind.hub_height_m, 3, 'm')} hub; ${d.position} wheel.`,
  ];
  if (s === null) notes.push('Rear wheel: no steering moment.');
  for (const f of d.flags) notes.push(`Flag: ${f}`);
  return { head: ['Ride figure', 'design', 'baseline', 'design −\nbaseline'], rows, notes };
}
