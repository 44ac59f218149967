/**
 * The yaw plots: axial drag and side force of the family, the design and every pinned baseline, and
 * the handling plot; the imported data as markers where its case matches (views/dataOverlay).
 */
import type { PointResult } from '../../compute/study/modelResults';
import { baselineLabel } from '../baselines/baselineLabel';
import { BASELINE_STYLES, pinnedBaselines, referenceIndex } from '../baselines/pinnedBaselines';
import { fmt, unitText } from '../displayUnits';
import type { LinePlot, PlotSeries } from '../linePlot';
import { OUTPUTS, type OutputSpec } from '../outputs';
import type { DifferenceMode } from '../viewState';
import {
  type DataOverlaySource,
  dataLegend,
  dataOverlay,
  dataSeries,
  mergedYaws,
  onMergedXs,
} from './dataOverlay';
import { axisOf, casePoints, mainPoints, type PageResults } from './pageResults';
import {
  compared,
  comparedLabel,
  conditionsText,
  display,
  nullIfNaN,
  PERCENT_FLOOR_FRACTION,
  type Present,
  percentFloor,
  setFigTitle,
} from './present';

export const CURRENT_COLOUR = '#c2412d';
export const BASELINE_COLOUR = BASELINE_STYLES[0]!.stroke;

/** Family colours from light to dark blue-green by covering fraction (our own ramp). */
function familyColour(k: number, n: number): string {
  const t = n <= 1 ? 1 : k / (n - 1);
  const a = [132, 188, 196];
  const b = [16, 58, 88];
  const c = a.map((x, i) => Math.round(x + (b[i]! - x) * t));
  return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
}

/** Every pinned baseline's solved yaw curve, in pinning order, with its legend name. */
interface BaselineCurve {
  index: number;
  reference: boolean;
  label: string;
  points: PointResult[];
}

function baselineCurves(ctx: Present, r: PageResults): BaselineCurve[] {
  const s = ctx.state;
  const ref = referenceIndex(s);
  const out: BaselineCurve[] = [];
  pinnedBaselines(s).forEach((b, index) => {
    const curve = index === ref ? r.baseline?.curve : r.otherBaselines?.find((o) => o.index === index)?.curve;
    const points = casePoints(curve ?? null);
    if (points)
      out.push({
        index,
        reference: index === ref,
        label: baselineLabel(b, s.case, index, index === ref),
        points,
      });
  });
  return out;
}

export interface YawPlots {
  dragYaw: LinePlot;
  sideYaw: LinePlot;
  handling: LinePlot;
}

/**
 * Draw the three yaw plots; returns notes for under the plots (the data overlay, empty percent points).
 * `data`: the last comparison of "Your data", if any.
 */
export function renderYawPlots(
  plots: YawPlots,
  ctx: Present,
  r: PageResults,
  data: DataOverlaySource | null = null,
): string[] {
  const notes: string[] = [];
  const u = ctx.units;
  const c = ctx.state.case;
  const yaws = [...c.conditions.yaw_deg];
  const pts = mainPoints(r);
  const mode = ctx.mode;
  const basePts = (r.baseline && casePoints(r.baseline.curve)) ?? undefined;
  const pinned = baselineCurves(ctx, r);
  const overlay = dataOverlay(data, c, c.conditions.airspeed_mps[0]!, r.rhoKgPerM3, yaws);
  if (overlay) notes.push(overlay.note);
  const xs = mergedYaws(yaws, overlay);
  const legend = data ? dataLegend(ctx, data) : '';
  /** Every pinned baseline's line: absolute, or (drag in a difference mode, as the plot's title says)
   * against the reference, which is then the zero line and left out. */
  const baselineLines = (spec: OutputSpec, m: DifferenceMode, pick?: (p: PointResult) => number) =>
    pinned.flatMap((b): PlotSeries[] => {
      if (m !== 'none' && b.reference) return [];
      const style = BASELINE_STYLES[b.index % BASELINE_STYLES.length]!;
      return [
        {
          label: b.label,
          stroke: style.stroke,
          dash: style.dash,
          width: 1.8,
          values: b.points.map((p, i) => nullIfNaN(pick ? pick(p) : compared(ctx, spec, p, basePts?.[i], m))),
        },
      ];
    });
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
  dragSeries.push(...baselineLines(OUTPUTS.axial, mode));
  if (mode === 'percent' && basePts) {
    const floorN = percentFloor(ctx, OUTPUTS.axial, basePts[0]!);
    const empty = basePts.filter((p) => !(Math.abs(OUTPUTS.axial.get(p)) >= floorN)).length;
    if (empty > 0) {
      const largest = Math.max(...basePts.map((p) => Math.abs(display(ctx, OUTPUTS.axial, p))));
      const at = empty === 1 ? '1 yaw angle' : `${empty} yaw angles`;
      notes.push(
        `Percent differences are left empty at ${at}, where the reference baseline’s axial drag is smaller than ${PERCENT_FLOOR_FRACTION * 100} % of its largest magnitude (${fmt(PERCENT_FLOOR_FRACTION * largest, 3)} ${unitText('force', u)}): near its zero crossing a percentage grows without bound and means nothing; the force difference shows those points.`,
      );
    }
  }
  if (mode === 'none') dragSeries.push(...dataSeries(ctx, overlay, 'axial_N', xs, legend, 'force'));
  else if (overlay && overlay.points.length > 0)
    notes.push('Your data is drawn on the drag plot as absolute values only (difference mode “none”).');
  const dragTitle =
    mode === 'none'
      ? 'Axial drag (along travel) vs yaw'
      : 'Axial drag vs yaw, as a difference from the reference baseline';
  setFigTitle('fig-drag-yaw', dragTitle);
  plots.dragYaw.render({
    title: dragTitle,
    xLabel,
    xLabelShort,
    yLabel: comparedLabel(ctx, OUTPUTS.axial, mode),
    xs,
    xIsYawDeg: true,
    series: dragSeries.map((x) => (x.pointsOnly ? x : onMergedXs(x, yaws, xs))),
  });
  // Side force vs yaw.
  const sideSeries = famSeries(OUTPUTS.side, 'none');
  sideSeries.push({
    label: currentLabel,
    stroke: CURRENT_COLOUR,
    width: 2.6,
    values: pts.map((p) => nullIfNaN(display(ctx, OUTPUTS.side, p))),
  });
  sideSeries.push(...baselineLines(OUTPUTS.side, 'none'));
  sideSeries.push(...dataSeries(ctx, overlay, 'side_N', xs, legend, 'force'));
  setFigTitle('fig-side-yaw', 'Side force vs yaw');
  plots.sideYaw.render({
    title: 'Side force vs yaw',
    xLabel,
    xLabelShort,
    yLabel: `Side force, ${unitText('force', u)}`,
    xs,
    xIsYawDeg: true,
    series: sideSeries.map((x) => (x.pointsOnly ? x : onMergedXs(x, yaws, xs))),
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
  for (const line of baselineLines(OUTPUTS.axial, 'none', (p) => p.steeringMomentNm)) {
    handling.push({ ...line, label: `${line.label}: steering moment, N m`, scale: 'y2' });
  }
  handling.push(
    ...dataSeries(ctx, overlay, 'steering_moment_Nm', xs, `${legend}: steering moment, N m`, 'moment', 'y2'),
  );
  const s = c.steering;
  const handlingTitle = `Centre of pressure and steering moment vs yaw (head ${fmt(s.head_angle_deg)}°, offset ${fmt(s.fork_offset_m * 1000)} mm)`;
  setFigTitle('fig-handling', handlingTitle);
  plots.handling.render({
    title: handlingTitle,
    xLabel,
    xLabelShort,
    yLabel: 'Centre of pressure, mm',
    y2Label: 'Steering moment, N m',
    xs,
    xIsYawDeg: true,
    series: handling.map((x) => (x.pointsOnly ? x : onMergedXs(x, yaws, xs))),
  });
  return notes;
}
