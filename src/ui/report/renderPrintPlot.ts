/**
 * Draw one of the page's plots for print: its current PlotSpec through uPlot with printPlotOptions, in a
 * holder outside the visible page, and return the drawing as a PNG data URL (the page's CSP allows
 * data: images) with its pixel size. The uPlot instance and its holder are removed afterwards.
 */
import uPlot from 'uplot';
import type { PlotSpec } from '../linePlot';
import { type PrintPlotSize, printPlotOptions } from './printPlotOptions';

export interface PrintImage {
  url: string;
  widthPx: number;
  heightPx: number;
}

export function renderPrintPlot(spec: PlotSpec, size: PrintPlotSize, xTitle: string): Promise<PrintImage> {
  const holder = document.createElement('div');
  holder.className = 'report-offscreen';
  document.body.append(holder);
  return new Promise<PrintImage>((resolve, reject) => {
    let plot: uPlot | null = null;
    let done = false;
    const finish = (u: uPlot) => {
      if (done) return;
      done = true;
      const canvas = u.ctx.canvas;
      const image = { url: canvas.toDataURL('image/png'), widthPx: canvas.width, heightPx: canvas.height };
      queueMicrotask(() => {
        u.destroy();
        holder.remove();
      });
      resolve(image);
    };
    try {
      const data: uPlot.AlignedData = [spec.xs, ...spec.series.map((s) => s.values)];
      plot = new uPlot(
        printPlotOptions(spec, size, xTitle, (u) => finish(u)),
        data,
        holder,
      );
    } catch (error) {
      plot?.destroy();
      holder.remove();
      reject(error instanceof Error ? error : new Error(String(error)));
    }
  });
}
