/**
 * The optimum of a study as a short card: the design, the objective with its lattice uncertainty and its
 * saving against the baseline, each limit with the optimum's value and where the limit came from, and
 * the cautions. `onSelect` (a button) makes the optimum the current design.
 */
import { designVariable, type StudyDocument } from '../../compute/design/index';
import { button, el } from '../dom';
import { studyCautions } from './studyCautions';
import { cellText, headerText } from './studyRows';

/** The card's lines as text (no DOM; tested in Node). */
export function optimumLines(doc: StudyDocument): string[] {
  const o = doc.optimum;
  const unc = (id: string) => {
    const u = o.uncertainty.find((x) => x.id === id);
    return u === undefined || u.absolute === null ? '' : ` ± ${cellText(u.absolute)} (lattice)`;
  };
  const lines = [
    `${doc.feasible ? 'Optimum' : 'No design met every limit; the least violating'}: ${doc.variables
      .map(
        (v) =>
          `${designVariable(v.id)?.label.toLowerCase() ?? v.id} ${cellText(o.design[v.id] ?? null)}${v.unit === '1' || v.unit === '' ? '' : ` ${v.unit}`}`,
      )
      .join(', ')}`,
    `${headerText(doc.objective.label, doc.objective.unit)}: ${cellText(o.objectives[doc.objective.id] ?? null)}${unc(doc.objective.id)}; saved against the baseline: ${cellText(o.saved_vs_baseline[doc.objective.id] ?? null)}`,
  ];
  for (const l of doc.limits) {
    lines.push(
      `${headerText(l.label, l.unit)}: ${cellText(o.objectives[l.id] ?? null)}${unc(l.id)}, limit ${cellText(l.max)}: ${l.source}`,
    );
  }
  if (doc.limits.length === 0) lines.push('No handling limits were set.');
  lines.push(
    `${doc.search.evaluations} designs evaluated on a ${doc.search.lattice_span} x ${doc.search.lattice_chord} lattice`,
  );
  return lines;
}

export function optimumSummary(doc: StudyDocument, onSelect: (index: number) => void): HTMLElement {
  return el('section', { className: 'optimum-summary' }, [
    ...optimumLines(doc).map((line) => el('p', { text: line })),
    button('Make it the current design', () => onSelect(doc.optimum.index)),
    studyCautions(doc.cautions),
  ]);
}
