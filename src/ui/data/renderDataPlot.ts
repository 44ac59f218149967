/** The data panel's plots: the data (dots) over the model's band (lines, shaded lattice uncertainty). */
import { type CompareReport, OUTPUT_LABEL, type Output } from '../../compute/compare/index';
import type { PackedComparison } from '../../compute/engine/dataTaskTypes';
import { fixed, fmt, speedFromMps, speedUnitText } from '../displayUnits';
import type { LinePlot, PlotBand, PlotSeries } from '../linePlot';
import type { SpeedUnit } from '../viewState';
import { SPEED_COLOURS } from './dataLabels';
import type { DataPlotName } from './dataPanelTypes';

/** At most this many data points are drawn per plot (an even subsample of larger tables). */
export const MAX_PLOTTED_POINTS = 2000;

/** Every how many data points one is drawn. */
export function dataPlotStride(count: number): number {
  return Math.max(1, Math.ceil(count / MAX_PLOTTED_POINTS));
}

/** The output drawn on each plot: axial (or wind-axis) drag first, side force (or yaw moment) second. */
export function overlayOutput(report: CompareReport, which: DataPlotName): Output {
  const outs = new Set(report.band.map((b) => b.output));
  const first: Output = outs.has('axial_N')
    ? 'axial_N'
    : outs.has('wind_drag_N')
      ? 'wind_drag_N'
      : 'yaw_moment_Nm';
  const second: Output = outs.has('side_N') ? 'side_N' : outs.has('yaw_moment_Nm') ? 'yaw_moment_Nm' : first;
  return which === 'dataForce' ? first : second;
}

export function renderDataPlot(
  plot: LinePlot,
  titleEl: HTMLElement,
  out: Output,
  report: CompareReport,
  conv: PackedComparison['converted'],
  speedUnit: SpeedUnit,
): void {
  const values = conv.values[out];
  /** Every how many data points one is drawn (1 up to MAX_PLOTTED_POINTS points). */
  const stride = dataPlotStride(conv.count);
  const unit = out.endsWith('_Nm') ? 'N m' : 'N';
  const key = (v: number) => v.toPrecision(6);
  const speeds = [...new Map(report.band.map((b) => [key(b.airspeed_mps), b.airspeed_mps])).values()];
  const xsSet = new Set<number>();
  for (const b of report.band) if (b.output === out) xsSet.add(round9(b.yaw_deg));
  if (values)
    for (let i = 0; i < conv.count; i += stride)
      if (!Number.isNaN(values[i]!)) xsSet.add(round9(conv.yaw_deg[i]!));
  const xs = [...xsSet].sort((a, b) => a - b);
  const at = new Map(xs.map((x, i) => [x, i]));
  const series: PlotSeries[] = [];
  const bands: PlotBand[] = [];
  const su = speedUnitText(speedUnit);
  speeds.forEach((v, si) => {
    const colour = SPEED_COLOURS[si % SPEED_COLOURS.length]!;
    const speedText = `${fmt(speedFromMps(v, speedUnit), 3)} ${su}`;
    const model: Array<number | null> = xs.map(() => null);
    const hi: Array<number | null> = xs.map(() => null);
    const lo: Array<number | null> = xs.map(() => null);
    let hasBand = false;
    for (const b of report.band) {
      if (b.output !== out || key(b.airspeed_mps) !== key(v)) continue;
      const i = at.get(round9(b.yaw_deg))!;
      model[i] = b.model;
      if (b.uncertainty !== null) {
        hasBand = true;
        hi[i] = b.model + b.uncertainty;
        lo[i] = b.model - b.uncertainty;
      }
    }
    const data: Array<number | null> = xs.map(() => null);
    const speedKey = key(v);
    if (values)
      for (let i = 0; i < conv.count; i += stride) {
        const y = values[i]!;
        if (Number.isNaN(y) || key(conv.airspeed_mps[i]!) !== speedKey) continue;
        data[at.get(round9(conv.yaw_deg[i]!))!] = y;
      }
    series.push({
      label: `model ${speedText}`,
      stroke: colour,
      width: 1.8,
      spanGaps: true,
      noPoints: true,
      values: model,
    });
    if (hasBand) {
      series.push({
        label: `model ${speedText} + lattice GCI`,
        stroke: `${colour}55`,
        width: 0.8,
        spanGaps: true,
        noPoints: true,
        noLegend: true,
        values: hi,
      });
      series.push({
        label: `model ${speedText} − lattice GCI`,
        stroke: `${colour}55`,
        width: 0.8,
        spanGaps: true,
        noPoints: true,
        noLegend: true,
        values: lo,
      });
      bands.push({ upper: series.length - 2, lower: series.length - 1, fill: `${colour}22` });
    }
    series.push({ label: `data ${speedText}`, stroke: colour, pointsOnly: true, values: data });
    const unc = report.uncertainty;
    if (unc) {
      const uhi: Array<number | null> = xs.map(() => null);
      const ulo: Array<number | null> = xs.map(() => null);
      for (const r of unc.rows) {
        if (r.output !== out || key(r.airspeed_mps) !== key(v)) continue;
        const i = at.get(round9(r.yaw_deg));
        if (i === undefined) continue;
        uhi[i] = r.upper;
        ulo[i] = r.lower;
      }
      series.push({
        label: `inputs ${unc.percentiles[0]}–${unc.percentiles[1]} %, ${speedText}`,
        stroke: colour,
        width: 1,
        dash: [2, 3],
        spanGaps: true,
        noPoints: true,
        values: uhi,
      });
      series.push({
        label: `inputs ${unc.percentiles[0]}–${unc.percentiles[1]} %, ${speedText} (low)`,
        noLegend: true,
        stroke: colour,
        width: 1,
        dash: [2, 3],
        spanGaps: true,
        noPoints: true,
        values: ulo,
      });
      bands.push({ upper: series.length - 2, lower: series.length - 1, fill: `${colour}18` });
    }
  });
  const label = OUTPUT_LABEL[out];
  const sampled =
    stride > 1 ? `; every ${stride}th of ${conv.count.toLocaleString('en')} data points drawn` : '';
  const title = `${label[0]!.toUpperCase()}${label.slice(1)} vs yaw: data (dots) over the model (lines; shaded: ± lattice uncertainty${report.uncertainty ? ', dotted: input-uncertainty band' : ''}${sampled})`;
  titleEl.textContent = title;
  plot.render({
    title,
    xLabel: `Yaw, deg — model at the data's airspeeds and air density (ρ ${fixed(conv.count > 0 ? conv.air_density_kgpm3[0]! : Number.NaN, 3)} kg/m³)`,
    xLabelShort: 'Yaw, deg',
    xIsYawDeg: true,
    yLabel: `${label[0]!.toUpperCase()}${label.slice(1)}, ${unit}`,
    xs,
    series,
    bands,
  });
}

function round9(x: number): number {
  return Math.round(x * 1e9) / 1e9;
}
