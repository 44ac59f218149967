/** Each figure's caption buttons: save as PNG, and show its numbers in the Tables tab. */
import type { AppState } from '../appState';
import { designFileStem } from '../designFileStem';
import { downloadBlob } from '../download';
import type { Messages } from '../messages';
import type { ViewState } from '../viewState';
import { byId } from './present';

export interface FigureHost {
  readonly state: AppState;
  readonly messages: Messages;
  setView(patch: Partial<ViewState>): void;
}

/** [figure element id, its PNG, the id of the table with its numbers (or null)] */
export type FigureAction = [string, () => Promise<Blob>, string | null];

export function wireFigureActions(figures: readonly FigureAction[], host: FigureHost): void {
  for (const [id, png, tableId] of figures) {
    const cap = byId(id).querySelector('figcaption')!;
    const actions = document.createElement('span');
    actions.className = 'fig-actions';
    const title = cap.querySelector('.fig-title')?.textContent ?? id;
    const pngButton = document.createElement('button');
    pngButton.type = 'button';
    pngButton.textContent = 'PNG';
    pngButton.setAttribute('aria-label', `Save as PNG: ${title}`);
    pngButton.addEventListener('click', () => {
      png().then(
        (blob) => downloadBlob(`${designFileStem(host.state.case)}-${id.replace('fig-', '')}.png`, blob),
        (error: Error) => host.messages.show('error', 'PNG export failed', [error.message], 'png'),
      );
    });
    actions.append(pngButton);
    if (tableId) {
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
