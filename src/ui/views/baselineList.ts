/**
 * The pinned baselines above the plots: one row each with its line's colour and dash, its name (the
 * design's name and what differs from the current design), a choice of the reference that differences
 * are taken against, and a button removing it.
 */
import type { AppState } from '../appState';
import { baselineLabel } from '../baselines/baselineLabel';
import {
  BASELINE_STYLES,
  chooseReference,
  MAX_BASELINES,
  pinnedBaselines,
  referenceIndex,
  removeBaseline,
} from '../baselines/pinnedBaselines';

const SVG = 'http://www.w3.org/2000/svg';

export function renderBaselineList(
  holder: HTMLElement,
  state: AppState,
  apply: (next: AppState) => void,
): void {
  const list = pinnedBaselines(state);
  const ref = referenceIndex(state);
  holder.hidden = list.length === 0;
  holder.replaceChildren();
  if (list.length === 0) return;
  const title = document.createElement('p');
  title.className = 'baseline-list-title small';
  title.textContent = `Pinned baselines (${list.length} of at most ${MAX_BASELINES}); differences are taken against the reference:`;
  holder.append(title);
  const ul = document.createElement('ul');
  list.forEach((b, k) => {
    const li = document.createElement('li');
    li.dataset.baseline = String(k);
    const style = BASELINE_STYLES[k % BASELINE_STYLES.length]!;
    const swatch = document.createElementNS(SVG, 'svg');
    swatch.setAttribute('class', 'baseline-swatch');
    swatch.setAttribute('width', '28');
    swatch.setAttribute('height', '8');
    swatch.setAttribute('aria-hidden', 'true');
    const line = document.createElementNS(SVG, 'line');
    for (const [a, v] of Object.entries({ x1: '0', y1: '4', x2: '28', y2: '4', 'stroke-width': '2' }))
      line.setAttribute(a, v);
    line.setAttribute('stroke', style.stroke);
    line.setAttribute('stroke-dasharray', style.dash.join(' '));
    swatch.append(line);
    const label = document.createElement('label');
    const radio = document.createElement('input');
    radio.type = 'radio';
    radio.name = 'baseline-reference';
    radio.checked = k === ref;
    radio.title = 'Take differences against this baseline';
    radio.addEventListener('change', () => apply(chooseReference(state, k)));
    const text = document.createElement('span');
    text.textContent = baselineLabel(b, state.case, k, k === ref);
    label.append(radio, text);
    const remove = document.createElement('button');
    remove.type = 'button';
    remove.className = 'baseline-remove';
    remove.textContent = '×';
    remove.title = `Remove baseline ${k + 1}`;
    remove.setAttribute('aria-label', `Remove baseline ${k + 1}`);
    remove.addEventListener('click', () => apply(removeBaseline(state, k)));
    li.append(swatch, label, remove);
    ul.append(li);
  });
  holder.append(ul);
}
