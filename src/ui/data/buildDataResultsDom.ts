/** The panel's results: status, summary, slip flags, plots, residuals, and the fit, convergence and band. */
import { UNCERTAIN_INPUTS, type UncertainInput } from '../../compute/compare/index';
import { DataTable } from '../dataTable';
import { button, el, plotFigure } from '../dom';
import { addPlotExports } from '../export/addPlotExports';
import { exportableTable } from '../export/exportableTable';
import { LinePlot } from '../linePlot';
import type { DataPanelActions, DataPanelDom } from './dataPanelTypes';

export type DataResultsDom = Pick<
  DataPanelDom,
  | 'status'
  | 'cancelButton'
  | 'summary'
  | 'flags'
  | 'plots'
  | 'plotTitles'
  | 'residuals'
  | 'residualSummary'
  | 'fitBlock'
  | 'fitTable'
  | 'fitText'
  | 'useCalibrated'
  | 'convergenceBlock'
  | 'convergenceTable'
  | 'uncertaintyBlock'
  | 'uncertaintyTable'
  | 'rangeInputs'
  | 'actionButtons'
  | 'results'
>;

/** Build the results part (not yet in the page). */
export function buildDataResultsDom(actions: DataPanelActions): DataResultsDom {
  const rangeInputs = new Map<UncertainInput, { min: HTMLInputElement; max: HTMLInputElement }>();
  const actionButtons: HTMLButtonElement[] = [];
  // 3. Results.
  const status = el('p', {
    className: 'road-status',
    attrs: { id: 'data-status', role: 'status', 'aria-live': 'polite' },
  });
  const cancelButton = button('Cancel', () => actions.cancel(), { id: 'data-cancel' });
  cancelButton.hidden = true;
  const summary = el('p', { className: 'small', attrs: { id: 'data-summary' } });
  const flags = el('div', { className: 'data-flags', attrs: { id: 'data-flags' } });
  const f1 = plotFigure('fig-data-force', 'Axial drag vs yaw: data over the model');
  const f2 = plotFigure('fig-data-side', 'Side force vs yaw: data over the model');
  const plots = { dataForce: new LinePlot(f1.plot, 240), dataSide: new LinePlot(f2.plot, 240) };
  const plotTitles = { dataForce: f1.title, dataSide: f2.title };
  // Exports carry the comparison's summary (data file, points, conversions) in their captions.
  const dataLines = () => [summary.textContent ?? ''];
  addPlotExports(f1.figure, plots.dataForce, 'data-force', dataLines);
  addPlotExports(f2.figure, plots.dataSide, 'data-side', dataLines);
  const resScroll = el('div', { className: 'table-scroll' });
  const residuals = new DataTable(
    resScroll,
    'table-data-residuals',
    'Residuals: data − model at every data point',
  );
  const sumScroll = el('div', { className: 'table-scroll' });
  const residualSummary = new DataTable(sumScroll, 'table-data-summary', 'Residual summary per quantity');
  // Fit.
  const fitScroll = el('div', { className: 'table-scroll' });
  const fitTable = new DataTable(fitScroll, 'table-data-fit', 'Fitted model parameters');
  const fitText = el('p', { className: 'small', attrs: { id: 'data-fit-text' } });
  const useCalibrated = el('input', { attrs: { type: 'checkbox', id: 'data-use-calibrated' } });
  useCalibrated.disabled = true;
  useCalibrated.addEventListener('change', () => actions.useCalibratedChanged(useCalibrated.checked));
  const fitBlock = el('div', { className: 'table-block', attrs: { id: 'data-fit' } }, [
    exportableTable(fitScroll, fitTable, 'data-fit', dataLines),
    fitText,
    el('label', { className: 'toggle', attrs: { for: 'data-use-calibrated' } }, [
      useCalibrated,
      ' Use the calibrated model (puts the fitted values into the design’s model options; the page header says CALIBRATED while it is on)',
    ]),
  ]);
  fitBlock.hidden = true;
  const convScroll = el('div', { className: 'table-scroll' });
  const convergenceTable = new DataTable(convScroll, 'table-data-convergence', 'Lattice convergence study');
  const convergenceBlock = exportableTable(convScroll, convergenceTable, 'data-convergence', dataLines);
  convergenceBlock.hidden = true;
  const uncScroll = el('div', { className: 'table-scroll' });
  const uncertaintyTable = new DataTable(uncScroll, 'table-data-uncertainty', 'Input-uncertainty band');
  const uncertaintyBlock = exportableTable(uncScroll, uncertaintyTable, 'data-uncertainty', dataLines);
  uncertaintyBlock.hidden = true;
  const ranges = el('div', { className: 'ranges' });
  for (const name of UNCERTAIN_INPUTS) {
    const min = el('input', {
      attrs: {
        type: 'number',
        step: 'any',
        'aria-label': `${name}: lowest value`,
        'data-range': `${name}-min`,
      },
    });
    const max = el('input', {
      attrs: {
        type: 'number',
        step: 'any',
        'aria-label': `${name}: highest value`,
        'data-range': `${name}-max`,
      },
    });
    rangeInputs.set(name, { min, max });
    ranges.append(
      el('div', { className: 'range' }, [el('span', { text: name }), min, el('span', { text: 'to' }), max]),
    );
  }
  const fit = button('Fit model parameters', () => actions.run({ calibrate: true }), { id: 'data-fit-run' });
  const conv = button('Convergence study', () => actions.run({ convergence: true }), {
    id: 'data-convergence-run',
  });
  const unc = button('Input-uncertainty band', () => actions.runUncertainty(), {
    id: 'data-uncertainty-run',
  });
  actionButtons.push(fit, conv, unc);
  const results = el('section', { className: 'data-results', attrs: { id: 'data-results' } }, [
    summary,
    flags,
    el('div', { className: 'plot-grid' }, [f1.figure, f2.figure]),
    exportableTable(sumScroll, residualSummary, 'data-summary', dataLines),
    exportableTable(resScroll, residuals, 'data-residuals', dataLines),
    el('h3', { text: 'Calibrate and check the model' }),
    el('p', {
      className: 'small',
      text: 'Each of these runs in the background; the page stays usable. A fit takes a few seconds.',
    }),
    el('div', { className: 'button-row' }, [fit, conv, unc]),
    el('details', {}, [
      el('summary', { text: 'Ranges of the input-uncertainty band (blank: not varied)' }),
      ranges,
    ]),
    fitBlock,
    convergenceBlock,
    uncertaintyBlock,
  ]);
  results.hidden = true;

  return {
    status,
    cancelButton,
    summary,
    flags,
    plots,
    plotTitles,
    residuals,
    residualSummary,
    fitBlock,
    fitTable,
    fitText,
    useCalibrated,
    convergenceBlock,
    convergenceTable,
    uncertaintyBlock,
    uncertaintyTable,
    rangeInputs,
    actionButtons,
    results,
  };
}
