/**
 * A page plot as a report figure: its title, its legend (the series the page's legend shows), the full
 * x-axis title (the drawing carries the short one) and, for a yaw plot reaching beyond the model's
 * trusted yaw, the note saying which range is shaded and why.
 */
import type { PlotSpec } from '../linePlot';
import { BEYOND_YAW_WHY, beyondYawIntervals } from '../yawTrust';
import type { PrintImage } from './renderPrintPlot';
import type { ReportFigure } from './reportFigureDom';

/** `xTitle`: the x title the drawing carries (printXLabel). */
export function specFigure(id: string, spec: PlotSpec, image: PrintImage, xTitle: string): ReportFigure {
  const xs = spec.xs.filter(Number.isFinite);
  const beyond = spec.xIsYawDeg && xs.length > 0 ? beyondYawIntervals(Math.min(...xs), Math.max(...xs)) : [];
  // The drawing carries the y titles in full; the full x title is printed here when it did not fit.
  const notes = xTitle === spec.xLabel ? [] : [`x: ${spec.xLabel}`];
  if (beyond.length > 0) {
    notes.push(`${BEYOND_YAW_WHY} (shaded: ${beyond.map(([a, b]) => `${a} to ${b}°`).join(', ')})`);
  }
  return {
    id,
    title: spec.title,
    alt: `${spec.title}: ${spec.series.map((s) => s.label).join(', ')} against ${spec.xLabel}`,
    image,
    legend: spec.series
      .filter((s) => !s.noLegend)
      .map((s) => ({
        label: s.label,
        stroke: s.stroke,
        width: s.width ?? 1.5,
        dash: s.dash ?? null,
        pointsOnly: s.pointsOnly ?? false,
      })),
    notes,
  };
}
