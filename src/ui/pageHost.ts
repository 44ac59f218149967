import type { AppState } from './appState';
import type { Messages } from './messages';

/** What the page's panels and views may ask of the page: its state, its messages, and making a state current. */
export interface PageHost {
  readonly state: AppState;
  readonly messages: Messages;
  apply(next: AppState, opts?: { replaceUrl: boolean }): void;
  /** Pin the current design as the baseline. */
  pinBaseline(): void;
  /** Redraw the views from the results on screen (e.g. new imported data to overlay). */
  renderAll(): void;
}
