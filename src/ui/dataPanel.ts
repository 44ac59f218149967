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
import type {
  CalibrationResult,
  CompareReport,
  GuessContext,
  MapFile,
  UncertainRange,
} from '../compute/compare/index';
import { validateMap } from '../compute/compare/index';
import type {
  PackedComparison,
  ReadOutcome,
  TableRef,
  TableSource,
  TableSummary,
} from '../compute/engine/dataTaskTypes';
import { unpackComparison } from '../compute/engine/packComparison';
import { buildDataPanelDom } from './data/buildDataPanelDom';
import type {
  DataContext,
  DataPanelDom,
  DataPanelState,
  DataPlotName,
  DataRunRequest,
} from './data/dataPanelTypes';
import { fillMappingForm, type MapRow, mapFromForm } from './data/mappingForm';
import { overlayOutput, renderDataPlot } from './data/renderDataPlot';
import { renderConvergence, renderFit, renderResiduals, renderUncertainty } from './data/renderDataTables';
import { errorBlock, renderSummary, runText } from './data/renderFlags';
import {
  FIT_RESTORED_NOTE,
  fitResult,
  notReferencedText,
  pendingText,
  type SavedData,
  savedFit,
} from './data/savedData';
import { readUncertaintyRanges, setDefaultRanges } from './data/uncertaintyRanges';
import type { PlotSpec } from './linePlot';

export type { DataContext, DataPanelState, DataPlotName, DataRunRequest } from './data/dataPanelTypes';
export { MAX_PLOTTED_POINTS } from './data/renderDataPlot';

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
  private readonly dom: DataPanelDom;

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
      /** The data, its applied mapping or its fit changed (to keep in the page's state). */
      onData(data: SavedData): void;
      /** A table's text, read in the background (null when it cannot be read). */
      text(ref: TableRef): Promise<string | null>;
    },
  ) {
    this.dom = buildDataPanelDom(host, {
      readFile: (file) => void this.readFile(file),
      readText: (text, label) => void this.readText(text, label),
      loadDemo: () => this.handlers.onLoadDemo(),
      apply: () => this.apply(),
      cancel: () => this.handlers.onCancel(),
      run: (extra) => this.run(extra),
      runUncertainty: () => this.runUncertainty(),
      useCalibratedChanged: (checked) =>
        this.handlers.onUseCalibrated(checked, this.calibration, this.calibration?.fitted_to.points ?? 0),
    });
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

  /**
   * Show kept data as it was (from a project file, the autosave or a link): its table, the mapping that
   * was applied and the comparison recomputed with the current design; the fit as it was saved, not
   * made again. Data named only by its reference (a link) waits for the same file to be imported again.
   */
  restore(data: SavedData): void {
    if (data.csv === undefined) {
      this.pending = data;
      this.host.dataset.pending = data.hash;
      this.setStatus('empty', pendingText(data));
      return;
    }
    void this.readSource({ kind: 'text', text: data.csv }, data.name, data);
  }

  /** Read a table in the background worker (the page stays responsive however large it is). */
  private async readSource(source: TableSource, label: string, restore?: SavedData): Promise<void> {
    this.setStatus('computing', `Reading ${label}…`);
    const ctx = this.handlers.context();
    this.ctx = ctx;
    const ref: TableRef = { id: this.nextTableId++, source, label };
    this.restoreFor = restore ? { id: ref.id, data: restore } : null;
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
      this.dom.readErrors.replaceChildren(
        ...errorBlock(`${label} could not be read; nothing changed.`, result.errors),
      );
      this.setStatus(this.table ? 'mapping' : 'empty', '');
      return;
    }
    this.dom.readErrors.replaceChildren();
    const sum = result.summary;
    const pending = this.pending;
    const restore =
      this.restoreFor?.id === ref.id ? this.restoreFor.data : pending?.hash === sum.hash ? pending : null;
    this.pending = null;
    delete this.host.dataset.pending;
    this.data = { name: label, hash: sum.hash, rows: sum.rowCount, chars: sum.chars };
    if (sum.text !== null) this.data.csv = sum.text;
    this.table = result.summary;
    this.ref = ref;
    this.label = label;
    this.report = null;
    this.packed = null;
    this.calibration = null;
    this.convergence = null;
    this.uncertainty = null;
    this.applied = null;
    this.dom.results.hidden = true;
    this.fitRestored = false;
    if (restore) {
      this.restoreMapping(restore, ref);
      return;
    }
    this.handlers.onData(this.data);
    this.fillMapping();
    this.setStatus(
      'mapping',
      `Read ${label}: ${result.summary.rowCount} rows, ${result.summary.headers.length} columns. Check what each column holds, then “Apply and compare”.` +
        (pending ? notReferencedText(pending) : ''),
    );
  }

  /** The kept mapping and fit of data just read again; the comparison is recomputed (not stored). */
  private restoreMapping(kept: SavedData, ref: TableRef): void {
    const data = this.data!;
    // Data named by a reference and now imported again: its rows go back into the page's state.
    if (kept.csv === undefined) this.handlers.onData({ ...kept, ...data });
    this.data = { ...data, ...(kept.map ? { map: kept.map } : {}), ...(kept.fit ? { fit: kept.fit } : {}) };
    this.fillMapping(kept.map);
    if (!kept.map) {
      this.setStatus(
        'mapping',
        `Restored ${data.name} (${data.rows} rows): check what each column holds, then “Apply and compare”.`,
      );
      return;
    }
    this.applied = { ref, rowCount: data.rows, map: kept.map, label: data.name };
    this.calibration = kept.fit ? fitResult(kept.fit) : null;
    this.fitRestored = Boolean(kept.fit);
    this.run({});
  }

  private fillMapping(given?: MapFile): void {
    const ctx = this.handlers.context();
    this.ctx = ctx;
    this.mapRows = fillMappingForm(this.dom, this.table!, ctx, given);
  }

  private mapRows: MapRow[] = [];
  /** The data as kept in the page's state (table text, hash, applied mapping, fit). */
  private data: SavedData | null = null;
  /** A table being read to restore kept data (its read's id), and a reference waiting for its file. */
  private restoreFor: { id: number; data: SavedData } | null = null;
  private pending: SavedData | null = null;
  /** The fit shown was restored as saved (not made in this page). */
  private fitRestored = false;

  private apply(): void {
    if (!this.table || !this.ref) return;
    const { map, errors } = mapFromForm(this.dom, this.mapRows, this.ctx?.speedUnit ?? 'kmh');
    const v = validateMap(map);
    const all = [...errors, ...(v.ok ? [] : v.errors)];
    if (all.length > 0 || !v.ok) {
      this.dom.mapErrors.replaceChildren(...errorBlock('Not applied:', all));
      return;
    }
    this.dom.mapErrors.replaceChildren();
    this.applied = { ref: this.ref, rowCount: this.table.rowCount, map: v.value, label: this.label };
    if (this.data) {
      const { fit: _old, ...data } = this.data;
      this.data = { ...data, map: v.value };
      this.handlers.onData(this.data);
    }
    this.fitRestored = false;
    this.calibration = null;
    this.convergence = null;
    this.uncertainty = null;
    this.run({});
  }

  private run(extra: { calibrate?: boolean; convergence?: boolean; uncertainty?: UncertainRange[] }): void {
    if (!this.applied) return;
    this.setStatus('computing', runText(extra, 'running'));
    this.handlers.onRun({
      ...this.applied,
      calibrate: extra.calibrate ?? false,
      convergence: extra.convergence ?? false,
      uncertainty: extra.uncertainty ?? null,
    });
  }

  private runUncertainty(): void {
    const { ranges, errors } = readUncertaintyRanges(this.dom);
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
    this.dom.status.textContent = text;
    this.dom.cancelButton.hidden = state !== 'computing';
    for (const b of this.dom.actionButtons) b.disabled = state === 'computing';
  }

  /** The data shown, with its CSV text (fetched from the worker when too large to hold here), or null. */
  async dataWithText(): Promise<SavedData | null> {
    const data = this.data;
    if (!data || data.csv !== undefined || !this.ref) return data;
    const csv = await this.handlers.text(this.ref);
    return csv === null ? data : { ...data, csv };
  }

  setCalibratedInUse(on: boolean): void {
    this.dom.useCalibrated.checked = on;
  }

  plotSpec(name: DataPlotName): PlotSpec | null {
    return this.dom.plots[name].currentSpec();
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
    setDefaultRanges(this.dom, rhoKgPerM3);
  }

  // -------------------------------------------------------------------------------------------
  // Results

  showErrors(title: string, errors: readonly string[]): void {
    this.setStatus('error', title);
    this.dom.mapErrors.replaceChildren(...errorBlock(title, errors.slice(0, 20)));
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
    this.dom.results.hidden = false;
    const n = packed.converted.count;
    renderSummary(this.dom, report, n, ctx.designName);
    if (request.calibrate && report.calibration) {
      this.calibration = report.calibration;
      this.fitRestored = false;
      if (this.data) {
        this.data = { ...this.data, map: request.map, fit: savedFit(report.calibration) };
        this.handlers.onData(this.data);
      }
    }
    // The small tables at once...
    renderFit(this.dom, this.calibration);
    if (this.fitRestored) this.dom.fitText.append(FIT_RESTORED_NOTE);
    this.dom.convergenceBlock.hidden = !report.convergence;
    if (report.convergence) renderConvergence(this.dom, report, ctx.speedUnit);
    this.dom.uncertaintyBlock.hidden = !report.uncertainty;
    if (report.uncertainty) renderUncertainty(this.dom, report, ctx.speedUnit);
    // ...then the plots and the residuals, each after the next frame (or after 100 ms in a hidden tab,
    // which has no frames), so the browser lays out and paints each on its own.
    const steps = [
      () => this.renderOverlay(report, 'dataForce'),
      () => this.renderOverlay(report, 'dataSide'),
      () => renderResiduals(this.dom, report, this.packed!.residuals, this.ctx!.speedUnit),
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
    this.setStatus('done', runText(request, 'done'));
  }

  private renderOverlay(report: CompareReport, which: DataPlotName): void {
    renderDataPlot(
      this.dom.plots[which],
      this.dom.plotTitles[which],
      overlayOutput(report, which),
      report,
      this.packed!.converted,
      this.ctx!.speedUnit,
    );
  }
}
