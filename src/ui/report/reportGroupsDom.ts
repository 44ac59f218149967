/** ReportGroups (the design's geometry, conditions and model) as a row of compact label/value lists. */
import { el } from '../dom';
import type { ReportGroup } from './reportTypes';

export function reportGroupsDom(groups: readonly ReportGroup[]): HTMLElement {
  return el(
    'div',
    { className: 'report-groups' },
    groups.map((g) =>
      el('div', { className: 'report-group' }, [
        el('h3', { text: g.title }),
        el(
          'dl',
          {},
          g.rows.flatMap((r) => [el('dt', { text: r.label }), el('dd', { text: r.value })]),
        ),
      ]),
    ),
  );
}
