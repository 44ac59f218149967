/**
 * The trade-off front as a scatter plot (uPlot): x the handling figure, y the objective's saving
 * against the baseline; every evaluated design in grey, the front joined in colour, the optimum
 * marked, the handling limit as a dashed vertical line. A click near a point calls `onSelect` with
 * that design's index. The cautions stand under the plot.
 */
import uPlot from 'uplot';
import type { StudyDocument } from '../../compute/design/index';
import { el } from '../dom';
import { addPlotExports } from '../export/addPlotExports';
import type { PlotSpec } from '../linePlot';
import { studyCaptionLine } from './studyCaptionLine';
import { studyCautions } from './studyCautions';
import { headerText, nearestPoint, studyRows } from './studyRows';

/** Plot data: designs sorted by the handling figure (x), and y series for all, the front and the optimum. */
export function tradeOffData(doc: StudyDocument): {
  indices: number[];
  data: uPlot.AlignedData;
  limit: number | null;
} {
  const h = doc.front.handling.id;
  const o = doc.objective.id;
  const rows = studyRows(doc).filter((r) => r.objectives[h] !== null && r.saved[o] !== null);
  rows.sort((a, b) => a.objectives[h]! - b.objectives[h]! || a.index - b.index);
  const xs = rows.map((r) => r.objectives[h]!);
  const all = rows.map((r) => r.saved[o]!);
  const front = rows.map((r) => (r.role === 'design' ? null : r.saved[o]!));
  const optimum = rows.map((r) => (r.role === 'optimum' ? r.saved[o]! : null));
  const limit = doc.limits.find((l) => l.id === h)?.max ?? null;
  return { indices: rows.map((r) => r.index), data: [xs, all, front, optimum], limit };
}

/** The plot as the page's PlotSpec (for its PNG and SVG exports): the same series, the limit as a marker. */
export function tradeOffSpec(doc: StudyDocument): PlotSpec {
  const { data, limit } = tradeOffData(doc);
  const values = (k: number) => Array.from(data[k] as ArrayLike<number | null>);
  return {
    title: 'Trade-off: saving against handling',
    xLabel: headerText(doc.front.handling.label, doc.front.handling.unit),
    yLabel: headerText(`${doc.objective.label} saved`, doc.objective.unit),
    xs: values(0) as number[],
    series: [
      { label: 'every design', stroke: 'rgba(27, 36, 48, 0.45)', values: values(1), pointsOnly: true },
      { label: 'the front', stroke: '#c0392b', values: values(2), spanGaps: true },
      { label: 'the optimum', stroke: '#1a7f37', values: values(3), pointsOnly: true },
    ],
    ...(limit === null ? {} : { markersX: { xs: [limit], colour: 'rgba(20, 20, 20, 0.6)' } }),
  };
}

export interface TradeOffPlot {
  element: HTMLElement;
  dispose(): void;
}

export function tradeOffPlot(
  doc: StudyDocument,
  onSelect: (index: number) => void,
  width = 560,
  height = 260,
): TradeOffPlot {
  const { indices, data, limit } = tradeOffData(doc);
  const holder = el('div', { className: 'plot', attrs: { role: 'img' } });
  const xLabel = headerText(doc.front.handling.label, doc.front.handling.unit);
  const yLabel = headerText(`${doc.objective.label} saved`, doc.objective.unit);
  holder.setAttribute(
    'aria-label',
    `Trade-off: ${yLabel} against ${xLabel}; the numbers are in the designs table.`,
  );
  const dots = (stroke: string, size: number) => ({
    stroke,
    width: 0,
    paths: () => null,
    points: { show: true, size, fill: stroke },
  });
  const plot = new uPlot(
    {
      width,
      height,
      cursor: { drag: { x: false, y: false } },
      // The legend names the series; the numbers are in the designs table.
      legend: { live: false },
      scales: { x: { time: false } },
      axes: [{ label: xLabel }, { label: yLabel, size: 60 }],
      series: [
        { label: xLabel },
        { label: 'designs', ...dots('rgba(27, 36, 48, 0.35)', 5) },
        { label: 'front', stroke: '#c0392b', width: 1.5, spanGaps: true, points: { show: true, size: 6 } },
        { label: 'optimum', ...dots('#1a7f37', 11) },
      ],
      hooks: {
        draw: [
          (u: uPlot) => {
            if (limit === null) return;
            const x = u.valToPos(limit, 'x', true);
            const ctx = u.ctx;
            ctx.save();
            ctx.strokeStyle = 'rgba(20, 20, 20, 0.6)';
            ctx.setLineDash([5, 4]);
            ctx.beginPath();
            ctx.moveTo(x, u.bbox.top);
            ctx.lineTo(x, u.bbox.top + u.bbox.height);
            ctx.stroke();
            ctx.restore();
          },
        ],
      },
    },
    data,
    holder,
  );
  plot.over.addEventListener('click', () => {
    const xs = data[0] as number[];
    const ys = data[1] as number[];
    const pixels = xs.map((x, k) => ({ x: plot.valToPos(x, 'x'), y: plot.valToPos(ys[k]!, 'y') }));
    const k = nearestPoint(pixels, plot.cursor.left ?? -1, plot.cursor.top ?? -1, 12);
    if (k >= 0) onSelect(indices[k]!);
  });
  const caption = el('figcaption', {}, [
    el('span', { className: 'fig-title', text: 'Trade-off: saving against handling' }),
    ` (grey: every design; red: the front; green: the optimum${limit === null ? '' : `; dashed: the limit ${limit} ${doc.front.handling.unit}`}; click a point to make it the current design)`,
  ]);
  const element = el('figure', { className: 'plot-card', attrs: { id: 'fig-study-tradeoff' } }, [
    caption,
    holder,
    studyCautions(doc.cautions),
  ]);
  const spec = tradeOffSpec(doc);
  addPlotExports(element, { currentSpec: () => spec }, 'study-tradeoff', (meta) => [
    studyCaptionLine(doc),
    meta.ride,
  ]);
  return { element, dispose: () => plot.destroy() };
}
