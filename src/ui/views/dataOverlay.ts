/**
 * The imported data ("Your data") on the yaw plots. The data's last comparison MATCHES the current
 * design when the design it was compared with has the same `wheel` and `steering` sections, key for
 * key (model options may differ, so a calibrated model still matches); then each data point is drawn
 * whose airspeed and air density are within MATCH_TOLERANCE of the plots' (the design's first airspeed
 * and its air) and whose yaw lies in the plots' yaw range. Points are the comparison's values converted
 * to SI, shown in the plots' display units, as markers. Anything not drawn is counted in the note.
 */
import type { CaseFile } from '../../compute/caseFile';
import type { ConvertedColumns } from '../../compute/engine/dataTaskTypes';
import type { PointResult } from '../../compute/study/modelResults';
import { caseDifferences, differingKeys } from '../baselines/caseDifferences';
import { toDisplay } from '../displayUnits';
import type { PlotSeries } from '../linePlot';
import type { Present } from './present';

/** Relative tolerance of the airspeed and air-density match (1 %: a tunnel's set-point scatter). */
export const MATCH_TOLERANCE = 0.01;

export const DATA_COLOUR = '#e07b00';

/** The last comparison of "Your data": the design it was made against and its converted points. */
export interface DataOverlaySource {
  caseFile: CaseFile;
  converted: ConvertedColumns;
  label: string;
}

export type OverlayQuantity = 'axial_N' | 'side_N' | 'steering_moment_Nm';

export interface DataOverlay {
  /** Data yaw angles (deg) and values (SI) of the drawn points, by quantity. */
  points: Array<{ yawDeg: number; airspeedMps: number; values: Partial<Record<OverlayQuantity, number>> }>;
  note: string;
}

const near = (a: number, b: number) => Math.abs(a - b) <= MATCH_TOLERANCE * Math.abs(b);

/** The data points to draw for this design and plot conditions, with a note saying what was left out. */
export function dataOverlay(
  src: DataOverlaySource | null,
  design: CaseFile,
  plotSpeedMps: number,
  plotRhoKgPerM3: number,
  yawsDeg: readonly number[],
): DataOverlay | null {
  if (!src) return null;
  const name = `Your data (${src.label})`;
  if (differingKeys(src.caseFile, design, ['wheel', 'steering']).length > 0) {
    return {
      points: [],
      note: `${name} is not drawn: it was compared with another wheel (that wheel: ${caseDifferences(src.caseFile, design, 3, ['wheel', 'steering'])}). It is drawn on the yaw plots when the wheel and steering match the current design key for key.`,
    };
  }
  const lo = Math.min(...yawsDeg);
  const hi = Math.max(...yawsDeg);
  const c = src.converted;
  const out: DataOverlay['points'] = [];
  let otherConditions = 0;
  let outside = 0;
  for (let i = 0; i < c.count; i++) {
    const yaw = c.yaw_deg[i]!;
    if (!(near(c.airspeed_mps[i]!, plotSpeedMps) && near(c.air_density_kgpm3[i]!, plotRhoKgPerM3))) {
      otherConditions++;
      continue;
    }
    if (!(yaw >= lo - 1e-9 && yaw <= hi + 1e-9)) {
      outside++;
      continue;
    }
    const values: Partial<Record<OverlayQuantity, number>> = {};
    for (const q of ['axial_N', 'side_N', 'steering_moment_Nm'] as const) {
      const v = c.values[q]?.[i];
      if (v !== undefined && Number.isFinite(v)) values[q] = v;
    }
    out.push({ yawDeg: yaw, airspeedMps: c.airspeed_mps[i]!, values });
  }
  const left: string[] = [];
  if (otherConditions > 0)
    left.push(
      `${otherConditions} at another airspeed or air density (drawn: within ${MATCH_TOLERANCE * 100} % of the plots’ ${plotSpeedMps.toPrecision(4)} m/s and ${plotRhoKgPerM3.toFixed(3)} kg/m³)`,
    );
  if (outside > 0) left.push(`${outside} outside the plotted yaw range ${lo}–${hi}°`);
  const note =
    `${name}: ${out.length} of ${c.count} points drawn as markers` +
    (left.length > 0 ? `; not drawn: ${left.join('; ')}.` : '.');
  return { points: out, note };
}

/** The x values of a plot: the design's yaw angles and the data's, sorted, each once. */
export function mergedYaws(yawsDeg: readonly number[], overlay: DataOverlay | null): number[] {
  const all = [...yawsDeg, ...(overlay?.points.map((p) => p.yawDeg) ?? [])];
  return [...new Set(all)].sort((a, b) => a - b);
}

/** A series given at `yawsDeg`, spread onto the merged x values `xs` (null between, joined across). */
export function onMergedXs(
  series: PlotSeries,
  yawsDeg: readonly number[],
  xs: readonly number[],
): PlotSeries {
  if (xs.length === yawsDeg.length) return series;
  const at = new Map(yawsDeg.map((y, i) => [y, series.values[i] ?? null]));
  return { ...series, spanGaps: true, values: xs.map((x) => at.get(x) ?? null) };
}

/**
 * The data's markers for one quantity on the merged x values: one series per repeat at a yaw angle
 * (a plot holds one value per x), the first named in the legend.
 */
export function dataSeries(
  ctx: Present,
  overlay: DataOverlay | null,
  q: OverlayQuantity,
  xs: readonly number[],
  label: string,
  kind: 'force' | 'moment',
  scale?: 'y2',
): PlotSeries[] {
  if (!overlay) return [];
  const columns: Array<Array<number | null>> = [];
  const used = new Map<number, number>();
  for (const p of overlay.points) {
    const v = p.values[q];
    if (v === undefined) continue;
    const k = used.get(p.yawDeg) ?? 0;
    used.set(p.yawDeg, k + 1);
    columns[k] ??= xs.map(() => null);
    const shown =
      kind === 'force' ? toDisplay(v, 'force', ctx.units, { airspeedMps: p.airspeedMps } as PointResult) : v;
    columns[k]![xs.indexOf(p.yawDeg)] = shown;
  }
  return columns.map((values, k) => ({
    label: k === 0 ? label : `${label} (repeat ${k + 1})`,
    stroke: DATA_COLOUR,
    pointsOnly: true,
    ...(k > 0 ? { noLegend: true } : {}),
    ...(scale ? { scale } : {}),
    values,
  }));
}

/** The legend entry of the data: "your data", with the calibration mark when the model is calibrated. */
export function dataLegend(ctx: Present, src: DataOverlaySource): string {
  const cal = ctx.state.calibration;
  if (!cal) return 'your data';
  return cal.data === src.label
    ? 'your data (model CALIBRATED to it)'
    : `your data (model CALIBRATED to ${cal.data})`;
}
