/**
 * Each figure's caption buttons: save as PNG (high resolution) and SVG, both with the caption block
 * (design, conditions, model options, CALIBRATED, version, date), or PNG only for a raster view (the 3D
 * view); and show its numbers in the Tables tab. Files are named after the current design.
 */

import type { ExportMeta } from '../export/exportMeta';
import { figureExportButtons } from '../export/figureExportButtons';
import type { SvgFigure } from '../export/plotSvg';
import { rasterExportButton } from '../export/rasterExportButton';
import type { ViewState } from '../viewState';
import { byId } from './present';

export interface FigureHost {
  setView(patch: Partial<ViewState>): void;
}

export interface FigureAction {
  /** The figure element's id (`fig-...`); the files' suffix is the id without `fig-`. */
  id: string;
  /** The figure as SVG with this caption (its PNG is the SVG rasterised), or null before it is drawn. */
  svg?: (caption: string[]) => SvgFigure | null;
  /** A raster-only figure's PNG with this caption. */
  png?: (caption: string[]) => Promise<Blob>;
  /** The id of the table with its numbers (or null). */
  tableId: string | null;
  /** Lines the figure adds to its caption. */
  extra?: (meta: ExportMeta) => string[];
}

export function wireFigureActions(figures: readonly FigureAction[], host: FigureHost): void {
  for (const f of figures) {
    const cap = byId(f.id).querySelector('figcaption')!;
    const actions = document.createElement('span');
    actions.className = 'fig-actions';
    const title = cap.querySelector('.fig-title')?.textContent ?? f.id;
    const suffix = f.id.replace('fig-', '');
    const extra = f.extra ? { extra: f.extra } : {};
    if (f.svg) actions.append(...figureExportButtons({ title, suffix, svg: f.svg, ...extra }));
    else if (f.png) actions.append(rasterExportButton(title, suffix, f.png, f.extra));
    if (f.tableId) {
      const tableId = f.tableId;
      const tableButton = document.createElement('button');
      tableButton.type = 'button';
      tableButton.textContent = 'Table';
      tableButton.setAttribute('aria-label', `Show the numbers: ${title}`);
      tableButton.addEventListener('click', () => {
        host.setView({ tab: 'tables' });
        const block = document.getElementById(`${tableId}-block`);
        block?.scrollIntoView({ block: 'start' });
        block?.querySelector<HTMLElement>('.table-scroll')?.focus();
      });
      actions.append(tableButton);
    }
    cap.append(actions);
  }
}
