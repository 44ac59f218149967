/** The road panel's plots: yaw density over the yaw curves, steering moment vs yaw, per-segment differences. */
import type { RideResponse } from '../../compute/engine/pageJobs';
import type { RideDocument } from '../../compute/ride/index';
import { fixed, fmt, speedFromMps, speedUnitText } from '../displayUnits';
import type { LinePlot, PlotSeries } from '../linePlot';
import { designMinusBaseline, type RideSegment } from './renderRoadTables';
import type { RoadContext } from './roadContext';

const DESIGN_COLOUR = '#c2412d';
const BASELINE_COLOUR = '#111111';
const DENSITY_COLOUR = '#1c6876';

/** Largest yaw worth plotting: where 99.5 % of the riding time is below, at least 30 deg. */
export function yawLimit(d: RideDocument): number {
  let cum = 0;
  let limit = 90;
  for (const b of d.yaw_density) {
    cum += b.density_per_deg;
    if (cum >= 0.995) {
      limit = Math.ceil(b.yaw_deg + 2);
      break;
    }
  }
  return Math.min(90, Math.max(30, limit));
}

export function renderYawPlot(plot: LinePlot, res: RideResponse, ctx: RoadContext): void {
  const d = res.document;
  const c = res.curves;
  const limit = yawLimit(d);
  const curveYaw = Array.from(c.design.yawRad, (y) => Math.round(((y * 180) / Math.PI) * 1e9) / 1e9);
  const xs: number[] = [];
  const dragD: Array<number | null> = [];
  const dragB: Array<number | null> = [];
  const density: Array<number | null> = [];
  const binAt = new Map(d.yaw_density.map((b) => [b.yaw_deg, b.density_per_deg]));
  for (let k = 0; k <= 2 * limit; k++) {
    const x = k / 2;
    xs.push(x);
    const i = curveYaw.indexOf(x);
    dragD.push(i >= 0 ? finite(c.design.axialN[i]!) : null);
    dragB.push(i >= 0 ? finite(c.baseline.axialN[i]!) : null);
    const dens = binAt.get(x);
    density.push(dens === undefined ? null : 100 * dens);
  }
  const su = speedUnitText(ctx.speedUnit);
  const v = `${fmt(speedFromMps(c.referenceSpeedMps, ctx.speedUnit), 3)} ${su}`;
  const series: PlotSeries[] = [
    {
      label: 'design axial drag, N',
      stroke: DESIGN_COLOUR,
      width: 2.4,
      spanGaps: true,
      noPoints: true,
      values: dragD,
    },
    {
      label: 'baseline axial drag, N',
      stroke: BASELINE_COLOUR,
      width: 1.6,
      dash: [6, 4],
      spanGaps: true,
      noPoints: true,
      values: dragB,
    },
    {
      label: 'time at this yaw, % per deg',
      stroke: DENSITY_COLOUR,
      width: 1.6,
      scale: 'y2',
      spanGaps: true,
      noPoints: true,
      values: density,
    },
  ];
  plot.render({
    title: `Yaw at the wheel (density of riding time) over the axial drag vs yaw at ${v}`,
    xLabel: `|Yaw| at the hub, deg — drag at ${v} (airspeed = ground speed), ρ ${fixed(c.rhoKgPerM3, 3)} kg/m³`,
    xLabelShort: `|Yaw|, deg — drag at ${v}`,
    xIsYawDeg: true,
    yLabel: 'Axial drag, N',
    y2Label: 'Riding time, % per deg',
    xs,
    series,
    markerX: d.yaw_p90_deg,
  });
}

export function renderSteering(
  plot: LinePlot,
  figure: HTMLElement,
  handlingText: HTMLElement,
  d: RideDocument,
): void {
  const s = d.steering;
  figure.hidden = s === null;
  if (s === null) {
    handlingText.textContent = '';
    return;
  }
  const limit = yawLimit(d);
  const rows = s.curve.filter((r) => r.yaw_deg <= limit);
  const marks = [...s.design.sign_changes_deg, ...s.design.jumps_deg].filter((x) => x <= limit);
  plot.render({
    title: 'Steering moment vs yaw (front wheel)',
    xLabel: `Yaw, deg — at ${fmt(s.airspeed_mps ?? Number.NaN, 3)} m/s; dotted: the design's sign changes and jumps`,
    xLabelShort: 'Yaw, deg',
    xIsYawDeg: true,
    yLabel: 'Steering moment, N m',
    xs: rows.map((r) => r.yaw_deg),
    series: [
      {
        label: 'design',
        stroke: DESIGN_COLOUR,
        width: 2.4,
        noPoints: true,
        values: rows.map((r) => r.design_Nm),
      },
      {
        label: 'baseline',
        stroke: BASELINE_COLOUR,
        width: 1.6,
        dash: [6, 4],
        noPoints: true,
        values: rows.map((r) => r.baseline_Nm),
      },
    ],
    markersX: { xs: marks, colour: '#b3261e' },
  });
  const list = (xs: number[]) => (xs.length > 0 ? `${xs.map((x) => fixed(x, 1)).join(', ')}°` : 'none');
  const slope = (x: number | null) => (x === null ? '—' : `${fixed(x * 1000, 2)} N mm per degree`);
  handlingText.textContent =
    `Slope at small yaw: design ${slope(s.design.slope_Nm_per_deg)}, baseline ${slope(s.baseline.slope_Nm_per_deg)}. ` +
    `Sign changes: design ${list(s.design.sign_changes_deg)}, baseline ${list(s.baseline.sign_changes_deg)}. ` +
    `Jumps: design ${list(s.design.jumps_deg)}, baseline ${list(s.baseline.jumps_deg)}. ` +
    `Trail ${fixed((d.trail_m.design ?? Number.NaN) * 1000, 1)} mm (from the head angle, fork offset and wheel radius).`;
}

export function renderSegmentPlot(plot: LinePlot, segs: readonly RideSegment[]): void {
  const diff = designMinusBaseline;
  plot.render({
    title: 'Per segment: design − baseline',
    xLabel: 'Segment (in the order ridden); power at the constant speed, time at the constant power',
    xLabelShort: 'Segment',
    yLabel: 'Power, W',
    y2Label: 'Time, s',
    xTickStep: 1,
    xs: segs.map((s) => s.index + 1),
    series: [
      {
        label: 'power − baseline, W',
        stroke: DESIGN_COLOUR,
        width: 2,
        values: segs.map((s) => diff(s.power_W)),
      },
      {
        label: 'time − baseline, s',
        stroke: DENSITY_COLOUR,
        width: 2,
        dash: [6, 4],
        scale: 'y2',
        values: segs.map((s) => diff(s.time_s)),
      },
    ],
  });
}

function finite(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
