/**
 * The x-axis title a printed plot draws: the plot's full title when it fits between the y axes at the
 * print font, else its short title (the report then prints the full one under the figure).
 */
import type { PlotSpec } from '../linePlot';
import { PRINT_FONT_FAMILY, PRINT_LABEL_PX, type PrintPlotSize, printYAxisPx } from './printPlotOptions';

export function printXLabel(spec: PlotSpec, size: PrintPlotSize): string {
  if (!spec.xLabelShort) return spec.xLabel;
  const ctx = document.createElement('canvas').getContext('2d');
  if (!ctx) return spec.xLabelShort;
  ctx.font = `${PRINT_LABEL_PX}px ${PRINT_FONT_FAMILY}`;
  const axes = printYAxisPx * (spec.series.some((s) => s.scale === 'y2') ? 2 : 1);
  return ctx.measureText(spec.xLabel).width <= size.widthCssPx - axes - 10 ? spec.xLabel : spec.xLabelShort;
}
