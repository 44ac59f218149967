/**
 * The report's headline figures of the current design at its first airspeed (the plots' conditions),
 * at the design's yaw angles nearest 0, 10 and 20 degrees: axial drag in N and in grams-force at the
 * reference speed, drag area, side force, centre of pressure, steering moment, the rotational power
 * and the whole aerodynamic power of the wheel, with the lattice's uncertainty of axial and side force.
 *
 * Grams at the reference speed scale the force by the dynamic pressure at the same density,
 * F (V_ref / V)^2 / g0 (the command line's axial_gf_ref; g0 = 9.80665 m/s^2, CGPM 1901). The rotational
 * power is the part of the model's power P = F_x V_ground + T omega that is not axial drag times ground
 * speed: P - F_x V_ground = T omega (design notes section 2; read from the model's own numbers).
 */
import type { PointResult } from '../../compute/study/modelResults';
import { newtonsToGramsForce } from '../../compute/units';
import { speedFromMps, speedUnitText } from '../displayUnits';
import type { SpeedUnit } from '../viewState';
import { formatQuantity as q } from './formatQuantity';
import type { ReportTable } from './reportTypes';

const TARGET_YAWS_DEG = [0, 10, 20];

/** Indices of the points nearest each target yaw, without repeats, in yaw order. */
function yawColumns(points: readonly PointResult[]): number[] {
  const picked = new Set<number>();
  for (const target of TARGET_YAWS_DEG) {
    let best = 0;
    for (let i = 1; i < points.length; i++) {
      const d = Math.abs((points[i]!.yawRad * 180) / Math.PI - target);
      if (d < Math.abs((points[best]!.yawRad * 180) / Math.PI - target)) best = i;
    }
    picked.add(best);
  }
  return [...picked].sort((a, b) => points[a]!.yawRad - points[b]!.yawRad);
}

export function headlineTable(
  points: readonly PointResult[],
  referenceSpeedMps: number,
  speedUnit: SpeedUnit,
): ReportTable {
  if (points.length === 0) throw new RangeError('headlineTable: points must not be empty (no solved design)');
  if (!(referenceSpeedMps > 0)) {
    throw new RangeError(`headlineTable: referenceSpeedMps must be > 0, got ${referenceSpeedMps}`);
  }
  const cols = yawColumns(points).map((i) => points[i]!);
  const ref = q(speedFromMps(referenceSpeedMps, speedUnit), 1, speedUnitText(speedUnit));
  const grams = (p: PointResult) =>
    newtonsToGramsForce((p.axialN * referenceSpeedMps ** 2) / p.airspeedMps ** 2);
  const p0 = cols[0]!;
  return {
    // Name over unit (two lines: the report's table spans the page in 13 columns).
    head: [
      'Yaw',
      'Axial drag\nN',
      `Axial drag\ng at ${ref}`,
      'CdA\ncm²',
      'CdA\nm²',
      '± axial\nN',
      'Side force\nN',
      '± side\nN',
      'CP ahead\nmm',
      'CP above\nmm',
      'Steering\nmoment, N m',
      'Rotation\npower, W',
      'Aero\npower, W',
    ],
    rows: cols.map((p) => [
      q((p.yawRad * 180) / Math.PI, 1, '°'),
      q(p.axialN, 3, ''),
      q(grams(p), 0, ''),
      q(p.cdaAxialM2 * 1e4, 1, ''),
      q(p.cdaAxialM2, 5, ''),
      q(p.uncertaintyAxialN, 3, ''),
      q(p.sideN, 3, ''),
      q(p.uncertaintySideN, 3, ''),
      q(p.cpXM * 1000, 1, ''),
      q(p.cpZM * 1000, 1, ''),
      q(p.steeringMomentNm, 4, ''),
      q(p.powerW - p.axialN * p.groundSpeedMps, 2, ''),
      q(p.powerW, 2, ''),
    ]),
    notes: [
      `One wheel at ${q(speedFromMps(p0.airspeedMps, speedUnit), 1, speedUnitText(speedUnit))} (${q(p0.airspeedMps, 2, 'm/s')}), ground speed ${q(p0.groundSpeedMps, 2, 'm/s')}, ρ ${q(p0.rhoKgPerM3, 3, 'kg/m³')}. Axial drag: along the travel, not wind-axis (it can be negative at yaw). CP: centre of pressure of the side force. Rotation power: axle torque × ω. ±: lattice grid-convergence index. n/a: not defined (no side force) or not computed.`,
    ],
  };
}
