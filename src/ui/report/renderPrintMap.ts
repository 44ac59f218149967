/**
 * Draw the design map for print: the page's own map renderer (DesignMap with renderMap, the same
 * colour, contours, markers and titles) in a holder outside the visible page, at `scale` canvas pixels
 * per CSS pixel, returned as a PNG data URL.
 */
import { DesignMap } from '../designMap';
import { renderMap } from '../views/mapView';
import type { PageResults } from '../views/pageResults';
import type { Present } from '../views/present';
import type { PrintImage } from './renderPrintPlot';

export function renderPrintMap(ctx: Present, r: PageResults, widthCssPx: number, scale: number): PrintImage {
  if (!(widthCssPx >= 320 && scale >= 1)) {
    throw new RangeError(
      `renderPrintMap: width must be >= 320 CSS px and scale >= 1, got ${widthCssPx} at ${scale}`,
    );
  }
  const holder = document.createElement('div');
  holder.className = 'report-offscreen';
  holder.style.width = `${widthCssPx}px`;
  document.body.append(holder);
  const map = new DesignMap(holder, scale);
  try {
    renderMap(map, ctx, r);
    return { url: map.canvas.toDataURL('image/png'), widthPx: map.canvas.width, heightPx: map.canvas.height };
  } finally {
    map.dispose();
    holder.remove();
  }
}
