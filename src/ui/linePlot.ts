/**
 * A line plot (uPlot) in a figure with a title, sized to its container, with an accessible label that
 * points at the table holding the same numbers. Its PNG and SVG exports are drawn from `currentSpec()`
 * (src/ui/export/plotSvg.ts), at high resolution with the full legend and a caption block.
 */
import uPlot from 'uplot';
import { BEYOND_YAW_WHY, beyondYawIntervals } from './yawTrust';

export interface PlotSeries {
  label: string;
  stroke: string;
  width?: number;
  dash?: number[];
  /** Which y axis: 'y' (left, default) or 'y2' (right). */
  scale?: 'y' | 'y2';
  values: Array<number | null>;
  /** Draw markers only (measured data), no line. */
  pointsOnly?: boolean;
  /** Join the points across missing values (a series given on a coarser grid than the x values). */
  spanGaps?: boolean;
  /** Hide the series' markers (a dense curve). */
  noPoints?: boolean;
  /** Leave the series out of the legend (e.g. the edges of a band). */
  noLegend?: boolean;
}

/** A filled band between two series (indices into `series`), e.g. model +- uncertainty. */
export interface PlotBand {
  upper: number;
  lower: number;
  fill: string;
}

export interface PlotSpec {
  title: string;
  xLabel: string;
  /** Used when the plot is narrow. */
  xLabelShort?: string;
  yLabel: string;
  y2Label?: string;
  xs: number[];
  series: PlotSeries[];
  /** A vertical marker line at this x (e.g. the current covering fraction). */
  markerX?: number | null;
  /** More vertical marker lines (e.g. where a curve changes sign), drawn dotted in this colour. */
  markersX?: { xs: number[]; colour: string };
  bands?: PlotBand[];
  /** Ticks of the x axis at whole multiples of this (e.g. 1 for segment numbers). */
  xTickStep?: number;
  /** The x axis is yaw (deg, or |yaw|): shade the range beyond the model's trusted yaw and say why. */
  xIsYawDeg?: boolean;
}

const BEYOND_FILL = 'rgba(120, 120, 120, 0.13)';
const BEYOND_HATCH = 'rgba(90, 90, 90, 0.22)';

/** The ranges of a yaw axis beyond the trusted yaw (shaded), none for another axis. */
function beyondOf(spec: PlotSpec): Array<[number, number]> {
  const finiteXs = spec.xs.filter(Number.isFinite);
  return spec.xIsYawDeg && finiteXs.length > 0
    ? beyondYawIntervals(Math.min(...finiteXs), Math.max(...finiteXs))
    : [];
}

/**
 * What a plot built from `spec` depends on besides its numbers (the x values, the series' values and
 * the marker lines, which the draw hook reads from the spec drawn): axes, series styles, bands, the
 * shaded yaw ranges and whether points are marked (by the count of x values).
 */
function shapeOf(spec: PlotSpec): string {
  const { title: _t, xs, series, markerX: _m, markersX: _ms, ...axes } = spec;
  return JSON.stringify([axes, xs.length, series.map(({ values: _v, ...style }) => style), beyondOf(spec)]);
}

const AXIS_FONT = '11px system-ui, -apple-system, "Segoe UI", sans-serif';
const LABEL_FONT = '12px system-ui, -apple-system, "Segoe UI", sans-serif';

export class LinePlot {
  private plot: uPlot | null = null;
  private spec: PlotSpec | null = null;
  private readonly holder: HTMLDivElement;
  private readonly observer: ResizeObserver;
  private lastWidth = 0;
  /** The container's width at the ResizeObserver's last call (null before its first). */
  private observedWidth: number | null = null;
  /** The spec drawn last, as text: a render of the same spec at the same width keeps the plot. */
  private drawnSpec = '';
  /** The drawn spec without its numbers (shapeOf): a spec of the same shape only sets the plot's data. */
  private drawnShape = '';
  /** The note under the plot when part of its yaw range is beyond the trusted range (also in PNGs). */
  private beyondNote: string | null = null;

  constructor(
    private readonly container: HTMLElement,
    private readonly height = 215,
  ) {
    this.holder = document.createElement('div');
    this.holder.className = 'plot-holder';
    container.append(this.holder);
    // The container's width is read where the layout is fresh (here, after the browser's layout) and kept:
    // reading it in render() forced a layout of the page before each plot's drawing, each time the page had
    // just changed (the headline, the legends, the previous plot).
    this.observer = new ResizeObserver(() => {
      this.observedWidth = Math.floor(this.container.clientWidth);
      const w = this.observedWidth;
      if (this.plot && w !== this.lastWidth && w > 0) {
        const crossed = w < 560 !== this.lastWidth < 560;
        this.lastWidth = w;
        if (crossed) this.build();
        else this.plot.setSize({ width: w, height: this.height });
      } else if (!this.plot && this.spec && w > 0) {
        this.build();
      }
    });
    this.observer.observe(container);
  }

  private width(): number {
    return this.observedWidth ?? Math.floor(this.container.clientWidth);
  }

  /** What the plot currently shows (a copy). */
  currentSpec(): PlotSpec | null {
    return this.spec ? structuredClone(this.spec) : null;
  }

  render(spec: PlotSpec): void {
    // The page redraws every figure at the end of a run; a plot whose numbers did not change (e.g. the
    // yaw plots when the design map lands) is kept instead of built again (40-70 ms of uPlot per redraw).
    const text = JSON.stringify(spec);
    const sameWidth = this.plot !== null && this.width() === this.lastWidth;
    if (sameWidth && text === this.drawnSpec) return;
    this.drawnSpec = text;
    this.spec = spec;
    this.container.setAttribute(
      'aria-label',
      `${spec.title}: ${spec.series.map((s) => s.label).join(', ')} against ${spec.xLabel}. The numbers are in the matching table.`,
    );
    // Only the numbers changed (a new design's curves on the same axes and series): uPlot draws the new
    // data into the plot it has (scales found again as a new plot would) instead of building one.
    if (sameWidth && shapeOf(spec) === this.drawnShape) {
      this.plot!.setData([spec.xs, ...spec.series.map((s) => s.values)]);
      return;
    }
    this.build();
  }

  private build(): void {
    const spec = this.spec;
    if (!spec) return;
    const w = this.width();
    if (w <= 0) return;
    this.plot?.destroy();
    this.lastWidth = w;
    this.drawnShape = shapeOf(spec);
    const hasY2 = spec.series.some((s) => s.scale === 'y2');
    const axisCommon = {
      font: AXIS_FONT,
      labelFont: LABEL_FONT,
      stroke: '#1b2430',
      grid: { stroke: 'rgba(27, 36, 48, 0.09)', width: 1 },
      ticks: { stroke: 'rgba(27, 36, 48, 0.3)', width: 1 },
    };
    const axes: uPlot.Axis[] = [
      {
        ...axisCommon,
        label: w < 560 && spec.xLabelShort ? spec.xLabelShort : spec.xLabel,
        labelSize: 22,
        ...(spec.xTickStep ? { incrs: [1, 2, 5, 10, 20, 50, 100].map((k) => k * spec.xTickStep!) } : {}),
      },
      { ...axisCommon, label: spec.yLabel, scale: 'y', labelSize: 22, size: 52 },
    ];
    if (hasY2) {
      axes.push({
        ...axisCommon,
        label: spec.y2Label ?? '',
        scale: 'y2',
        side: 1,
        grid: { show: false },
        labelSize: 22,
        size: 58,
      });
    }
    const beyond = beyondOf(spec);
    const opts: uPlot.Options = {
      width: w,
      height: this.height,
      pxAlign: false,
      cursor: { drag: { x: false, y: false }, points: { size: 6 } },
      legend: { live: true },
      scales: { x: { time: false }, y: { auto: true }, ...(hasY2 ? { y2: { auto: true } } : {}) },
      axes,
      series: [
        { label: spec.xLabel.split(' —')[0] ?? 'x' },
        ...spec.series.map((s) => ({
          label: s.label,
          stroke: s.stroke,
          width: s.width ?? 1.5,
          scale: s.scale ?? 'y',
          spanGaps: s.spanGaps ?? false,
          points: s.pointsOnly
            ? { show: true, size: 6, fill: s.stroke, width: 1 }
            : { show: !s.noPoints && spec.xs.length <= 16, size: 4 },
          ...(s.pointsOnly ? { paths: () => null } : {}),
          ...(s.dash ? { dash: s.dash } : {}),
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
        drawClear: [(u: uPlot) => this.shadeBeyondYaw(u, beyond)],
        setCursor: [
          (u: uPlot) => {
            const left = u.cursor.left ?? -1;
            const x = left >= 0 ? u.posToVal(left, 'x') : Number.NaN;
            const inBand = beyond.some(([a, b]) => x >= a && x <= b);
            if (inBand) u.over.title = BEYOND_YAW_WHY;
            else u.over.removeAttribute('title');
          },
        ],
        draw: [
          (u: uPlot) => {
            // The spec of the numbers drawn (render may have set new data into this plot).
            const drawn = this.spec ?? spec;
            const markerX = drawn.markerX;
            const lines: Array<[number, string, number[]]> = [];
            if (markerX !== undefined && markerX !== null)
              lines.push([markerX, 'rgba(20, 20, 20, 0.55)', [4, 4]]);
            for (const x of drawn.markersX?.xs ?? []) lines.push([x, drawn.markersX!.colour, [2, 3]]);
            if (lines.length === 0) return;
            const ctx = u.ctx;
            ctx.save();
            ctx.lineWidth = 1;
            for (const [value, colour, dash] of lines) {
              const x = u.valToPos(value, 'x', true);
              ctx.strokeStyle = colour;
              ctx.setLineDash(dash);
              ctx.beginPath();
              ctx.moveTo(x, u.bbox.top);
              ctx.lineTo(x, u.bbox.top + u.bbox.height);
              ctx.stroke();
            }
            ctx.restore();
          },
        ],
      },
    };
    const data: uPlot.AlignedData = [spec.xs, ...spec.series.map((s) => s.values)];
    this.plot = new uPlot(opts, data, this.holder);
    const rows = this.plot.root.querySelectorAll<HTMLElement>('.u-legend .u-series');
    spec.series.forEach((s, i) => {
      const row = rows[i + 1];
      if (s.noLegend && row) row.style.display = 'none';
    });
    this.plot.root.dataset.beyondYaw = beyond.length > 0 ? 'shaded' : 'none';
    this.beyondNote =
      beyond.length > 0
        ? `Shaded: yaw beyond the model's trusted range (${beyond.map(([a, b]) => `${a} to ${b}°`).join(', ')})`
        : null;
    if (this.beyondNote) {
      const note = document.createElement('p');
      note.className = 'plot-beyond-note';
      note.title = BEYOND_YAW_WHY;
      note.textContent = `${this.beyondNote} — hover for why`;
      this.plot.root.append(note);
    }
  }

  /** Fill the plotted yaw range beyond the trusted yaw, with a light hatch, under the curves. */
  private shadeBeyondYaw(u: uPlot, intervals: Array<[number, number]>): void {
    if (intervals.length === 0) return;
    const ctx = u.ctx;
    const { top, height } = u.bbox;
    for (const [a, b] of intervals) {
      ctx.save();
      const x0 = u.valToPos(a, 'x', true);
      const x1 = u.valToPos(b, 'x', true);
      const left = Math.min(x0, x1);
      const w = Math.abs(x1 - x0);
      ctx.fillStyle = BEYOND_FILL;
      ctx.fillRect(left, top, w, height);
      ctx.beginPath();
      ctx.rect(left, top, w, height);
      ctx.clip();
      ctx.strokeStyle = BEYOND_HATCH;
      ctx.lineWidth = 1;
      for (let x = left - height; x < left + w; x += 9) {
        ctx.moveTo(x, top + height);
        ctx.lineTo(x + height, top);
      }
      ctx.stroke();
      ctx.restore();
    }
  }

  dispose(): void {
    this.observer.disconnect();
    this.plot?.destroy();
  }
}
