/**
 * uPlot options that draw a page plot's PlotSpec (the same series, bands, markers and trusted-yaw
 * shading the page shows) for print: the canvas gets `scale` pixels per CSS pixel of the printed image
 * whatever the screen's pixel ratio, with every size (fonts, axes, lines, markers, hatching) scaled
 * alike, so a 330 CSS px plot becomes 990 pixels, about 400 dpi in the report's 61 mm column. uPlot
 * multiplies CSS sizes by its pixel ratio (taken from the screen when it loads); dividing by it first
 * gives the wanted density. Legend and cursor are off: the report prints the
 * legend and the full axis titles as text beside the image.
 */
import uPlot from 'uplot';
import type { PlotSpec } from '../linePlot';
import { beyondYawIntervals } from '../yawTrust';

export const PRINT_FONT_FAMILY = 'system-ui, -apple-system, "Segoe UI", sans-serif';
/** Axis title font size and the width of a y axis, in CSS px of the printed image. */
export const PRINT_LABEL_PX = 10.5;
export const printYAxisPx = 44;
const INK = '#1b2430';

export interface PrintPlotSize {
  widthCssPx: number;
  heightCssPx: number;
  /** Canvas pixels per CSS pixel of the printed image. */
  scale: number;
}

/** Vertical dashed lines (the current cover fraction; sign changes) in canvas pixels. */
function drawMarkers(u: uPlot, spec: PlotSpec, scale: number): void {
  const lines: Array<[number, string, number[]]> = [];
  if (spec.markerX !== undefined && spec.markerX !== null)
    lines.push([spec.markerX, 'rgba(20, 20, 20, 0.55)', [4, 4]]);
  for (const x of spec.markersX?.xs ?? []) lines.push([x, spec.markersX!.colour, [2, 3]]);
  const ctx = u.ctx;
  ctx.save();
  ctx.lineWidth = scale;
  for (const [value, colour, dash] of lines) {
    const x = u.valToPos(value, 'x', true);
    ctx.strokeStyle = colour;
    ctx.setLineDash(dash.map((d) => d * scale));
    ctx.beginPath();
    ctx.moveTo(x, u.bbox.top);
    ctx.lineTo(x, u.bbox.top + u.bbox.height);
    ctx.stroke();
  }
  ctx.restore();
}

/** The yaw range beyond the model's trusted yaw, filled and hatched as on the page. */
function shadeBeyond(u: uPlot, intervals: Array<[number, number]>, scale: number): void {
  const ctx = u.ctx;
  const { top, height } = u.bbox;
  for (const [a, b] of intervals) {
    const x0 = u.valToPos(a, 'x', true);
    const x1 = u.valToPos(b, 'x', true);
    const left = Math.min(x0, x1);
    const w = Math.abs(x1 - x0);
    ctx.save();
    ctx.fillStyle = 'rgba(120, 120, 120, 0.13)';
    ctx.fillRect(left, top, w, height);
    ctx.beginPath();
    ctx.rect(left, top, w, height);
    ctx.clip();
    ctx.strokeStyle = 'rgba(90, 90, 90, 0.22)';
    ctx.lineWidth = scale;
    for (let x = left - height; x < left + w; x += 9 * scale) {
      ctx.moveTo(x, top + height);
      ctx.lineTo(x + height, top);
    }
    ctx.stroke();
    ctx.restore();
  }
}

export function printPlotOptions(
  spec: PlotSpec,
  size: PrintPlotSize,
  xTitle: string,
  onDrawn: (u: uPlot) => void,
): uPlot.Options {
  const { widthCssPx, heightCssPx, scale } = size;
  if (!(widthCssPx > 0 && heightCssPx > 0 && scale >= 1)) {
    throw new RangeError(
      `printPlotOptions: sizes must be > 0 and scale >= 1, got ${widthCssPx}x${heightCssPx} at ${scale}`,
    );
  }
  const f = scale / (uPlot.pxRatio || 1);
  const font = (px: number) => `${(px * f).toFixed(2)}px ${PRINT_FONT_FAMILY}`;
  const axis = (label: string, extra: uPlot.Axis): uPlot.Axis => ({
    label,
    font: font(10),
    labelFont: font(PRINT_LABEL_PX),
    labelSize: 15 * f,
    labelGap: 0,
    gap: 3 * f,
    stroke: INK,
    grid: { stroke: 'rgba(27, 36, 48, 0.09)', width: f },
    ticks: { stroke: 'rgba(27, 36, 48, 0.3)', width: f, size: 4 * f },
    ...extra,
  });
  const hasY2 = spec.series.some((s) => s.scale === 'y2');
  const axes = [axis(xTitle, { size: 26 * f }), axis(spec.yLabel, { scale: 'y', size: printYAxisPx * f })];
  if (hasY2)
    axes.push(
      axis(spec.y2Label ?? '', { scale: 'y2', side: 1, size: printYAxisPx * f, grid: { show: false } }),
    );
  const xs = spec.xs.filter(Number.isFinite);
  const beyond = spec.xIsYawDeg && xs.length > 0 ? beyondYawIntervals(Math.min(...xs), Math.max(...xs)) : [];
  return {
    width: widthCssPx * f,
    height: heightCssPx * f,
    pxAlign: false,
    padding: [6 * f, 8 * f, 0, 0],
    legend: { show: false },
    cursor: { show: false },
    select: { show: false, left: 0, top: 0, width: 0, height: 0 },
    scales: { x: { time: false }, y: { auto: true }, ...(hasY2 ? { y2: { auto: true } } : {}) },
    axes,
    series: [
      { label: 'x' },
      ...spec.series.map((s) => ({
        label: s.label,
        stroke: s.stroke,
        width: (s.width ?? 1.5) * f,
        scale: s.scale ?? 'y',
        spanGaps: s.spanGaps ?? false,
        points: s.pointsOnly
          ? { show: true, size: 6 * f, fill: s.stroke, width: f }
          : { show: !s.noPoints && spec.xs.length <= 16, size: 4 * f, width: f },
        ...(s.pointsOnly ? { paths: () => null } : {}),
        ...(s.dash ? { dash: s.dash.map((d) => d * scale) } : {}),
      })),
    ],
    ...(spec.bands && spec.bands.length > 0
      ? {
          bands: spec.bands.map((b) => ({
            series: [b.upper + 1, b.lower + 1] as [number, number],
            fill: b.fill,
          })),
        }
      : {}),
    hooks: {
      drawClear: [(u: uPlot) => shadeBeyond(u, beyond, scale)],
      draw: [
        (u: uPlot) => {
          drawMarkers(u, spec, scale);
          onDrawn(u);
        },
      ],
    },
  };
}
