/**
 * The page's buttons outside the figures: cancel, baseline, link, project and case files (read with a
 * size limit; a bad file changes nothing), kept designs and reset.
 */
import { parseCaseFile } from '../compute/caseFile';
import {
  type AppState,
  MAX_CASE_FILE_BYTES,
  MAX_LINK_CHARS,
  MAX_PROJECT_BYTES,
  nameErrors,
  projectTextToState,
  stateToHashOrNull,
  stateToProjectText,
} from './appState';
import { defaultCase } from './defaultCase';
import { designFileStem } from './designFileStem';
import { downloadText } from './download';
import type { PageHost } from './pageHost';
import { defaultRoad } from './roadState';
import { defaultView } from './viewState';
import { byId } from './views/present';

export interface ActionsHost extends PageHost {
  cancelCompute(): void;
  showKept(): void;
  /** The state with its imported data's CSV text (held back in a worker when large). */
  withDataText(state: AppState): Promise<AppState>;
}

export function wirePageActions(host: ActionsHost): void {
  byId('cancel').addEventListener('click', () => {
    // computeStages sees the abort as a cancel (it is still the current run).
    host.cancelCompute();
  });
  byId('pin-baseline').addEventListener('click', () => host.pinBaseline());
  byId('clear-baseline').addEventListener('click', () => {
    const { baselines: _all, ...rest } = host.state;
    host.apply({ ...rest, baseline: null, view: { ...host.state.view, difference: 'none' } });
    host.messages.clear('baseline');
  });
  byId('copy-link').addEventListener('click', () => {
    if (stateToHashOrNull(host.state) === null) {
      host.messages.show(
        'error',
        `No link made: this design is too large for a link (more than ${MAX_LINK_CHARS / 1024} kB). Save a project file to share it.`,
        [],
        'link-copy',
      );
      return;
    }
    const link = location.href;
    navigator.clipboard?.writeText(link).then(
      () =>
        host.messages.show(
          'info',
          'Link copied: it reopens this design, view and baseline.',
          [],
          'link-copy',
        ),
      () =>
        host.messages.show('info', 'Copy this link (it reopens this design and view):', [link], 'link-copy'),
    ) ?? host.messages.show('info', 'Copy this link (it reopens this design and view):', [link], 'link-copy');
  });
  byId('save-project').addEventListener('click', async () => {
    const state = await host.withDataText(host.state);
    if (state.data && state.data.csv === undefined)
      host.messages.show(
        'warning',
        `The project file keeps a reference to your data “${state.data.name}”, not its rows: they could not be read again. Import the file again before saving to keep them.`,
        [],
        'file',
      );
    downloadText(
      `${designFileStem(state.case)}.coversweep-project.json`,
      stateToProjectText(state),
      'application/json',
    );
  });
  byId('export-case').addEventListener('click', () => {
    downloadText(
      `${designFileStem(host.state.case)}.case.json`,
      `${JSON.stringify(host.state.case, null, 2)}\n`,
      'application/json',
    );
  });
  byId<HTMLInputElement>('open-project').addEventListener('change', (event) => {
    const input = event.target as HTMLInputElement;
    void openFile(
      host,
      input,
      MAX_PROJECT_BYTES,
      'a project file is a design of a few kB and its imported data',
      (text, name) => {
        const r = projectTextToState(text, name);
        if (!r.ok) return r.errors;
        host.apply(r.value);
        return null;
      },
    );
  });
  byId<HTMLInputElement>('open-case').addEventListener('change', (event) => {
    const input = event.target as HTMLInputElement;
    void openFile(host, input, MAX_CASE_FILE_BYTES, 'a design file is a few kB', (text, name) => {
      const r = parseCaseFile(text);
      if (!r.ok) return r.errors.map((e) => `${name}: ${e}`);
      const long = nameErrors({ case: r.value }, name);
      if (long.length > 0) return long;
      host.apply({ ...host.state, case: r.value });
      return null;
    });
  });
  byId('kept-designs').addEventListener('click', () => host.showKept());
  byId('reset').addEventListener('click', () => {
    host.apply({
      case: defaultCase(),
      view: defaultView(),
      baseline: null,
      road: defaultRoad(),
      calibration: null,
    });
    host.messages.show(
      'info',
      'Back to the demo wheel and the default view (the baseline is cleared).',
      [],
      'reset',
    );
  });
}

async function openFile(
  host: PageHost,
  input: HTMLInputElement,
  maxBytes: number,
  what: string,
  use: (text: string, name: string) => string[] | null,
): Promise<void> {
  const file = input.files?.[0];
  input.value = '';
  if (!file) return;
  let text: string;
  try {
    if (file.size > maxBytes)
      throw new Error(
        `the file is ${Math.round(file.size / 1024)} kB, more than the ${Math.round(maxBytes / 1024)} kB limit; ${what}`,
      );
    text = await file.text();
  } catch (error) {
    host.messages.show(
      'error',
      `Could not read ${file.name}; nothing changed.`,
      [(error as Error).message],
      'file',
    );
    return;
  }
  const errors = use(text, file.name);
  if (errors) {
    host.messages.show(
      'error',
      `${file.name} could not be opened; the current design is unchanged.`,
      errors,
      'file',
    );
  } else {
    host.messages.clear('file');
    host.messages.show('info', `Opened ${file.name}.`, [], 'file');
  }
}
