/** The "Your data" panel's elements: bring the data, what each column holds, and the results. */
import {
  MAX_DATA_BYTES,
  UNCERTAIN_INPUTS,
  type UncertainInput,
  type UncertainRange,
} from '../../compute/compare/index';
import { DataTable } from '../dataTable';
import { button, el, plotFigure } from '../dom';
import { LinePlot } from '../linePlot';

export type DataPlotName = 'dataForce' | 'dataSide';

/** What the panel's controls ask for (the panel's own methods). */
export interface DataPanelActions {
  readFile(file: File): void;
  readText(text: string, label: string): void;
  loadDemo(): void;
  apply(): void;
  cancel(): void;
  run(extra: { calibrate?: boolean; convergence?: boolean; uncertainty?: UncertainRange[] }): void;
  runUncertainty(): void;
  useCalibratedChanged(checked: boolean): void;
}

export interface DataPanelDom {
  status: HTMLElement;
  readErrors: HTMLElement;
  mapping: HTMLElement;
  mapBody: HTMLTableSectionElement;
  mapErrors: HTMLElement;
  guessNotes: HTMLElement;
  preview: HTMLElement;
  sideSign: HTMLSelectElement;
  speedInput: HTMLInputElement;
  speedUnitEl: HTMLElement;
  densityInput: HTMLInputElement;
  results: HTMLElement;
  summary: HTMLElement;
  flags: HTMLElement;
  plots: Record<DataPlotName, LinePlot>;
  plotTitles: Record<DataPlotName, HTMLElement>;
  residuals: DataTable;
  residualSummary: DataTable;
  fitBlock: HTMLElement;
  fitTable: DataTable;
  fitText: HTMLElement;
  useCalibrated: HTMLInputElement;
  convergenceBlock: HTMLElement;
  convergenceTable: DataTable;
  uncertaintyBlock: HTMLElement;
  uncertaintyTable: DataTable;
  rangeInputs: Map<UncertainInput, { min: HTMLInputElement; max: HTMLInputElement }>;
  cancelButton: HTMLButtonElement;
  actionButtons: HTMLButtonElement[];
}

/** Build the panel into `host` (emptied first) and return its elements. */
export function buildDataPanelDom(host: HTMLElement, actions: DataPanelActions): DataPanelDom {
  host.replaceChildren();
  host.dataset.state = 'empty';
  const rangeInputs = new Map<UncertainInput, { min: HTMLInputElement; max: HTMLInputElement }>();
  const actionButtons: HTMLButtonElement[] = [];
  // 1. Bring the data.
  const fileInput = el('input', {
    className: 'visually-hidden',
    attrs: { type: 'file', id: 'data-file', accept: '.csv,.tsv,.txt,text/csv,text/plain' },
  });
  fileInput.addEventListener('change', () => {
    const file = fileInput.files?.[0];
    fileInput.value = '';
    if (file) void actions.readFile(file);
  });
  const drop = el(
    'div',
    {
      className: 'drop-zone',
      attrs: {
        id: 'data-drop',
        tabindex: '0',
        role: 'button',
        'aria-label': 'Drop a CSV file here, or press Enter to choose one',
      },
    },
    [
      el('strong', { text: 'Drop a CSV file here' }),
      el('span', { text: ' or ' }),
      el('label', { className: 'file-link', text: 'choose a file…', attrs: { for: 'data-file' } }),
      fileInput,
      el('div', {
        className: 'small',
        text: `Comma, semicolon or tab separated, with a header row; at most ${Math.round(MAX_DATA_BYTES / 1048576)} MB. The file is read here and never changed or sent anywhere.`,
      }),
    ],
  );
  drop.addEventListener('keydown', (e) => {
    if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      fileInput.click();
    }
  });
  drop.addEventListener('dragover', (e) => {
    e.preventDefault();
    drop.classList.add('over');
  });
  drop.addEventListener('dragleave', () => drop.classList.remove('over'));
  drop.addEventListener('drop', (e) => {
    e.preventDefault();
    drop.classList.remove('over');
    const file = e.dataTransfer?.files?.[0];
    if (file) void actions.readFile(file);
  });
  const paste = el('textarea', {
    attrs: {
      id: 'data-paste',
      rows: '4',
      spellcheck: 'false',
      placeholder: 'Yaw [deg]\tDrag [g]\tSide force [N]\n0\t45.1\t0.02\n…',
    },
  });
  const pasteButton = button('Read the pasted table', () => actions.readText(paste.value, 'pasted table'), {
    id: 'data-paste-read',
  });
  const demo = button('Load the demo data', () => actions.loadDemo(), { id: 'data-demo' });
  const readErrors = el('div', {
    className: 'field-error',
    attrs: { id: 'data-read-errors', role: 'alert' },
  });

  // 2. Mapping.
  const mapBody = document.createElement('tbody');
  const mapErrors = el('div', {
    className: 'field-error',
    attrs: { id: 'data-map-errors', 'aria-live': 'polite' },
  });
  const guessNotes = el('ul', { className: 'small guess-notes' });
  const preview = el('div', { className: 'table-scroll preview' });
  const sideSign = el('select', { attrs: { id: 'data-side-sign' } }, [
    el('option', {
      text: '+ to the rider’s left (this tool’s axes)',
      attrs: { value: '1' },
    }),
    el('option', { text: '+ to the rider’s right (mirrored)', attrs: { value: '-1' } }),
  ]);
  const speedInput = el('input', {
    attrs: { id: 'data-speed', type: 'number', step: 'any', inputmode: 'decimal' },
  });
  const speedUnitEl = el('span', { className: 'unit' });
  const densityInput = el('input', {
    attrs: {
      id: 'data-density',
      type: 'number',
      step: 'any',
      inputmode: 'decimal',
      placeholder: 'the design’s air',
    },
  });
  const apply = button('Apply and compare', () => actions.apply(), { id: 'data-apply' });
  const mapping = el('section', { className: 'data-mapping', attrs: { id: 'data-mapping' } }, [
    el('h3', { text: 'What each column holds' }),
    el('p', {
      className: 'small',
      text: 'Pre-filled from the column headers and the size of the values. Rows marked “check” were guessed: confirm them before trusting the comparison.',
    }),
    el('div', { className: 'table-scroll' }, [
      el('table', { className: 'map-table', attrs: { id: 'data-map-table' } }, [
        el('thead', {}, [
          el('tr', {}, [
            el('th', { text: 'Column', attrs: { scope: 'col' } }),
            el('th', { text: 'Holds', attrs: { scope: 'col' } }),
            el('th', { text: 'Unit', attrs: { scope: 'col' } }),
            el('th', { text: 'Reference area, m²', attrs: { scope: 'col' } }),
            el('th', { text: '', attrs: { scope: 'col' } }),
          ]),
        ]),
        mapBody,
      ]),
    ]),
    el('div', { className: 'data-globals' }, [
      el('div', { className: 'field' }, [
        el('label', { text: 'Side force sign', attrs: { for: 'data-side-sign' } }),
        el('div', { className: 'input' }, [sideSign]),
      ]),
      el('div', { className: 'field' }, [
        el('label', { text: 'Airspeed (when no column holds it)', attrs: { for: 'data-speed' } }),
        el('div', { className: 'input' }, [speedInput, speedUnitEl]),
      ]),
      el('div', { className: 'field' }, [
        el('label', { text: 'Air density (blank: the design’s air)', attrs: { for: 'data-density' } }),
        el('div', { className: 'input' }, [densityInput, el('span', { className: 'unit', text: 'kg/m³' })]),
      ]),
    ]),
    apply,
    mapErrors,
    el('details', {}, [el('summary', { text: 'What was guessed, and why' }), guessNotes]),
    el('details', { attrs: { id: 'data-preview-details' } }, [
      el('summary', { text: 'The first rows as read' }),
      preview,
    ]),
  ]);
  mapping.hidden = true;

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
    fitScroll,
    fitText,
    el('label', { className: 'toggle', attrs: { for: 'data-use-calibrated' } }, [
      useCalibrated,
      ' Use the calibrated model (puts the fitted values into the design’s model options; the page header says CALIBRATED while it is on)',
    ]),
  ]);
  fitBlock.hidden = true;
  const convScroll = el('div', { className: 'table-scroll' });
  const convergenceTable = new DataTable(convScroll, 'table-data-convergence', 'Lattice convergence study');
  const convergenceBlock = el('div', { className: 'table-block' }, [convScroll]);
  convergenceBlock.hidden = true;
  const uncScroll = el('div', { className: 'table-scroll' });
  const uncertaintyTable = new DataTable(uncScroll, 'table-data-uncertainty', 'Input-uncertainty band');
  const uncertaintyBlock = el('div', { className: 'table-block' }, [uncScroll]);
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
    el('div', { className: 'table-block' }, [sumScroll]),
    el('div', { className: 'table-block' }, [resScroll]),
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

  host.append(
    el('h2', { text: 'Your data: CFD or wind-tunnel results against the model' }),
    el('p', {
      className: 'small',
      text: 'Catches unit, axis and reference-area slips, shows where the model and your data disagree, and can fit three of the model’s parameters to your data. Estimates from a reduced-order model: rely on qualified testing before riding a design.',
    }),
    el('div', { className: 'data-input' }, [
      drop,
      el('div', { className: 'paste' }, [
        el('label', { text: 'Or paste a table (from a spreadsheet)', attrs: { for: 'data-paste' } }),
        paste,
        el('div', { className: 'button-row' }, [pasteButton, demo]),
      ]),
    ]),
    readErrors,
    el('div', { className: 'button-row' }, [status, cancelButton]),
    mapping,
    results,
  );
  return {
    status,
    readErrors,
    mapping,
    mapBody,
    mapErrors,
    guessNotes,
    preview,
    sideSign,
    speedInput,
    speedUnitEl,
    densityInput,
    results,
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
    cancelButton,
    actionButtons,
  };
}
