/** The data panel's text blocks: the comparison's summary line and slip notices, lists of errors, status words. */
import type { CompareReport } from '../../compute/compare/index';
import { el } from '../dom';
import type { DataPanelDom } from './dataPanelTypes';

/** A bold title over a list of messages (shown as text, never as HTML). */
export function errorBlock(title: string, errors: readonly string[]): HTMLElement[] {
  return [
    el('strong', { text: title }),
    el(
      'ul',
      {},
      errors.map((e) => el('li', { text: e })),
    ),
  ];
}

/** The comparison's one-line summary and its slip notices (or the note that none was found). */
export function renderSummary(
  dom: DataPanelDom,
  report: CompareReport,
  points: number,
  designName: string,
): void {
  dom.summary.textContent = `${points} data point${points === 1 ? '' : 's'} from ${report.data}, compared with ${designName}. Airspeed: ${report.conversion.airspeed}. Air density: ${report.conversion.density}.`;
  dom.flags.replaceChildren(
    ...(report.flags.length > 0
      ? report.flags.map((f) =>
          el('div', { className: 'message warning', attrs: { role: 'status', 'data-flag': f.code } }, [
            el('div', {}, [el('strong', { text: 'Check: ' }), el('span', { text: f.message })]),
          ]),
        )
      : [
          el('div', { className: 'message info' }, [
            el('div', {
              text: 'No unit, axis, sign or reference-area slip found: the data and the model agree in kind.',
            }),
          ]),
        ]),
  );
}

/** The panel's status while a run of this kind goes on, or once it is done. */
export function runText(
  run: { calibrate?: boolean; convergence?: boolean; uncertainty?: unknown },
  phase: 'running' | 'done',
): string {
  const [running, done] = run.calibrate
    ? ['Fitting the model’s parameters to the data (a few seconds)…', 'Fit done.']
    : run.convergence
      ? ['Convergence study: the model on three lattices…', 'Convergence study done.']
      : run.uncertainty
        ? ['Input-uncertainty band: sampling the model…', 'Input-uncertainty band done.']
        : ['Comparing the data with the model…', 'Comparison done.'];
  return phase === 'running' ? running : done;
}
