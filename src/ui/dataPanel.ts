/**
 * The "Your data" panel: bring a table of measured or simulated results (drop a file, choose one, or
 * paste from a spreadsheet; or load the invented demo data), say what each column holds (pre-filled
 * from guessMap, marked "check" where it guessed), then see the comparison: slips found (plain
 * notices), data over the model's band for axial and side force vs yaw, residuals, and on request a
 * calibration with 95 % intervals, a lattice convergence study and an input-uncertainty band.
 *
 * The data file is only read, never modified, and never leaves the page. Everything from it (file name,
 * headers, cells) is shown with textContent, never as HTML.
 */
import {
  type CalibrationResult,
  COEFFICIENT_QUANTITIES,
  type CompareReport,
  type GuessContext,
  MAP_FORMAT,
  MAP_VERSION,
  MAX_DATA_BYTES,
  type MapColumn,
  type MapFile,
  OUTPUT_LABEL,
  type Output,
  PARAMETER_BOUNDS,
  QUANTITIES,
  QUANTITY_UNITS,
  type Quantity,
  UNCERTAIN_INPUTS,
  type UncertainInput,
  type UncertainRange,
  type Unit,
  validateMap,
} from '../compute/compare/index';
import {
  type PackedComparison,
  type ReadOutcome,
  residualRowAt,
  type TableRef,
  type TableSource,
  type TableSummary,
  unpackComparison,
} from './dataJobs';
import { type Cell, DataTable } from './dataTable';
import { fixed, fmt, speedFromMps, speedToMps, speedUnitText } from './displayUnits';
import { button, el, plotFigure } from './dom';
import { LinePlot, type PlotBand, type PlotSeries, type PlotSpec } from './linePlot';
import type { SpeedUnit } from './viewState';

export type DataPlotName = 'dataForce' | 'dataSide';
export type DataPanelState = 'empty' | 'mapping' | 'computing' | 'done' | 'error';

export interface DataContext {
  /** The design's disc area pi R^2 (m^2), the coefficients' assumed reference area. */
  referenceAreaM2: number;
  /** The design's first airspeed (m/s), assumed when no column holds the speed. */
  airspeedMps: number;
  rhoKgPerM3: number;
  speedUnit: SpeedUnit;
  designName: string;
}

export interface DataRunRequest {
  /** The table (kept in the worker that read it; read again from its source by a fresh worker). */
  ref: TableRef;
  /** Data rows in the table (scales the job's deadline). */
  rowCount: number;
  map: MapFile;
  label: string;
  calibrate: boolean;
  convergence: boolean;
  uncertainty: UncertainRange[] | null;
}

const QUANTITY_TEXT: Record<Quantity, string> = {
  yaw_deg: 'yaw angle',
  speed: 'airspeed',
  air_density: 'air density',
  axial_force: 'axial drag (along travel)',
  drag_force_wind: 'drag along the wind',
  side_force: 'side force',
  drag_area: 'drag area (axial)',
  drag_area_wind: 'drag area (wind axis)',
  drag_coefficient: 'drag coefficient (axial)',
  drag_coefficient_wind: 'drag coefficient (wind axis)',
  side_coefficient: 'side-force coefficient',
  yaw_moment: 'yaw moment',
  steering_moment: 'steering moment',
  ignore: '— ignore —',
};

const UNIT_TEXT: Record<Unit, string> = {
  N: 'N',
  gf: 'grams-force',
  kgf: 'kgf',
  lbf: 'lbf',
  m2: 'm²',
  cm2: 'cm²',
  deg: 'deg',
  rad: 'rad',
  mps: 'm/s',
  kmh: 'km/h',
  mph: 'mph',
  '1': '(none)',
  Nm: 'N m',
  Nmm: 'N mm',
  kgpm3: 'kg/m³',
};

const SPEED_COLOURS = ['#1c6876', '#c2412d', '#6b4fa0', '#b8860b', '#2e7d32', '#5d4037'];

interface MapRow {
  header: string;
  quantity: HTMLSelectElement;
  unit: HTMLSelectElement;
  area: HTMLInputElement;
  areaCell: HTMLElement;
}

/** At most this many data points are drawn per plot (an even subsample of larger tables). */
export const MAX_PLOTTED_POINTS = 2000;

export class DataPanel {
  private table: TableSummary | null = null;
  private ref: TableRef | null = null;
  private nextTableId = 1;
  private label = '';
  private ctx: DataContext | null = null;
  private applied: { ref: TableRef; rowCount: number; map: MapFile; label: string } | null = null;
  /** The last comparison (slim report: its per-point arrays are in `packed`). */
  private report: CompareReport | null = null;
  private packed: PackedComparison | null = null;
  private calibration: CalibrationResult | null = null;
  /** The last convergence study and uncertainty band, kept until the data, mapping or design change. */
  private convergence: CompareReport['convergence'] | null = null;
  private uncertainty: CompareReport['uncertainty'] | null = null;
  private readonly status: HTMLElement;
  private readonly readErrors: HTMLElement;
  private readonly mapping: HTMLElement;
  private readonly mapBody: HTMLTableSectionElement;
  private readonly mapErrors: HTMLElement;
  private readonly guessNotes: HTMLElement;
  private readonly preview: HTMLElement;
  private readonly sideSign: HTMLSelectElement;
  private readonly speedInput: HTMLInputElement;
  private readonly speedUnitEl: HTMLElement;
  private readonly densityInput: HTMLInputElement;
  private readonly results: HTMLElement;
  private readonly summary: HTMLElement;
  private readonly flags: HTMLElement;
  private readonly plots: Record<DataPlotName, LinePlot>;
  private readonly plotTitles: Record<DataPlotName, HTMLElement>;
  private readonly residuals: DataTable;
  private readonly residualSummary: DataTable;
  private readonly fitBlock: HTMLElement;
  private readonly fitTable: DataTable;
  private readonly fitText: HTMLElement;
  private readonly useCalibrated: HTMLInputElement;
  private readonly convergenceBlock: HTMLElement;
  private readonly convergenceTable: DataTable;
  private readonly uncertaintyBlock: HTMLElement;
  private readonly uncertaintyTable: DataTable;
  private readonly rangeInputs = new Map<UncertainInput, { min: HTMLInputElement; max: HTMLInputElement }>();
  private readonly cancelButton: HTMLButtonElement;
  private readonly actionButtons: HTMLButtonElement[] = [];

  constructor(
    private readonly host: HTMLElement,
    private readonly handlers: {
      context(): DataContext;
      /** Read a table in the background; null when superseded or cancelled. */
      read(ref: TableRef, context: GuessContext): Promise<ReadOutcome | null>;
      onLoadDemo(): void;
      onRun(request: DataRunRequest): void;
      onCancel(): void;
      onUseCalibrated(use: boolean, calibration: CalibrationResult | null, points: number): void;
    },
  ) {
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
      if (file) void this.readFile(file);
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
      if (file) void this.readFile(file);
    });
    const paste = el('textarea', {
      attrs: {
        id: 'data-paste',
        rows: '4',
        spellcheck: 'false',
        placeholder: 'Yaw [deg]\tDrag [g]\tSide force [N]\n0\t45.1\t0.02\n…',
      },
    });
    const pasteButton = button('Read the pasted table', () => this.readText(paste.value, 'pasted table'), {
      id: 'data-paste-read',
    });
    const demo = button('Load the demo data', () => this.handlers.onLoadDemo(), { id: 'data-demo' });
    this.readErrors = el('div', {
      className: 'field-error',
      attrs: { id: 'data-read-errors', role: 'alert' },
    });

    // 2. Mapping.
    this.mapBody = document.createElement('tbody');
    this.mapErrors = el('div', {
      className: 'field-error',
      attrs: { id: 'data-map-errors', 'aria-live': 'polite' },
    });
    this.guessNotes = el('ul', { className: 'small guess-notes' });
    this.preview = el('div', { className: 'table-scroll preview' });
    this.sideSign = el('select', { attrs: { id: 'data-side-sign' } }, [
      el('option', {
        text: '+ to the rider’s left (this tool’s axes)',
        attrs: { value: '1' },
      }),
      el('option', { text: '+ to the rider’s right (mirrored)', attrs: { value: '-1' } }),
    ]);
    this.speedInput = el('input', {
      attrs: { id: 'data-speed', type: 'number', step: 'any', inputmode: 'decimal' },
    });
    this.speedUnitEl = el('span', { className: 'unit' });
    this.densityInput = el('input', {
      attrs: {
        id: 'data-density',
        type: 'number',
        step: 'any',
        inputmode: 'decimal',
        placeholder: 'the design’s air',
      },
    });
    const apply = button('Apply and compare', () => this.apply(), { id: 'data-apply' });
    this.mapping = el('section', { className: 'data-mapping', attrs: { id: 'data-mapping' } }, [
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
          this.mapBody,
        ]),
      ]),
      el('div', { className: 'data-globals' }, [
        el('div', { className: 'field' }, [
          el('label', { text: 'Side force sign', attrs: { for: 'data-side-sign' } }),
          el('div', { className: 'input' }, [this.sideSign]),
        ]),
        el('div', { className: 'field' }, [
          el('label', { text: 'Airspeed (when no column holds it)', attrs: { for: 'data-speed' } }),
          el('div', { className: 'input' }, [this.speedInput, this.speedUnitEl]),
        ]),
        el('div', { className: 'field' }, [
          el('label', { text: 'Air density (blank: the design’s air)', attrs: { for: 'data-density' } }),
          el('div', { className: 'input' }, [
            this.densityInput,
            el('span', { className: 'unit', text: 'kg/m³' }),
          ]),
        ]),
      ]),
      apply,
      this.mapErrors,
      el('details', {}, [el('summary', { text: 'What was guessed, and why' }), this.guessNotes]),
      el('details', { attrs: { id: 'data-preview-details' } }, [
        el('summary', { text: 'The first rows as read' }),
        this.preview,
      ]),
    ]);
    this.mapping.hidden = true;

    // 3. Results.
    this.status = el('p', {
      className: 'road-status',
      attrs: { id: 'data-status', role: 'status', 'aria-live': 'polite' },
    });
    this.cancelButton = button('Cancel', () => this.handlers.onCancel(), { id: 'data-cancel' });
    this.cancelButton.hidden = true;
    this.summary = el('p', { className: 'small', attrs: { id: 'data-summary' } });
    this.flags = el('div', { className: 'data-flags', attrs: { id: 'data-flags' } });
    const f1 = plotFigure('fig-data-force', 'Axial drag vs yaw: data over the model');
    const f2 = plotFigure('fig-data-side', 'Side force vs yaw: data over the model');
    this.plots = { dataForce: new LinePlot(f1.plot, 240), dataSide: new LinePlot(f2.plot, 240) };
    this.plotTitles = { dataForce: f1.title, dataSide: f2.title };
    const resScroll = el('div', { className: 'table-scroll' });
    this.residuals = new DataTable(
      resScroll,
      'table-data-residuals',
      'Residuals: data − model at every data point',
    );
    const sumScroll = el('div', { className: 'table-scroll' });
    this.residualSummary = new DataTable(sumScroll, 'table-data-summary', 'Residual summary per quantity');
    // Fit.
    const fitScroll = el('div', { className: 'table-scroll' });
    this.fitTable = new DataTable(fitScroll, 'table-data-fit', 'Fitted model parameters');
    this.fitText = el('p', { className: 'small', attrs: { id: 'data-fit-text' } });
    this.useCalibrated = el('input', { attrs: { type: 'checkbox', id: 'data-use-calibrated' } });
    this.useCalibrated.disabled = true;
    this.useCalibrated.addEventListener('change', () =>
      this.handlers.onUseCalibrated(
        this.useCalibrated.checked,
        this.calibration,
        this.calibration?.fitted_to.points ?? 0,
      ),
    );
    this.fitBlock = el('div', { className: 'table-block', attrs: { id: 'data-fit' } }, [
      fitScroll,
      this.fitText,
      el('label', { className: 'toggle', attrs: { for: 'data-use-calibrated' } }, [
        this.useCalibrated,
        ' Use the calibrated model (puts the fitted values into the design’s model options; the page header says CALIBRATED while it is on)',
      ]),
    ]);
    this.fitBlock.hidden = true;
    const convScroll = el('div', { className: 'table-scroll' });
    this.convergenceTable = new DataTable(convScroll, 'table-data-convergence', 'Lattice convergence study');
    this.convergenceBlock = el('div', { className: 'table-block' }, [convScroll]);
    this.convergenceBlock.hidden = true;
    const uncScroll = el('div', { className: 'table-scroll' });
    this.uncertaintyTable = new DataTable(uncScroll, 'table-data-uncertainty', 'Input-uncertainty band');
    this.uncertaintyBlock = el('div', { className: 'table-block' }, [uncScroll]);
    this.uncertaintyBlock.hidden = true;
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
      this.rangeInputs.set(name, { min, max });
      ranges.append(
        el('div', { className: 'range' }, [el('span', { text: name }), min, el('span', { text: 'to' }), max]),
      );
    }
    const fit = button('Fit model parameters', () => this.run({ calibrate: true }), { id: 'data-fit-run' });
    const conv = button('Convergence study', () => this.run({ convergence: true }), {
      id: 'data-convergence-run',
    });
    const unc = button('Input-uncertainty band', () => this.runUncertainty(), { id: 'data-uncertainty-run' });
    this.actionButtons.push(fit, conv, unc);
    this.results = el('section', { className: 'data-results', attrs: { id: 'data-results' } }, [
      this.summary,
      this.flags,
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
      this.fitBlock,
      this.convergenceBlock,
      this.uncertaintyBlock,
    ]);
    this.results.hidden = true;

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
      this.readErrors,
      el('div', { className: 'button-row' }, [this.status, this.cancelButton]),
      this.mapping,
      this.results,
    );
  }

  // -------------------------------------------------------------------------------------------
  // Reading

  private readFile(file: File): Promise<void> {
    return this.readSource({ kind: 'file', file }, file.name);
  }

  /** Read CSV or pasted text (also the demo file's text). */
  readText(text: string, label: string): Promise<void> {
    return this.readSource({ kind: 'text', text }, label);
  }

  /** Read a table in the background worker (the page stays responsive however large it is). */
  private async readSource(source: TableSource, label: string): Promise<void> {
    this.setStatus('computing', `Reading ${label}…`);
    const ctx = this.handlers.context();
    this.ctx = ctx;
    const ref: TableRef = { id: this.nextTableId++, source, label };
    const result = await this.handlers.read(ref, {
      referenceAreaM2: ctx.referenceAreaM2,
      airspeedMps: ctx.airspeedMps,
    });
    if (result === null) return;
    this.useResult(result, ref);
  }

  private useResult(result: ReadOutcome, ref: TableRef): void {
    const label = ref.label;
    if (!result.ok) {
      this.readErrors.replaceChildren(
        el('strong', { text: `${label} could not be read; nothing changed.` }),
        el(
          'ul',
          {},
          result.errors.map((e) => el('li', { text: e })),
        ),
      );
      this.setStatus(this.table ? 'mapping' : 'empty', '');
      return;
    }
    this.readErrors.replaceChildren();
    this.table = result.summary;
    this.ref = ref;
    this.label = label;
    this.report = null;
    this.packed = null;
    this.calibration = null;
    this.convergence = null;
    this.uncertainty = null;
    this.applied = null;
    this.results.hidden = true;
    this.fillMapping();
    this.setStatus(
      'mapping',
      `Read ${label}: ${result.summary.rowCount} rows, ${result.summary.headers.length} columns. Check what each column holds, then “Apply and compare”.`,
    );
  }

  private fillMapping(): void {
    const table = this.table!;
    const ctx = this.handlers.context();
    this.ctx = ctx;
    const guess = table.guess;
    // Column names are data: look them up without the prototype chain ("__proto__" is a name too).
    const guessed = new Map(Object.entries(guess.map.columns));
    const rows: MapRow[] = [];
    const body = document.createDocumentFragment();
    table.headers.forEach((header, k) => {
      const col = guessed.get(header) ?? { quantity: 'ignore', unit: '1' };
      const unsure = guess.notes.some((n) => n.startsWith(`"${header}"`) && /CHECK|not recognised/.test(n));
      const quantity = el('select', {
        attrs: { 'aria-label': `Column ${k + 1}: what it holds`, 'data-col': String(k) },
      });
      for (const q of QUANTITIES) {
        const o = el('option', { text: QUANTITY_TEXT[q] });
        o.value = q;
        quantity.append(o);
      }
      quantity.value = col.quantity;
      const unit = el('select', { attrs: { 'aria-label': `Column ${k + 1}: unit` } });
      const area = el('input', {
        attrs: { type: 'number', step: 'any', 'aria-label': `Column ${k + 1}: reference area, m²` },
      });
      area.value = String(col.reference_area_m2 ?? Number(ctx.referenceAreaM2.toPrecision(6)));
      const areaCell = el('td', {}, [area]);
      const fillUnits = (selected: Unit | null) => {
        const q = quantity.value as Quantity;
        const allowed = q === 'ignore' ? (['1'] as Unit[]) : QUANTITY_UNITS[q];
        unit.replaceChildren(
          ...allowed.map((u) => {
            const o = el('option', { text: UNIT_TEXT[u] });
            o.value = u;
            return o;
          }),
        );
        unit.value = selected && allowed.includes(selected) ? selected : allowed[0]!;
        area.hidden = !COEFFICIENT_QUANTITIES.includes(q);
      };
      fillUnits(col.unit);
      quantity.addEventListener('change', () => fillUnits(null));
      const headerCell = el('th', { attrs: { scope: 'row' } });
      headerCell.textContent = header;
      const mark = el('td', { className: unsure ? 'check' : '', text: unsure ? 'check' : '' });
      body.append(
        el('tr', { className: unsure ? 'unsure' : '' }, [
          headerCell,
          el('td', {}, [quantity]),
          el('td', {}, [unit]),
          areaCell,
          mark,
        ]),
      );
      rows.push({ header, quantity, unit, area, areaCell });
    });
    this.mapBody.replaceChildren(body);
    this.mapRows = rows;
    this.sideSign.value = String(guess.map.side_force_sign);
    const su = ctx.speedUnit;
    this.speedUnitEl.textContent = speedUnitText(su);
    this.speedInput.value = String(
      Number(speedFromMps(guess.map.airspeed_mps ?? ctx.airspeedMps, su).toPrecision(6)),
    );
    this.densityInput.value = '';
    this.guessNotes.replaceChildren(...guess.notes.map((n) => el('li', { text: n })));
    this.mapErrors.replaceChildren();
    // A preview of the first rows, as read (text only).
    const head = el(
      'tr',
      {},
      table.headers.map((h) => el('th', { text: h, attrs: { scope: 'col' } })),
    );
    const previewRows = table.preview.map((r) =>
      el(
        'tr',
        {},
        r.map((c) => el('td', { text: c })),
      ),
    );
    this.preview.replaceChildren(
      el('table', { className: 'data-table', attrs: { id: 'data-preview' } }, [
        el('thead', {}, [head]),
        el('tbody', {}, previewRows),
      ]),
    );
    this.mapping.hidden = false;
  }

  private mapRows: MapRow[] = [];

  /** The mapping table as a map file (not yet validated). */
  private mapFromForm(): { map: unknown; errors: string[] } {
    const errors: string[] = [];
    // No prototype: a column may be named "__proto__", "constructor" or "prototype".
    const columns: Record<string, MapColumn> = Object.create(null);
    for (const r of this.mapRows) {
      const q = r.quantity.value as Quantity;
      const col: MapColumn = { quantity: q, unit: r.unit.value as Unit };
      if (COEFFICIENT_QUANTITIES.includes(q)) {
        const a = Number(r.area.value);
        if (r.area.value.trim() === '' || !Number.isFinite(a)) {
          errors.push(`column "${r.header}": the reference area must be a number of m²`);
        }
        col.reference_area_m2 = a;
      }
      columns[r.header] = col;
    }
    const map: Record<string, unknown> = {
      format: MAP_FORMAT,
      version: MAP_VERSION,
      columns,
      side_force_sign: Number(this.sideSign.value),
    };
    const hasSpeed = Object.values(columns).some((c) => c.quantity === 'speed');
    if (!hasSpeed) {
      const v = Number(this.speedInput.value);
      if (this.speedInput.value.trim() === '' || !Number.isFinite(v)) {
        errors.push('airspeed: give the airspeed of the measurements (no column holds it)');
      } else map.airspeed_mps = speedToMps(v, this.ctx?.speedUnit ?? 'kmh');
    }
    const hasDensity = Object.values(columns).some((c) => c.quantity === 'air_density');
    if (this.densityInput.value.trim() !== '' && !hasDensity) {
      map.air_density_kgpm3 = Number(this.densityInput.value);
    }
    return { map, errors };
  }

  private apply(): void {
    if (!this.table || !this.ref) return;
    const { map, errors } = this.mapFromForm();
    const v = validateMap(map);
    const all = [...errors, ...(v.ok ? [] : v.errors)];
    if (all.length > 0 || !v.ok) {
      this.mapErrors.replaceChildren(
        el('strong', { text: 'Not applied:' }),
        el(
          'ul',
          {},
          all.map((e) => el('li', { text: e })),
        ),
      );
      return;
    }
    this.mapErrors.replaceChildren();
    this.applied = { ref: this.ref, rowCount: this.table.rowCount, map: v.value, label: this.label };
    this.calibration = null;
    this.convergence = null;
    this.uncertainty = null;
    this.run({});
  }

  private run(extra: { calibrate?: boolean; convergence?: boolean; uncertainty?: UncertainRange[] }): void {
    if (!this.applied) return;
    const what = extra.calibrate
      ? 'Fitting the model’s parameters to the data (a few seconds)…'
      : extra.convergence
        ? 'Convergence study: the model on three lattices…'
        : extra.uncertainty
          ? 'Input-uncertainty band: sampling the model…'
          : 'Comparing the data with the model…';
    this.setStatus('computing', what);
    this.handlers.onRun({
      ...this.applied,
      calibrate: extra.calibrate ?? false,
      convergence: extra.convergence ?? false,
      uncertainty: extra.uncertainty ?? null,
    });
  }

  private runUncertainty(): void {
    const ranges: UncertainRange[] = [];
    const errors: string[] = [];
    for (const [name, { min, max }] of this.rangeInputs) {
      const a = min.value.trim();
      const b = max.value.trim();
      if (a === '' && b === '') continue;
      const lo = Number(a);
      const hi = Number(b);
      if (a === '' || b === '' || !Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) {
        errors.push(`${name}: give two numbers, lowest first`);
        continue;
      }
      ranges.push({ name, min: lo, max: hi });
    }
    if (ranges.length === 0) errors.push('give at least one range');
    if (errors.length > 0) {
      this.setStatus('done', `Input-uncertainty band not run: ${errors.join('; ')}.`);
      return;
    }
    this.run({ uncertainty: ranges });
  }

  /** The design changed: compare the applied data with it again (the fit stays until replaced). */
  designChanged(): void {
    this.convergence = null;
    this.uncertainty = null;
    if (this.applied && this.host.offsetParent !== null) this.run({});
    else if (this.applied) this.stale = true;
  }

  private stale = false;

  /** The panel became visible. */
  shown(): void {
    if (this.stale && this.applied) {
      this.stale = false;
      this.run({});
    }
  }

  setStatus(state: DataPanelState, text: string): void {
    this.host.dataset.state = state;
    this.status.textContent = text;
    this.cancelButton.hidden = state !== 'computing';
    for (const b of this.actionButtons) b.disabled = state === 'computing';
  }

  setCalibratedInUse(on: boolean): void {
    this.useCalibrated.checked = on;
  }

  plotSpec(name: DataPlotName): PlotSpec | null {
    return this.plots[name].currentSpec();
  }

  /**
   * The last comparison in full, once all of it is on screen (its per-point rows rebuilt from the
   * columns: for inspection).
   */
  lastReport(): CompareReport | null {
    if (!this.report || !this.packed) return null;
    return { ...unpackComparison({ ...this.packed, report: this.report }) };
  }

  /** The uncertainty ranges' defaults for the design (density +- 2 %, suction recovery 0.3..0.7). */
  setDefaultRanges(rhoKgPerM3: number): void {
    const d = this.rangeInputs.get('air_density_kgpm3');
    if (d && d.min.value === '' && d.max.value === '') {
      d.min.value = (rhoKgPerM3 * 0.98).toFixed(4);
      d.max.value = (rhoKgPerM3 * 1.02).toFixed(4);
    }
    const s = this.rangeInputs.get('suction_recovered');
    if (s && s.min.value === '' && s.max.value === '') {
      s.min.value = '0.3';
      s.max.value = '0.7';
    }
  }

  // -------------------------------------------------------------------------------------------
  // Results

  showErrors(title: string, errors: readonly string[]): void {
    this.setStatus('error', title);
    this.mapErrors.replaceChildren(
      el('strong', { text: title }),
      el(
        'ul',
        {},
        errors.slice(0, 20).map((e) => el('li', { text: e })),
      ),
    );
  }

  /** Counts showReport calls: a newer report stops an older one still drawing. */
  private reportsShown = 0;

  /**
   * Show a comparison. Drawn in steps, the page getting control back between them (each plot forces a
   * layout; a large table's page is built on its own), so no single task blocks the page for long.
   */
  async showReport(packed: PackedComparison, request: DataRunRequest): Promise<void> {
    const token = ++this.reportsShown;
    const ctx = this.handlers.context();
    this.ctx = ctx;
    const fresh = packed.report;
    if (fresh.convergence) this.convergence = fresh.convergence;
    if (fresh.uncertainty) this.uncertainty = fresh.uncertainty;
    const report: CompareReport = { ...fresh };
    if (this.convergence) report.convergence = this.convergence;
    if (this.uncertainty) report.uncertainty = this.uncertainty;
    this.report = null; // until it is all on screen
    this.packed = packed;
    this.results.hidden = false;
    const n = packed.converted.count;
    this.summary.textContent = `${n} data point${n === 1 ? '' : 's'} from ${report.data}, compared with ${ctx.designName}. Airspeed: ${report.conversion.airspeed}. Air density: ${report.conversion.density}.`;
    this.flags.replaceChildren(
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
    if (request.calibrate && report.calibration) this.calibration = report.calibration;
    // The small tables at once...
    this.renderFit();
    this.convergenceBlock.hidden = !report.convergence;
    if (report.convergence) this.renderConvergence(report);
    this.uncertaintyBlock.hidden = !report.uncertainty;
    if (report.uncertainty) this.renderUncertainty(report);
    // ...then the plots and the residuals, each after the next frame (or after 100 ms in a hidden tab,
    // which has no frames), so the browser lays out and paints each on its own.
    const steps = [
      () => this.renderOverlay(report, 'dataForce'),
      () => this.renderOverlay(report, 'dataSide'),
      () => this.renderResiduals(report),
    ];
    for (const step of steps) {
      await new Promise((resolve) => {
        const late = setTimeout(resolve, 100);
        requestAnimationFrame(() => {
          clearTimeout(late);
          setTimeout(resolve, 0);
        });
      });
      if (token !== this.reportsShown) return;
      step();
    }
    this.report = report;
    this.setStatus(
      'done',
      request.calibrate
        ? 'Fit done.'
        : request.convergence
          ? 'Convergence study done.'
          : request.uncertainty
            ? 'Input-uncertainty band done.'
            : 'Comparison done.',
    );
  }

  private renderOverlay(report: CompareReport, which: DataPlotName): void {
    const outs = new Set(report.band.map((b) => b.output));
    const conv = this.packed!.converted;
    this.plotStride = Math.max(1, Math.ceil(conv.count / MAX_PLOTTED_POINTS));
    const first: Output = outs.has('axial_N')
      ? 'axial_N'
      : outs.has('wind_drag_N')
        ? 'wind_drag_N'
        : 'yaw_moment_Nm';
    const second: Output = outs.has('side_N')
      ? 'side_N'
      : outs.has('yaw_moment_Nm')
        ? 'yaw_moment_Nm'
        : first;
    if (which === 'dataForce') this.renderOne('dataForce', first, report);
    else this.renderOne('dataSide', second, report);
  }

  /** Every how many data points one is drawn (1 up to MAX_PLOTTED_POINTS points). */
  private plotStride = 1;

  private renderOne(name: DataPlotName, out: Output, report: CompareReport): void {
    const ctx = this.ctx!;
    const conv = this.packed!.converted;
    const values = conv.values[out];
    const stride = this.plotStride;
    const unit = out.endsWith('_Nm') ? 'N m' : 'N';
    const key = (v: number) => v.toPrecision(6);
    const speeds = [...new Map(report.band.map((b) => [key(b.airspeed_mps), b.airspeed_mps])).values()];
    const xsSet = new Set<number>();
    for (const b of report.band) if (b.output === out) xsSet.add(round9(b.yaw_deg));
    if (values)
      for (let i = 0; i < conv.count; i += stride)
        if (!Number.isNaN(values[i]!)) xsSet.add(round9(conv.yaw_deg[i]!));
    const xs = [...xsSet].sort((a, b) => a - b);
    const at = new Map(xs.map((x, i) => [x, i]));
    const series: PlotSeries[] = [];
    const bands: PlotBand[] = [];
    const su = speedUnitText(ctx.speedUnit);
    speeds.forEach((v, si) => {
      const colour = SPEED_COLOURS[si % SPEED_COLOURS.length]!;
      const speedText = `${fmt(speedFromMps(v, ctx.speedUnit), 3)} ${su}`;
      const model: Array<number | null> = xs.map(() => null);
      const hi: Array<number | null> = xs.map(() => null);
      const lo: Array<number | null> = xs.map(() => null);
      let hasBand = false;
      for (const b of report.band) {
        if (b.output !== out || key(b.airspeed_mps) !== key(v)) continue;
        const i = at.get(round9(b.yaw_deg))!;
        model[i] = b.model;
        if (b.uncertainty !== null) {
          hasBand = true;
          hi[i] = b.model + b.uncertainty;
          lo[i] = b.model - b.uncertainty;
        }
      }
      const data: Array<number | null> = xs.map(() => null);
      const speedKey = key(v);
      if (values)
        for (let i = 0; i < conv.count; i += stride) {
          const y = values[i]!;
          if (Number.isNaN(y) || key(conv.airspeed_mps[i]!) !== speedKey) continue;
          data[at.get(round9(conv.yaw_deg[i]!))!] = y;
        }
      series.push({
        label: `model ${speedText}`,
        stroke: colour,
        width: 1.8,
        spanGaps: true,
        noPoints: true,
        values: model,
      });
      if (hasBand) {
        series.push({
          label: `model ${speedText} + lattice GCI`,
          stroke: `${colour}55`,
          width: 0.8,
          spanGaps: true,
          noPoints: true,
          noLegend: true,
          values: hi,
        });
        series.push({
          label: `model ${speedText} − lattice GCI`,
          stroke: `${colour}55`,
          width: 0.8,
          spanGaps: true,
          noPoints: true,
          noLegend: true,
          values: lo,
        });
        bands.push({ upper: series.length - 2, lower: series.length - 1, fill: `${colour}22` });
      }
      series.push({ label: `data ${speedText}`, stroke: colour, pointsOnly: true, values: data });
      const unc = report.uncertainty;
      if (unc) {
        const uhi: Array<number | null> = xs.map(() => null);
        const ulo: Array<number | null> = xs.map(() => null);
        for (const r of unc.rows) {
          if (r.output !== out || key(r.airspeed_mps) !== key(v)) continue;
          const i = at.get(round9(r.yaw_deg));
          if (i === undefined) continue;
          uhi[i] = r.upper;
          ulo[i] = r.lower;
        }
        series.push({
          label: `inputs ${unc.percentiles[0]}–${unc.percentiles[1]} %, ${speedText}`,
          stroke: colour,
          width: 1,
          dash: [2, 3],
          spanGaps: true,
          noPoints: true,
          values: uhi,
        });
        series.push({
          label: `inputs ${unc.percentiles[0]}–${unc.percentiles[1]} %, ${speedText} (low)`,
          noLegend: true,
          stroke: colour,
          width: 1,
          dash: [2, 3],
          spanGaps: true,
          noPoints: true,
          values: ulo,
        });
        bands.push({ upper: series.length - 2, lower: series.length - 1, fill: `${colour}18` });
      }
    });
    const label = OUTPUT_LABEL[out];
    const sampled =
      stride > 1 ? `; every ${stride}th of ${conv.count.toLocaleString('en')} data points drawn` : '';
    const title = `${label[0]!.toUpperCase()}${label.slice(1)} vs yaw: data (dots) over the model (lines; shaded: ± lattice uncertainty${report.uncertainty ? ', dotted: input-uncertainty band' : ''}${sampled})`;
    this.plotTitles[name].textContent = title;
    this.plots[name].render({
      title,
      xLabel: `Yaw, deg — model at the data's airspeeds and air density (ρ ${fixed(conv.count > 0 ? conv.air_density_kgpm3[0]! : Number.NaN, 3)} kg/m³)`,
      xLabelShort: 'Yaw, deg',
      yLabel: `${label[0]!.toUpperCase()}${label.slice(1)}, ${unit}`,
      xs,
      series,
      bands,
    });
  }

  private renderResiduals(report: CompareReport): void {
    const speedUnit = this.ctx!.speedUnit;
    const su = speedUnitText(speedUnit);
    const res = this.packed!.residuals;
    const cell = (i: number, k: number): Cell => {
      const r = residualRowAt(res, i);
      switch (k) {
        case 0:
          return r.line;
        case 1:
          return r.yaw_deg;
        case 2:
          return speedFromMps(r.airspeed_mps, speedUnit);
        case 3:
          return `${OUTPUT_LABEL[r.output]} (${r.output.endsWith('_Nm') ? 'N m' : 'N'})`;
        case 4:
          return r.data;
        case 5:
          return r.model;
        case 6:
          return r.residual;
        case 7:
          return r.model_uncertainty;
        default:
          return r.within_band === null ? '—' : r.within_band ? 'yes' : 'no';
      }
    };
    this.residuals.setRows(
      [
        { header: 'Line', decimals: 0 },
        { header: 'Yaw, deg', decimals: 2 },
        { header: `Airspeed, ${su}`, decimals: 2 },
        { header: 'Quantity' },
        { header: 'Data, SI', decimals: 4 },
        { header: 'Model, SI', decimals: 4 },
        { header: 'Data − model, SI', decimals: 4 },
        { header: 'Model ±, SI', decimals: 4 },
        { header: 'Within band' },
      ],
      { count: res.count, cell },
    );
    this.residualSummary.setData(
      [
        { header: 'Quantity' },
        { header: 'Points', decimals: 0 },
        { header: 'Mean data − model (bias), SI', decimals: 4 },
        { header: 'RMS residual, SI', decimals: 4 },
        { header: 'RMS / RMS of the data, %', decimals: 1 },
      ],
      report.residual_summary.map((s) => [
        OUTPUT_LABEL[s.output],
        s.points,
        s.bias,
        s.rms,
        100 * s.relative_rms,
      ]),
    );
  }

  private renderFit(): void {
    const c = this.calibration;
    this.fitBlock.hidden = !c;
    this.useCalibrated.disabled = !c;
    if (!c) return;
    const rows: Cell[][] = c.parameters.map((p) => [
      p.name,
      p.meaning,
      p.initial,
      p.value,
      p.interval ? p.interval[0] : null,
      p.interval ? p.interval[1] : null,
      p.at_bound ? `at its bound (${PARAMETER_BOUNDS[p.name].join('..')})` : '',
    ]);
    this.fitTable.setCaption(
      `Fitted to ${c.fitted_to.data} (${c.fitted_to.points} points): values with ${Math.round(100 * c.confidence)} % intervals`,
    );
    this.fitTable.setData(
      [
        { header: 'Parameter' },
        { header: 'Meaning' },
        { header: 'Before', decimals: 4 },
        { header: 'Fitted', decimals: 4 },
        { header: `${Math.round(100 * c.confidence)} % interval, low`, decimals: 4 },
        { header: `${Math.round(100 * c.confidence)} % interval, high`, decimals: 4 },
        { header: 'Note' },
      ],
      rows,
    );
    const before = c.residuals_before.map((s) => `${OUTPUT_LABEL[s.output]} ${fixed(s.rms, 4)}`).join(', ');
    const after = c.residuals_after.map((s) => `${OUTPUT_LABEL[s.output]} ${fixed(s.rms, 4)}`).join(', ');
    this.fitText.textContent =
      `RMS residuals before: ${before}; after: ${after}. ${c.converged ? 'Converged' : 'Did not converge'} (${c.reason}) in ${c.iterations} iterations; ` +
      `residual SD ${fixed(c.residual_sd, 4)} N, ${c.degrees_of_freedom} degrees of freedom. ${c.lattice.note}` +
      (c.warnings.length > 0 ? ` Warnings: ${c.warnings.join(' ')}` : '');
  }

  private renderConvergence(report: CompareReport): void {
    const s = report.convergence!;
    const su = speedUnitText(this.ctx!.speedUnit);
    this.convergenceTable.setCaption(
      `Lattice convergence study: ${s.lattices.map((l) => `${l.span}×${l.chord}`).join(', ')} panels (GCI, Celik et al. 2008)`,
    );
    this.convergenceTable.setData(
      [
        { header: 'Yaw, deg', decimals: 2 },
        { header: `Airspeed, ${su}`, decimals: 2 },
        { header: 'Quantity' },
        { header: 'Fine, SI', decimals: 5 },
        { header: 'Medium, SI', decimals: 5 },
        { header: 'Coarse, SI', decimals: 5 },
        { header: 'Observed order', decimals: 2 },
        { header: 'Extrapolated, SI', decimals: 5 },
        { header: 'GCI, %', decimals: 2 },
        { header: 'GCI (±), SI', decimals: 5 },
        { header: 'Status' },
      ],
      s.rows.map((r) => [
        r.yaw_deg,
        speedFromMps(r.airspeed_mps, this.ctx!.speedUnit),
        OUTPUT_LABEL[r.output],
        r.values[0],
        r.values[1],
        r.values[2],
        r.observed_order,
        r.extrapolated,
        r.gci_relative === null ? null : 100 * r.gci_relative,
        r.gci_absolute,
        r.status,
      ]),
    );
  }

  private renderUncertainty(report: CompareReport): void {
    const u = report.uncertainty!;
    const su = speedUnitText(this.ctx!.speedUnit);
    this.uncertaintyTable.setCaption(
      `Input-uncertainty band: ${u.samples} Monte Carlo samples (seed ${u.seed}), ${u.percentiles[0]}–${u.percentiles[1]} percentiles; inputs ${u.ranges.map((r) => `${r.name} ${r.min}..${r.max}`).join(', ')}`,
    );
    this.uncertaintyTable.setData(
      [
        { header: 'Yaw, deg', decimals: 2 },
        { header: `Airspeed, ${su}`, decimals: 2 },
        { header: 'Quantity' },
        { header: 'Nominal, SI', decimals: 4 },
        { header: 'Lower, SI', decimals: 4 },
        { header: 'Median, SI', decimals: 4 },
        { header: 'Upper, SI', decimals: 4 },
        { header: 'SD, SI', decimals: 4 },
      ],
      u.rows.map((r) => [
        r.yaw_deg,
        speedFromMps(r.airspeed_mps, this.ctx!.speedUnit),
        OUTPUT_LABEL[r.output],
        r.nominal,
        r.lower,
        r.median,
        r.upper,
        r.sd,
      ]),
    );
  }
}

function round9(x: number): number {
  return Math.round(x * 1e9) / 1e9;
}
