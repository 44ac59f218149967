/**
 * Put a line plot's PNG and SVG buttons into its figure's caption (`figcaption .fig-actions`, made if
 * missing). Both are drawn from what the plot shows now (LinePlot.currentSpec) with the caption block.
 */
import type { LinePlot } from '../linePlot';
import type { ExportMeta } from './exportMeta';
import { figureExportButtons } from './figureExportButtons';
import { plotSvg } from './plotSvg';

export function addPlotExports(
  figure: HTMLElement,
  plot: Pick<LinePlot, 'currentSpec'>,
  suffix: string,
  extra?: (meta: ExportMeta) => string[],
): void {
  const cap = figure.querySelector('figcaption');
  if (!cap) throw new RangeError(`addPlotExports: figure ${figure.id || suffix} has no figcaption`);
  let actions = cap.querySelector<HTMLElement>('.fig-actions');
  if (!actions) {
    actions = document.createElement('span');
    actions.className = 'fig-actions';
    cap.append(actions);
  }
  const title = cap.querySelector('.fig-title')?.textContent ?? suffix;
  actions.append(
    ...figureExportButtons({
      title,
      suffix,
      svg: (caption) => {
        const spec = plot.currentSpec();
        return spec ? plotSvg(spec, caption) : null;
      },
      ...(extra ? { extra } : {}),
    }),
  );
}
