/** The road panel's tables: the power by term, and the course's segments. */
import type { PowerBreakdown, RideDocument } from '../../compute/ride/index';
import type { Cell, DataTable } from '../dataTable';
import { fixed, speedFromMps, speedUnitText } from '../displayUnits';
import type { SpeedUnit } from '../viewState';

export type RideSegment = NonNullable<RideDocument['segments']>[number];

/** Design minus baseline, null when either is missing. */
export function designMinusBaseline(p: { design: number | null; baseline: number | null }): number | null {
  return p.design === null || p.baseline === null ? null : p.design - p.baseline;
}

export function renderSegmentTable(table: DataTable, segs: readonly RideSegment[], u: SpeedUnit): void {
  const diff = designMinusBaseline;
  const su = speedUnitText(u);
  const rows: Cell[][] = segs.map((s) => [
    s.index + 1,
    s.length_m / 1000,
    s.heading_deg,
    s.gradient * 100,
    s.wind_from_relative_deg,
    s.mean_abs_yaw_deg,
    s.axial_N.design,
    s.axial_N.baseline,
    diff(s.power_W),
    diff(s.time_s),
    s.speed_mps.design === null ? null : speedFromMps(s.speed_mps.design, u),
  ]);
  table.setData(
    [
      { header: 'Segment', decimals: 0 },
      { header: 'Length, km', decimals: 3 },
      { header: 'Heading, deg', decimals: 0 },
      { header: 'Gradient, %', decimals: 2 },
      { header: 'Wind from (relative), deg', decimals: 0 },
      { header: 'Mean |yaw|, deg', decimals: 2 },
      { header: 'Design axial drag, N', decimals: 3 },
      { header: 'Baseline axial drag, N', decimals: 3 },
      { header: 'Power − baseline, W', decimals: 2 },
      { header: 'Time − baseline, s', decimals: 2 },
      { header: `Design speed, ${su}`, decimals: 2 },
    ],
    rows,
  );
}

export function renderBreakdown(table: DataTable, d: RideDocument, u: SpeedUnit): void {
  const terms: Array<[keyof PowerBreakdown, string]> = [
    ['rider_aero_W', 'Rider and bike drag'],
    ['wheel_axial_W', 'This wheel’s axial drag'],
    ['wheel_rotation_W', 'This wheel’s rotation'],
    ['rolling_W', 'Rolling resistance'],
    ['bearing_W', 'Wheel bearings'],
    ['gravity_W', 'Climbing'],
    ['net_W', 'Net at the wheels'],
    ['pedal_W', 'At the pedals'],
  ];
  const b = d.power_breakdown_W;
  table.setCaption(
    `Power at ${fixed(speedFromMps(d.constant_speed_mps ?? Number.NaN, u), 1)} ${speedUnitText(u)}, by term (mean over the ride)`,
  );
  table.setData(
    [
      { header: 'Term' },
      { header: 'Design, W', decimals: 2 },
      { header: 'Baseline, W', decimals: 2 },
      { header: 'Difference, W', decimals: 2 },
    ],
    terms.map(([k, label]) => {
      const x = b.design[k];
      const y = b.baseline[k];
      return [label, x, y, x === null || y === null ? null : x - y];
    }),
  );
}
