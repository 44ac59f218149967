/**
 * The export buttons of a figure (PNG and SVG, or PNG only for a raster view) and of a table (CSV and
 * JSON). Each click reads the page's state at that moment (exportContext): the caption and metadata
 * name the design as it is, and files are named after it (designFileStem) with the figure's or table's
 * suffix.
 */
import type { Cell } from '../dataTable';
import { downloadBlob, downloadText } from '../download';
import { captionLines } from './captionLines';
import { currentExportMeta, reportExportError } from './exportContext';
import type { ExportMeta } from './exportMeta';
import type { SvgFigure } from './plotSvg';
import { svgToPng } from './svgToPng';
import { tableCsv } from './tableCsv';
import { tableJson } from './tableJson';

function exportButton(text: string, label: string, run: () => Promise<void> | void): HTMLButtonElement {
  const b = document.createElement('button');
  b.type = 'button';
  b.textContent = text;
  b.setAttribute('aria-label', label);
  b.addEventListener('click', () => {
    try {
      Promise.resolve(run()).catch((e: unknown) => reportExportError(`${text} export failed`, e));
    } catch (e) {
      reportExportError(`${text} export failed`, e);
    }
  });
  return b;
}

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

/** A raster-only figure (the 3D view): its PNG, given the caption lines. */
export function rasterExportButton(
  title: string,
  suffix: string,
  png: (caption: string[]) => Promise<Blob>,
  extra?: (meta: ExportMeta) => string[],
): HTMLButtonElement {
  return exportButton('PNG', `Save as PNG (high resolution, with caption): ${title}`, async () => {
    const meta = currentExportMeta();
    downloadBlob(
      `${meta.design.file_stem}-${suffix}.png`,
      await png(captionLines(meta, extra?.(meta) ?? [])),
    );
  });
}

export interface TableExport {
  title(): string;
  suffix: string;
  /** Headers (units in the names) and rows at full precision, in the order shown. */
  data(): { headers: string[]; rows: Cell[][] };
  extra?: (meta: ExportMeta) => string[];
}

export function tableExportButtons(t: TableExport): HTMLButtonElement[] {
  const file = (ext: string, write: typeof tableCsv, mime: string) => () => {
    const meta = currentExportMeta();
    const { headers, rows } = t.data();
    if (headers.length === 0) throw new Error('the table is empty: nothing computed yet');
    downloadText(
      `${meta.design.file_stem}-${t.suffix}.${ext}`,
      write(meta, t.title(), headers, rows, t.extra?.(meta) ?? []),
      mime,
    );
  };
  return [
    exportButton('CSV', `Save as CSV: ${t.title()}`, file('csv', tableCsv, 'text/csv')),
    exportButton('JSON', `Save as JSON: ${t.title()}`, file('json', tableJson, 'application/json')),
  ];
}
