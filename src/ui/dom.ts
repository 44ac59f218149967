/**
 * Small DOM builders for the panels. Text always goes in through textContent (never HTML), so file
 * names, column headers and cells from a user's data show literally and cannot run.
 */
export type Child = Node | string | null | undefined | false;

export function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  props: {
    className?: string;
    text?: string;
    attrs?: Record<string, string>;
  } = {},
  children: readonly Child[] = [],
): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  if (props.className) e.className = props.className;
  if (props.text !== undefined) e.textContent = props.text;
  for (const [k, v] of Object.entries(props.attrs ?? {})) e.setAttribute(k, v);
  for (const c of children) {
    if (c === null || c === undefined || c === false) continue;
    e.append(typeof c === 'string' ? document.createTextNode(c) : c);
  }
  return e;
}

export function button(
  text: string,
  onClick: () => void,
  attrs: Record<string, string> = {},
): HTMLButtonElement {
  const b = el('button', { text, attrs: { type: 'button', ...attrs } });
  b.addEventListener('click', onClick);
  return b;
}

/** A figure card with a title and a plot holder (for LinePlot). */
export function plotFigure(
  id: string,
  title: string,
): { figure: HTMLElement; plot: HTMLElement; title: HTMLElement } {
  const titleEl = el('span', { className: 'fig-title', text: title });
  const plot = el('div', { className: 'plot', attrs: { role: 'img' } });
  const figure = el('figure', { className: 'plot-card', attrs: { id } }, [
    el('figcaption', {}, [titleEl]),
    plot,
  ]);
  return { figure, plot, title: titleEl };
}

let idCounter = 0;
export function uniqueId(prefix: string): string {
  idCounter++;
  return `${prefix}-${idCounter}`;
}
