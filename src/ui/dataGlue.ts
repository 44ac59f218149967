/**
 * The "Your data" panel's glue: reading and comparing tables as tasks on the pool's task workers (one
 * channel, latest wins, with deadlines; the parsed table stays in the worker that read it, and the
 * panel's later tasks go back to that worker by the table's affinity), the demo data, using (or dropping) the calibrated model values in the state, and keeping
 * the imported data in the state (`data`: its table, mapping and fit) both ways: the panel's changes go
 * into the state (so the autosave, a project file and a link keep them), and a state arriving with data
 * (start-up, a project file, a link, a kept design) is shown in the panel as it was.
 */
import { type CaseFile, caseAirDensity, parseCaseFile, validateCase } from '../compute/caseFile';
import type { CalibrationResult } from '../compute/compare/index';
import type { TableRef } from '../compute/engine/dataTaskTypes';
import { TaskChannel } from '../compute/engine/taskChannel';
import type { AppState, CalibrationMark } from './appState';
import { DATA_SLIP_LABELS } from './data/dataLabels';
import { pendingText, type SavedData } from './data/savedData';
import type { DataContext, DataPanel, DataPlotName, DataRunRequest } from './dataPanel';
import { fmt } from './displayUnits';
import { pool } from './earlyPool';
import type { PageHost } from './pageHost';
import type { DataOverlaySource } from './views/dataOverlay';
import { byId } from './views/present';

export class DataGlue {
  private data: DataPanel | null = null;
  private dataLoading: Promise<DataPanel> | null = null;
  /** The panel's reading and comparing (a cancel stops the worker running it). */
  private readonly tasks = new TaskChannel(pool);
  /** The last finished comparison, for the yaw plots' overlay (views/dataOverlay). */
  private compared: DataOverlaySource | null = null;
  /** The data last put into the state or shown from it (compared by dataKey). */
  private shownKey = '';
  private shownData: SavedData | null = null;

  /** `storedCsv`: the autosave's CSV of the data with a hash, or null (autosave.ts, DATA_KEY). */
  constructor(
    private readonly host: PageHost,
    private readonly storedCsv: (hash: string) => string | null = () => null,
  ) {}

  /**
   * The state's data, shown in the panel when it differs from what the panel holds; a state without
   * data keeps the panel's (opening a design or Reset does not drop imported data). Called on every
   * apply; the panel is loaded only when there is data.
   */
  showData(state: AppState): void {
    const data = state.data ?? null;
    if (data === null) {
      const kept = this.shownData;
      if (kept) queueMicrotask(() => this.host.state.data || this.putData(kept));
      return;
    }
    const key = dataKey(data);
    if (key === this.shownKey) return;
    let shown = data;
    if (data.csv === undefined) {
      // A reference only (a link, or an autosave that could not keep the rows): the autosave may have them.
      const csv = this.storedCsv(data.hash);
      if (csv !== null) {
        shown = { ...data, csv };
        queueMicrotask(() => this.putData(shown));
        this.host.messages.show(
          'info',
          `Your data “${data.name}” was restored from this browser’s autosave (the same content, by its SHA-256, as the design refers to).`,
          [],
          'data-ref',
        );
      } else this.host.messages.show('warning', `${pendingText(data)} (tab “Your data”)`, [], 'data-ref');
    } else this.host.messages.clear('data-ref');
    this.shownKey = dataKey(shown);
    this.shownData = shown;
    void this.panel().then((panel) => panel.restore(shown));
  }

  /**
   * `state` with its data's CSV text, for a project file: a table too large to hold in the page is
   * read again by a task of its own (outside the panel's channel: its running task is never displaced).
   */
  async withText(state: AppState): Promise<AppState> {
    const d = state.data;
    if (!d || d.csv !== undefined || !this.data) return state;
    const held = await this.data.dataWithText();
    return held?.hash === d.hash && held.csv !== undefined
      ? { ...state, data: { ...d, csv: held.csv } }
      : state;
  }

  private async tableText(ref: TableRef): Promise<string | null> {
    const out = await pool.runTask({ kind: 'dataText', ref }, { deadlineMs: readDeadlineMs(ref) });
    return out.status === 'done' && out.value.ok ? out.value.text : null;
  }

  /** Keep the panel's data in the state (autosave, link, project file). */
  private putData(data: SavedData, fromPanel = false): void {
    if (fromPanel) this.host.messages.clear('data-ref');
    this.shownKey = dataKey(data);
    this.shownData = data;
    this.host.apply({ ...this.host.state, data });
  }

  plotSpec(name: DataPlotName) {
    return this.data?.plotSpec(name) ?? null;
  }

  /** The last comparison's design and converted points, or null before any. */
  overlaySource(): DataOverlaySource | null {
    return this.compared;
  }

  lastReport() {
    return this.data?.lastReport() ?? null;
  }

  /** The design changed: a shown comparison no longer matches it. */
  designChanged(): void {
    this.data?.designChanged();
  }

  /** The panel, built (and its code loaded) when first opened. */
  panel(): Promise<DataPanel> {
    this.dataLoading ??= import('./dataPanel').then(({ DataPanel }) => {
      const panel: DataPanel = new DataPanel(byId('panel-data'), {
        context: () => this.dataContext(),
        read: async (ref, context) => {
          const out = await this.tasks.run(
            { kind: 'dataRead', ref, context },
            { deadlineMs: readDeadlineMs(ref), affinity: tableAffinity(ref) },
          );
          if (out.status === 'superseded' || out.status === 'cancelled') return null;
          if (out.status === 'failed') return { ok: false, errors: [out.error] };
          return out.value;
        },
        onLoadDemo: () => void this.loadDemoData(panel),
        onRun: (request) => void this.runComparison(panel, request),
        onCancel: () => {
          this.tasks.cancel();
          panel.setStatus('done', 'Cancelled; the results shown are from the last finished run.');
        },
        onUseCalibrated: (use, calibration, points) => this.useCalibrated(use, calibration, points),
        // In a task of its own: the autosave and its notice do not lengthen the panel's drawing task.
        onData: (data) => setTimeout(() => this.putData(data, true), 0),
        text: (ref) => this.tableText(ref),
      });
      this.data = panel;
      panel.setCalibratedInUse(Boolean(this.host.state.calibration));
      return panel;
    });
    return this.dataLoading;
  }

  private dataContext(): DataContext {
    const c = this.host.state.case;
    const R = c.wheel.outer_radius_m;
    return {
      referenceAreaM2: Math.PI * R * R,
      airspeedMps: c.conditions.airspeed_mps[0]!,
      rhoKgPerM3: caseAirDensity(c),
      speedUnit: this.host.state.view.speedUnit,
      designName: c.name ?? 'the current design',
    };
  }

  private async loadDemoData(panel: DataPanel): Promise<void> {
    panel.setStatus('computing', 'Loading the demo data…');
    try {
      const get = async (path: string) => {
        const res = await fetch(new URL(path, document.baseURI));
        if (!res.ok) throw new Error(`${path}: HTTP ${res.status}`);
        return res.text();
      };
      const [caseText, csvText] = await Promise.all([
        get('demo/demo-case.json'),
        get('demo/demo-tunnel.csv'),
      ]);
      const c = parseCaseFile(caseText);
      if (!c.ok) throw new Error(`demo-case.json: ${c.errors.join('; ')}`);
      this.host.apply({ ...this.host.state, case: c.value, calibration: null });
      this.host.messages.show(
        'info',
        'Demo data loaded: invented measurements of the invented wheel “Demo 50 mm half-cover”, now the design. Reset goes back to the demo wheel.',
        [],
        'demo',
      );
      panel.setDefaultRanges(caseAirDensity(c.value));
      await panel.readText(csvText, 'demo-tunnel.csv');
    } catch (error) {
      panel.setStatus('error', `The demo data could not be loaded: ${(error as Error).message}`);
    }
  }

  private async runComparison(panel: DataPanel, req: DataRunRequest): Promise<void> {
    const caseFile: CaseFile = this.host.state.case;
    panel.setDefaultRanges(caseAirDensity(caseFile));
    const heavy = req.calibrate || req.convergence || req.uncertainty !== null;
    const out = await this.tasks.run(
      {
        kind: 'dataCompare',
        request: {
          caseFile,
          ref: req.ref,
          map: req.map,
          dataLabel: req.label,
          slipLabels: DATA_SLIP_LABELS,
          calibrate: req.calibrate ? {} : false,
          convergence: req.convergence ? {} : false,
          uncertainty: req.uncertainty ? { ranges: req.uncertainty } : false,
        },
      },
      { deadlineMs: compareDeadlineMs(req.rowCount, heavy), affinity: tableAffinity(req.ref) },
    );
    if (out.status === 'superseded' || out.status === 'cancelled') return;
    if (out.status === 'failed') {
      panel.showErrors('The comparison could not be made:', [out.error]);
      return;
    }
    if (!out.value.ok) {
      panel.showErrors('The data could not be compared with the model:', out.value.errors);
      return;
    }
    this.compared = { caseFile, converted: out.value.value.converted, label: req.label };
    await panel.showReport(out.value.value, req);
    this.host.renderAll();
  }

  private useCalibrated(use: boolean, calibration: CalibrationResult | null, points: number): void {
    const s = this.host.state;
    if (use && calibration) {
      const original = s.calibration?.original ?? {};
      const values: CalibrationMark['values'] = {};
      const before: CalibrationMark['original'] = { ...original };
      for (const p of calibration.parameters) {
        values[p.name] = p.value;
        if (before[p.name] === undefined) before[p.name] = s.case.model[p.name];
      }
      const r = validateCase({ ...s.case, model: { ...s.case.model, ...values } });
      if (!r.ok) {
        this.host.messages.show('error', 'The calibrated values could not be used:', r.errors, 'calibration');
        this.data?.setCalibratedInUse(false);
        return;
      }
      this.host.apply({
        ...s,
        case: r.value,
        calibration: { data: calibration.fitted_to.data, points, values, original: before },
      });
    } else if (s.calibration) {
      const r = validateCase({ ...s.case, model: { ...s.case.model, ...s.calibration.original } });
      if (r.ok) this.host.apply({ ...s, case: r.value, calibration: null });
    }
  }

  showCalibrationBadge(mark: CalibrationMark | null): void {
    const badge = byId('calibrated-badge');
    badge.hidden = mark === null;
    badge.textContent = mark
      ? `CALIBRATED model: fitted to ${mark.data} (${mark.points} points): ${Object.entries(mark.values)
          .map(([k, v]) => `${k} ${fmt(v, 4)}`)
          .join(', ')}`
      : '';
    this.data?.setCalibratedInUse(mark !== null);
  }
}

/** The task workers' affinity of a table's tasks: the worker that read it keeps it parsed. */
function tableAffinity(ref: TableRef): string {
  return `data-table:${ref.id}`;
}

/**
 * Deadlines of the data panel's tasks (a worker silent for longer is taken as hung, replaced and the
 * task retried once on a fresh worker, which reads the table again from its source): generous on
 * purpose, scaled by the task's size. Reading: 60 s plus 10 s per MB (reading runs at tens of MB/s). Comparing: 60 s plus 2 ms per data row, 50 times that for a fit,
 * a convergence study or an uncertainty band (each evaluates the model many times per row).
 */
function readDeadlineMs(ref: TableRef): number {
  const bytes = ref.source.kind === 'file' ? ref.source.file.size : ref.source.text.length;
  return 60_000 + (10_000 * bytes) / 1_048_576;
}

function compareDeadlineMs(rows: number, heavy: boolean): number {
  return 60_000 + 2 * rows * (heavy ? 50 : 1);
}

/** What identifies the data's state: its content, whether its rows are held, its mapping and its fit. */
function dataKey(d: SavedData): string {
  return JSON.stringify([d.hash, d.name, d.csv !== undefined, d.map ?? null, d.fit ?? null]);
}
