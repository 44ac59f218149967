/** One section of the printable report: a heading and its content, named by `data-section` (the tests find each by it). */
import { type Child, el } from '../dom';

export function reportSection(id: string, title: string, children: readonly Child[]): HTMLElement {
  return el('section', { className: `report-section report-${id}`, attrs: { 'data-section': id } }, [
    el('h2', { text: title }),
    ...children,
  ]);
}
