/** Axial drag against covered fraction, one line per yaw angle and airspeed. */
import { fmt, speedFromMps, speedUnitText } from '../displayUnits';
import type { LinePlot, PlotSeries } from '../linePlot';
import { OUTPUTS } from '../outputs';
import { axisOf, type PageResults, pointAt } from './pageResults';
import { compared, comparedLabel, nullIfNaN, type Present, setFigTitle } from './present';

const SPEED_YAW_COLOURS = ['#1c6876', '#c2412d', '#6b4fa0', '#b8860b', '#2e7d32', '#5d4037'];

export function renderCoverPlot(plot: LinePlot, ctx: Present, r: PageResults): void {
  const plan = r.studies.cover;
  const fractions = axisOf(plan, 'coverFraction');
  const speedsMps = axisOf(plan, 'airspeed');
  const yawsDeg = axisOf(plan, 'yaw');
  const mode = ctx.mode;
  const series: PlotSeries[] = [];
  const u = ctx.state.view.speedUnit;
  speedsMps.forEach((v, si) => {
    yawsDeg.forEach((yaw, yi) => {
      const b = r.baseline ? (pointAt(r.baseline.cover, { airspeed: si, yaw: yi }) ?? undefined) : undefined;
      series.push({
        label: `${fmt(yaw)}° at ${fmt(speedFromMps(v, u), 3)} ${speedUnitText(u)}`,
        stroke: SPEED_YAW_COLOURS[yi % SPEED_YAW_COLOURS.length]!,
        width: 1.8,
        ...(si > 0 ? { dash: si === 1 ? [7, 4] : [2, 3] } : {}),
        values: fractions.map((_, fi) => {
          const p = pointAt(r.cover, { coverFraction: fi, airspeed: si, yaw: yi });
          return p ? nullIfNaN(compared(ctx, OUTPUTS.axial, p, b, mode)) : null;
        }),
      });
    });
  });
  const c = ctx.state.case;
  const title =
    mode === 'none'
      ? 'Axial drag (along travel) vs covered fraction'
      : 'Axial drag vs covered fraction, as a difference from the reference baseline';
  setFigTitle('fig-drag-cover', title);
  const placement = c.wheel.cover.placement === 'explicit' ? 'rim' : c.wheel.cover.placement;
  plot.render({
    title,
    xLabel: `Covered fraction (covers at the ${placement}) — ρ ${r.rhoKgPerM3.toFixed(3)} kg/m³; yaw and airspeed per line`,
    xLabelShort: `Covered fraction — ρ ${r.rhoKgPerM3.toFixed(3)} kg/m³`,
    yLabel: comparedLabel(ctx, OUTPUTS.axial, mode),
    xs: [...fractions],
    series,
    markerX: c.wheel.cover.placement === 'explicit' ? null : c.wheel.cover.fraction,
  });
}
