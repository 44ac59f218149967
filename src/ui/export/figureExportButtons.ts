/**
 * A figure's PNG and SVG buttons. Each click reads the page's state at that moment (exportContext): the
 * caption names the design as it is, and the files are named after it (designFileStem) with the
 * figure's suffix. The PNG is the SVG rasterised (svgToPng), so the two files always agree.
 */
import { downloadBlob, downloadText } from '../download';
import { captionLines } from './captionLines';
import { exportButton } from './exportButton';
import { currentExportMeta } from './exportContext';
import type { ExportMeta } from './exportMeta';
import type { SvgFigure } from './plotSvg';
import { svgToPng } from './svgToPng';

export interface FigureExport {
  /** Names the buttons for screen readers. */
  title: string;
  /** File name suffix after the design's stem, e.g. "drag-yaw". */
  suffix: string;
  /** The figure as SVG with this caption, or null when it has not been drawn yet. */
  svg(caption: string[]): SvgFigure | null;
  /** Lines the figure adds to the caption (e.g. the map's yaw and speed). */
  extra?: (meta: ExportMeta) => string[];
}

export function figureExportButtons(f: FigureExport): HTMLButtonElement[] {
  const build = () => {
    const meta = currentExportMeta();
    const figure = f.svg(captionLines(meta, f.extra?.(meta) ?? []));
    if (!figure) throw new Error('the figure has not been drawn yet');
    return { figure, stem: `${meta.design.file_stem}-${f.suffix}` };
  };
  return [
    exportButton('PNG', `Save as PNG (high resolution, with caption): ${f.title}`, async () => {
      const { figure, stem } = build();
      downloadBlob(`${stem}.png`, await svgToPng(figure));
    }),
    exportButton('SVG', `Save as SVG (with caption): ${f.title}`, () => {
      const { figure, stem } = build();
      downloadText(`${stem}.svg`, figure.svg, 'image/svg+xml');
    }),
  ];
}
