/** The yaw plots: axial drag and side force of the family and the design, and the handling plot. */
import { fmt, unitText } from '../displayUnits';
import type { LinePlot, PlotSeries } from '../linePlot';
import { OUTPUTS, type OutputSpec } from '../outputs';
import type { DifferenceMode } from '../viewState';
import { axisOf, casePoints, mainPoints, type PageResults } from './pageResults';
import {
  compared,
  comparedLabel,
  conditionsText,
  display,
  nullIfNaN,
  type Present,
  setFigTitle,
} from './present';

export const CURRENT_COLOUR = '#c2412d';
export const BASELINE_COLOUR = '#111111';

/** Family colours from light to dark blue-green by covering fraction (our own ramp). */
function familyColour(k: number, n: number): string {
  const t = n <= 1 ? 1 : k / (n - 1);
  const a = [132, 188, 196];
  const b = [16, 58, 88];
  const c = a.map((x, i) => Math.round(x + (b[i]! - x) * t));
  return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
}

export interface YawPlots {
  dragYaw: LinePlot;
  sideYaw: LinePlot;
  handling: LinePlot;
}

export function renderYawPlots(plots: YawPlots, ctx: Present, r: PageResults): void {
  const u = ctx.units;
  const c = ctx.state.case;
  const yaws = [...c.conditions.yaw_deg];
  const pts = mainPoints(r);
  const mode = ctx.mode;
  const basePts = (r.baseline && casePoints(r.baseline.curve)) ?? undefined;
  const cond = conditionsText(ctx, c.conditions.airspeed_mps[0]!, r.rhoKgPerM3);
  const xLabel = `Yaw angle, deg — ${cond}`;
  const xLabelShort = `Yaw, deg — ${conditionsText(ctx, c.conditions.airspeed_mps[0]!, r.rhoKgPerM3, true)}`;
  const fractions = axisOf(r.studies.family, 'coverFraction');
  const famSeries = (spec: OutputSpec, m: DifferenceMode): PlotSeries[] =>
    fractions.map((f, k) => ({
      label: `cover ${fmt(f, 3)}`,
      stroke: familyColour(k, fractions.length),
      width: 1.2,
      values:
        casePoints(r.family, { coverFraction: k })?.map((p, i) =>
          nullIfNaN(compared(ctx, spec, p, basePts?.[i], m)),
        ) ?? yaws.map(() => null),
    }));
  const currentLabel = `this design (cover ${fmt(c.wheel.cover.fraction, 3)}, ${c.wheel.cover.placement})`;
  // Axial drag vs yaw.
  const dragSeries = famSeries(OUTPUTS.axial, mode);
  dragSeries.push({
    label: currentLabel,
    stroke: CURRENT_COLOUR,
    width: 2.6,
    values: pts.map((p, i) => nullIfNaN(compared(ctx, OUTPUTS.axial, p, basePts?.[i], mode))),
  });
  if (basePts && mode === 'none') {
    dragSeries.push({
      label: 'baseline',
      stroke: BASELINE_COLOUR,
      width: 1.8,
      dash: [6, 4],
      values: basePts.map((p) => nullIfNaN(display(ctx, OUTPUTS.axial, p))),
    });
  }
  const dragTitle =
    mode === 'none'
      ? 'Axial drag (along travel) vs yaw'
      : 'Axial drag vs yaw, as a difference from the baseline';
  setFigTitle('fig-drag-yaw', dragTitle);
  plots.dragYaw.render({
    title: dragTitle,
    xLabel,
    xLabelShort,
    yLabel: comparedLabel(ctx, OUTPUTS.axial, mode),
    xs: yaws,
    xIsYawDeg: true,
    series: dragSeries,
  });
  // Side force vs yaw.
  const sideSeries = famSeries(OUTPUTS.side, 'none');
  sideSeries.push({
    label: currentLabel,
    stroke: CURRENT_COLOUR,
    width: 2.6,
    values: pts.map((p) => nullIfNaN(display(ctx, OUTPUTS.side, p))),
  });
  if (basePts) {
    sideSeries.push({
      label: 'baseline',
      stroke: BASELINE_COLOUR,
      width: 1.8,
      dash: [6, 4],
      values: basePts.map((p) => nullIfNaN(display(ctx, OUTPUTS.side, p))),
    });
  }
  setFigTitle('fig-side-yaw', 'Side force vs yaw');
  plots.sideYaw.render({
    title: 'Side force vs yaw',
    xLabel,
    xLabelShort,
    yLabel: `Side force, ${unitText('force', u)}`,
    xs: yaws,
    xIsYawDeg: true,
    series: sideSeries,
  });
  // Centre of pressure and steering moment.
  const handling: PlotSeries[] = [
    {
      label: 'CP ahead of hub, mm',
      stroke: '#1c6876',
      width: 2,
      values: pts.map((p) => nullIfNaN(p.cpXM * 1000)),
    },
    {
      label: 'CP above hub, mm',
      stroke: '#6b4fa0',
      width: 2,
      values: pts.map((p) => nullIfNaN(p.cpZM * 1000)),
    },
    {
      label: 'steering moment, N m',
      stroke: CURRENT_COLOUR,
      width: 2.4,
      scale: 'y2',
      values: pts.map((p) => nullIfNaN(p.steeringMomentNm)),
    },
  ];
  if (basePts) {
    handling.push({
      label: 'baseline steering moment, N m',
      stroke: BASELINE_COLOUR,
      width: 1.6,
      dash: [6, 4],
      scale: 'y2',
      values: basePts.map((p) => nullIfNaN(p.steeringMomentNm)),
    });
  }
  const s = c.steering;
  const handlingTitle = `Centre of pressure and steering moment vs yaw (head ${fmt(s.head_angle_deg)}°, offset ${fmt(s.fork_offset_m * 1000)} mm)`;
  setFigTitle('fig-handling', handlingTitle);
  plots.handling.render({
    title: handlingTitle,
    xLabel,
    xLabelShort,
    yLabel: 'Centre of pressure, mm',
    y2Label: 'Steering moment, N m',
    xs: yaws,
    xIsYawDeg: true,
    series: handling,
  });
}
