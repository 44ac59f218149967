/**
 * Plain-language notices above the results: errors (a bad file or link, a rejected value), warnings
 * (validity flags) and information. Text is set with textContent only. A notice with an id replaces
 * the previous notice of that id.
 */
export type MessageKind = 'error' | 'warning' | 'info';

/** A button in a notice (e.g. "Restore it", "Download it"). */
export interface MessageAction {
  label: string;
  onClick: () => void;
  /** data-action attribute, for tests and styling. */
  name?: string;
}

export class Messages {
  constructor(private readonly container: HTMLElement) {}

  show(
    kind: MessageKind,
    title: string,
    lines: readonly string[] = [],
    id?: string,
    actions: readonly MessageAction[] = [],
  ): HTMLElement {
    if (id) this.clear(id);
    const box = document.createElement('div');
    box.className = `message ${kind}`;
    box.setAttribute('role', kind === 'error' ? 'alert' : 'status');
    if (id) box.dataset.id = id;
    const body = document.createElement('div');
    const strong = document.createElement('strong');
    strong.textContent = title;
    body.append(strong);
    if (lines.length > 0) {
      const ul = document.createElement('ul');
      for (const line of lines.slice(0, 12)) {
        const li = document.createElement('li');
        li.textContent = line;
        ul.append(li);
      }
      if (lines.length > 12) {
        const li = document.createElement('li');
        li.textContent = `… and ${lines.length - 12} more`;
        ul.append(li);
      }
      body.append(ul);
    }
    if (actions.length > 0) {
      const row = document.createElement('div');
      row.className = 'button-row';
      for (const a of actions) {
        const b = document.createElement('button');
        b.type = 'button';
        b.textContent = a.label;
        if (a.name) b.dataset.action = a.name;
        b.addEventListener('click', a.onClick);
        row.append(b);
      }
      body.append(row);
    }
    const close = document.createElement('button');
    close.type = 'button';
    close.textContent = 'Dismiss';
    close.setAttribute('aria-label', `Dismiss: ${title}`);
    close.addEventListener('click', () => box.remove());
    box.append(body, close);
    this.container.append(box);
    return box;
  }

  clear(id: string): void {
    for (const el of this.container.querySelectorAll<HTMLElement>('.message')) {
      if (el.dataset.id === id) el.remove();
    }
  }
}
