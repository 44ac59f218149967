/**
 * One printed figure: its title, the high-resolution drawing as an image (sized by the report's grid;
 * its pixel size is kept in data attributes for the tests), the legend drawn as text with a line sample
 * per series (inline SVG: attributes, not styles, so the CSP's style-src 'self' is kept), and notes.
 */
import { el } from '../dom';
import type { PrintImage } from './renderPrintPlot';

export interface LegendEntry {
  label: string;
  stroke: string;
  width: number;
  dash: number[] | null;
  pointsOnly: boolean;
}

export interface ReportFigure {
  id: string;
  title: string;
  alt: string;
  image: PrintImage;
  legend: LegendEntry[];
  notes: string[];
}

const SVG = 'http://www.w3.org/2000/svg';

function sample(entry: LegendEntry): SVGSVGElement {
  const svg = document.createElementNS(SVG, 'svg');
  svg.setAttribute('viewBox', '0 0 18 6');
  svg.setAttribute('aria-hidden', 'true');
  const mark = document.createElementNS(SVG, entry.pointsOnly ? 'circle' : 'line');
  if (entry.pointsOnly) {
    for (const [k, v] of [
      ['cx', '9'],
      ['cy', '3'],
      ['r', '2.2'],
      ['fill', entry.stroke],
    ])
      mark.setAttribute(k!, v!);
  } else {
    for (const [k, v] of [
      ['x1', '0'],
      ['y1', '3'],
      ['x2', '18'],
      ['y2', '3'],
    ])
      mark.setAttribute(k!, v!);
    mark.setAttribute('stroke', entry.stroke);
    mark.setAttribute('stroke-width', String(Math.max(1, entry.width)));
    if (entry.dash) mark.setAttribute('stroke-dasharray', entry.dash.map((d) => d / 2).join(' '));
  }
  svg.append(mark);
  return svg;
}

export function reportFigureDom(f: ReportFigure): HTMLElement {
  return el('figure', { className: 'report-figure', attrs: { 'data-figure': f.id } }, [
    el('figcaption', { text: f.title }),
    el('img', {
      attrs: {
        src: f.image.url,
        alt: f.alt,
        'data-width-px': String(f.image.widthPx),
        'data-height-px': String(f.image.heightPx),
      },
    }),
    f.legend.length > 0
      ? el(
          'ul',
          { className: 'report-legend' },
          f.legend.map((entry) => el('li', {}, [sample(entry), entry.label])),
        )
      : null,
    ...f.notes.map((n) => el('p', { className: 'report-note', text: n })),
  ]);
}
