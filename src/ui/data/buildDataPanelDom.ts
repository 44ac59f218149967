/** The "Your data" panel's elements: bring the data, what each column holds, and the results. */
import { MAX_DATA_BYTES } from '../../compute/compare/index';
import { button, el } from '../dom';
import { buildDataResultsDom } from './buildDataResultsDom';
import { MAPPING_LABELS } from './dataLabels';
import type { DataPanelActions, DataPanelDom } from './dataPanelTypes';

/** Build the panel into `host` (emptied first) and return its elements. */
export function buildDataPanelDom(host: HTMLElement, actions: DataPanelActions): DataPanelDom {
  host.replaceChildren();
  host.dataset.state = 'empty';
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
      text: MAPPING_LABELS.sideForceLeft,
      attrs: { value: '1' },
    }),
    el('option', { text: MAPPING_LABELS.sideForceRight, attrs: { value: '-1' } }),
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
            el('th', { text: MAPPING_LABELS.unit, attrs: { scope: 'col' } }),
            el('th', { text: MAPPING_LABELS.referenceArea, attrs: { scope: 'col' } }),
            el('th', { text: '', attrs: { scope: 'col' } }),
          ]),
        ]),
        mapBody,
      ]),
    ]),
    el('div', { className: 'data-globals' }, [
      el('div', { className: 'field' }, [
        el('label', { text: MAPPING_LABELS.sideForceSign, attrs: { for: 'data-side-sign' } }),
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

  const resultsDom = buildDataResultsDom(actions);

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
    el('div', { className: 'button-row' }, [resultsDom.status, resultsDom.cancelButton]),
    mapping,
    resultsDom.results,
  );
  return {
    ...resultsDom,
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
  };
}
