/**
 * The page: state (a validated case file + view settings + optional baseline + road inputs), the
 * controls, the compute plan run on the worker pool (cancellable, streamed stage by stage: the current
 * design first without its grid-convergence lattices, so its numbers show at once), the views of the
 * results (headline figures, plots, design map, 3D view, tables), the "On the road" and "Your data"
 * panels (their jobs on their own workers), with link, autosave and files.
 */
import {
  type CaseFile,
  type CaseWheel,
  COMPONENT_NAMES,
  caseAirDensity,
  caseToModelInput,
  parseCaseFile,
  validateCase,
} from '../compute/caseFile';
import type { CalibrationResult } from '../compute/compare/index';
import type { ViewField } from '../compute/engine/protocol';
import { runSweep, type SweepProgress } from '../compute/engine/runSweep';
import type { WorkerPool } from '../compute/engine/workerPool';
import { degToRad, kmhToMps } from '../compute/units';
import type { WheelInput } from '../model/wheel/solveWheel';
import type { PointResult, WheelSolution } from '../model/wheel/types';
import { FLAG_MESSAGES } from '../model/wheel/validity';
import {
  type AppState,
  type CalibrationMark,
  hashToState,
  MAX_LINK_CHARS,
  MAX_PROJECT_BYTES,
  nameErrors,
  projectTextToState,
  stateToHashOrNull,
  stateToProjectText,
} from './appState';
import { AutosaveStore, type KeptCopy } from './autosave';
import type { BrowserWorkerHandle } from './browserWorker';
import { type ComputePlan, computePlan } from './computePlan';
import { Controls } from './controls';
import type { PackedResult, ReadOutcome } from './dataJobs';
import type { DataContext, DataPanel, DataPlotName, DataRunRequest } from './dataPanel';
import { type Cell, DataTable, type TableColumn } from './dataTable';
import { defaultCase } from './defaultCase';
import { DesignMap } from './designMap';
import {
  type DisplayUnits,
  fixed,
  fmt,
  speedFromMps,
  speedUnitText,
  toDisplay,
  unitShort,
  unitText,
} from './displayUnits';
import { downloadBlob, downloadText, safeFileStem } from './download';
import { type DurableCopy, writeDurable } from './durableAutosave';
import { crashPoolWorker, hangPoolWorkers, scriptStartMs, spawnTracked, workersReadyMs } from './earlyPool';
import type { Field, FieldValue } from './fields';
import { JobWorker } from './jobWorker';
import { LinePlot, type PlotSeries } from './linePlot';
import { Messages } from './messages';
import { OUTPUTS, type OutputKey, type OutputSpec } from './outputs';
import type { RoadContext, RoadPanel, RoadPlotName } from './roadPanel';
import { defaultRoad, type RoadState, roadToRideRaw, validateRoadFor } from './roadState';
import { view3dLoader, type WheelView } from './view3dSlot';
import {
  type DifferenceMode,
  defaultView,
  TAB_IDS,
  type TabId,
  type ViewState,
  validateView,
} from './viewState';
import { type HangReport, onWorkerHang } from './watchdog';

interface Results {
  plan: ComputePlan;
  current: WheelSolution | null;
  family: Array<WheelSolution | null>;
  cover: Array<WheelSolution | null>;
  map: Array<WheelSolution | null>;
  baseline: { curve: WheelSolution | null; cover: WheelSolution | null; map: WheelSolution | null } | null;
  rhoKgPerM3: number;
}

type Phase = 'computing' | 'done' | 'error';
type MainPlotName = 'dragYaw' | 'sideYaw' | 'dragCover' | 'handling';
export type PlotName = MainPlotName | RoadPlotName | DataPlotName;

const CURRENT_COLOUR = '#c2412d';
const BASELINE_COLOUR = '#111111';

/** Family colours from light to dark blue-green by covering fraction (our own ramp). */
function familyColour(k: number, n: number): string {
  const t = n <= 1 ? 1 : k / (n - 1);
  const a = [132, 188, 196];
  const b = [16, 58, 88];
  const c = a.map((x, i) => Math.round(x + (b[i]! - x) * t));
  return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
}

const SPEED_YAW_COLOURS = ['#1c6876', '#c2412d', '#6b4fa0', '#b8860b', '#2e7d32', '#5d4037'];

function nearestIndex(values: readonly number[], target: number): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) {
    if (Math.abs(values[i]! - target) < Math.abs(values[best]! - target)) best = i;
  }
  return best;
}

function computeKey(s: AppState): string {
  const v = s.view;
  return JSON.stringify([
    s.case,
    s.baseline,
    v.familyFractions,
    v.coverPlotYawsDeg,
    v.coverPlotSpeedsMps,
    v.mapYawDeg,
    v.mapMaxRimDepthM,
  ]);
}

export class App {
  private state: AppState;
  private readonly pool: WorkerPool;
  private controls!: Controls;
  private readonly messages: Messages;
  private results: Results | null = null;
  private abort: AbortController | null = null;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private lastComputeKey = '';
  private firstResultMs: number | null = null;
  private readonly plots: Record<MainPlotName, LinePlot>;
  private readonly designMap: DesignMap;
  private readonly tables = new Map<string, DataTable>();
  private view3d: WheelView | null = null;
  private view3dWorker: BrowserWorkerHandle | null = null;
  private view3dRequest = 0;
  private view3dStarted = false;
  private poolIdle: Promise<void> = Promise.resolve();
  /** The two panels are built (and their code loaded) when first opened. */
  private road: RoadPanel | null = null;
  private data: DataPanel | null = null;
  private roadLoading: Promise<RoadPanel> | null = null;
  private dataLoading: Promise<DataPanel> | null = null;
  private readonly rideWorker = new JobWorker();
  private readonly dataWorker = new JobWorker();
  private rideTimer: ReturnType<typeof setTimeout> | null = null;
  private lastRideKey = '';
  private lastCaseKey = '';
  private roadShown: { road: string; unit: string } = { road: '', unit: '' };

  private readonly autosave: AutosaveStore;
  /** Set aside at start-up (an unreadable autosave, or the autosave replaced by a link's design). */
  private startupKept: { copy: KeptCopy | string; what: 'unreadable' | 'link'; errors: string[] } | null =
    null;

  /** `durable`: the autosave's durable copy, read before the page starts (main.ts). */
  constructor(pool: WorkerPool, durable: DurableCopy | null = null) {
    this.autosave = new AutosaveStore(localStorage, durable, writeDurable);
    this.messages = new Messages(byId('messages'));
    this.state = this.initialState();
    this.pool = pool;
    this.plots = {
      dragYaw: new LinePlot(plotDiv('fig-drag-yaw')),
      sideYaw: new LinePlot(plotDiv('fig-side-yaw')),
      dragCover: new LinePlot(plotDiv('fig-drag-cover')),
      handling: new LinePlot(plotDiv('fig-handling')),
    };
    this.designMap = new DesignMap(byId('fig-map').querySelector<HTMLElement>('.map')!);
    onWorkerHang((r) => this.workerHung(r));
  }

  /** The watchdog stopped a hung solver worker: say so (the pool replaces it and retries the job once). */
  private workerHung(r: HangReport): void {
    const hangs = Number(document.body.dataset.workerHangs ?? '0') + 1;
    document.body.dataset.workerHangs = String(hangs);
    const what = `a job of ${r.cases} design${r.cases === 1 ? '' : 's'}`;
    this.messages.show(
      'warning',
      `A solver worker stopped answering (no answer in ${Math.round(r.deadlineMs / 1000)} s for ${what}). It was stopped and replaced; its job is retried once on a fresh worker, and reported here if it fails again.`,
      [],
      'hang',
    );
    byId('status-text').textContent =
      'A solver worker stopped answering: retrying its job on a fresh worker…';
  }

  private plotSpec(name: PlotName) {
    if (name === 'roadYaw' || name === 'roadSteering' || name === 'roadSegments')
      return this.road?.plotSpec(name) ?? null;
    if (name === 'dataForce' || name === 'dataSide') return this.data?.plotSpec(name) ?? null;
    return this.plots[name].currentSpec();
  }

  private roadPanel(): Promise<RoadPanel> {
    this.roadLoading ??= import('./roadPanel').then(({ RoadPanel }) => {
      const panel = new RoadPanel(byId('panel-road'), {
        onChange: (road) => this.onRoadChange(road),
        onPin: () => this.pinBaseline(),
        onSaveRide: () => this.saveRideFile(),
      });
      this.road = panel;
      this.roadShown = { road: '', unit: '' };
      this.showRoadInputs(this.state);
      return panel;
    });
    return this.roadLoading;
  }

  private validationLoading: Promise<{ shown(): void }> | null = null;

  /** The Help tab's reference table, loaded and computed only when Help is opened. */
  private validationPanel(): Promise<{ shown(): void }> {
    this.validationLoading ??= import('./validationPanel').then(
      ({ ValidationPanel }) => new ValidationPanel(byId('validation')),
    );
    return this.validationLoading;
  }

  private dataPanel(): Promise<DataPanel> {
    this.dataLoading ??= import('./dataPanel').then(({ DataPanel }) => {
      const panel: DataPanel = new DataPanel(byId('panel-data'), {
        context: () => this.dataContext(),
        read: async (ref, context) => {
          const out = await this.dataWorker.run<ReadOutcome>(
            (api) => api.readTable(ref, context),
            readDeadlineMs(ref.source.kind === 'file' ? ref.source.file.size : ref.source.text.length),
          );
          if (out.status === 'superseded' || out.status === 'cancelled') return null;
          if (out.status === 'failed') return { ok: false, errors: [out.error] };
          return out.value;
        },
        onLoadDemo: () => void this.loadDemoData(panel),
        onRun: (request) => void this.runComparison(panel, request),
        onCancel: () => {
          this.dataWorker.cancel();
          panel.setStatus('done', 'Cancelled; the results shown are from the last finished run.');
        },
        onUseCalibrated: (use, calibration, points) => this.useCalibrated(use, calibration, points),
      });
      this.data = panel;
      panel.setCalibratedInUse(Boolean(this.state.calibration));
      return panel;
    });
    return this.dataLoading;
  }

  /**
   * Start the first computation, then build the page: the first solve's message is posted to a worker
   * (which has been loading since the script started) before the controls and tables are built, and
   * its answer cannot arrive before they are.
   */
  async start(): Promise<void> {
    this.lastComputeKey = computeKey(this.state);
    this.setPhase('computing');
    void this.compute();
    await new Promise((resolve) => setTimeout(resolve, 0));
    this.controls = new Controls(byId('controls'), this.state, (field, value) => this.onEdit(field, value));
    this.buildTables();
    this.wireFigureActions();
    this.wireActions();
    this.wireTabs();
    this.apply(this.state, { replaceUrl: true });
    window.addEventListener('hashchange', () => this.onHashChange());
    window.addEventListener('storage', (event) => {
      if (this.autosave.isOtherTabSave(event)) this.otherTabSaved();
      this.refreshKeptButton();
    });
    this.reportStartupKept();
    // Inspection for the browser tests and the curious: what each plot shows, the state, the last ride
    // and comparison. The browser tests' build (vite build --mode e2e) adds hooks that crash or hang a
    // sweep worker as a real fault would; the production build leaves them out.
    const inspect: Record<string, unknown> = {
      plot: (name: PlotName) => this.plotSpec(name),
      state: () => structuredClone(this.state),
      ride: () => structuredClone(this.road?.lastResult()?.document ?? null),
      comparison: () => structuredClone(this.data?.lastReport() ?? null),
    };
    if (import.meta.env.MODE === 'e2e') {
      inspect.crashWorker = () => crashPoolWorker();
      inspect.hangWorkers = (deadlineMs: number) => hangPoolWorkers(deadlineMs);
    }
    (window as unknown as { coversweep: unknown }).coversweep = inspect;
  }

  // -------------------------------------------------------------------------------------------
  // State

  private initialState(): AppState {
    const fromHash = hashToState(location.hash);
    const saved = this.autosave.load();
    if (saved.kind === 'unreadable') {
      // Never replaced unseen: keep it, byte for byte, before anything else is saved.
      const copy = this.autosave.keepAside(
        saved.text,
        `the autosave could not be read: ${saved.errors[0] ?? 'unknown fault'}`,
      );
      this.startupKept = { copy, what: 'unreadable', errors: saved.errors };
    }
    const fallback = saved.kind === 'ok' ? saved.state : null;
    if (fromHash?.ok) {
      if (saved.kind === 'ok' && saved.text !== stateToProjectText(fromHash.value)) {
        const copy = this.autosave.keepAside(
          saved.text,
          'your autosaved design, set aside when a link was opened',
        );
        this.startupKept = { copy, what: 'link', errors: [] };
      }
      return fromHash.value;
    }
    if (fromHash && !fromHash.ok) {
      this.messages.show(
        'error',
        `The link's design could not be opened; showing ${fallback ? 'your autosaved design' : 'the demo wheel'} instead.`,
        fromHash.errors,
        'link',
      );
    }
    return fallback ?? { case: defaultCase(), view: defaultView(), baseline: null };
  }

  /** Say what was set aside at start-up, with buttons to restore or download it. */
  private reportStartupKept(): void {
    const k = this.startupKept;
    if (!k) return;
    if (typeof k.copy === 'string') {
      this.messages.show(
        'error',
        'The autosaved design could not be read, and no copy could be kept; this tab does not autosave until you reload.',
        [k.copy, ...k.errors],
        'autosave',
      );
      return;
    }
    const copy = k.copy;
    if (k.what === 'unreadable') {
      this.messages.show(
        'warning',
        'The autosaved design could not be read; starting from the demo wheel. The unreadable autosave was kept aside unchanged: download it to repair or report it.',
        k.errors,
        'autosave',
        [this.downloadKeptAction(copy)],
      );
    } else {
      this.messages.show(
        'info',
        'Opened the design from the link. Your own autosaved design was kept aside, not overwritten.',
        [],
        'autosave',
        [this.restoreKeptAction(copy), this.downloadKeptAction(copy)],
      );
    }
  }

  private downloadKeptAction(copy: KeptCopy) {
    return {
      label: 'Download it',
      name: 'download-kept',
      onClick: () =>
        downloadText(
          `coversweep-kept-${copy.keptAt.replace(/[:.]/g, '-')}.json`,
          copy.text,
          'application/json',
        ),
    };
  }

  private restoreKeptAction(copy: KeptCopy) {
    return {
      label: 'Restore it',
      name: 'restore-kept',
      onClick: () => {
        const r = projectTextToState(copy.text, 'kept design');
        if (!r.ok) {
          this.messages.show('error', 'The kept design could not be read.', r.errors, 'autosave');
          return;
        }
        // The design shown now is kept aside in its turn, so restoring loses nothing.
        this.autosave.keepAside(
          stateToProjectText(this.state),
          'the design shown before a kept one was restored',
        );
        this.messages.clear('autosave');
        this.apply(r.value);
        this.messages.show(
          'info',
          'Restored the kept design; the one shown before it was kept aside.',
          [],
          'autosave',
        );
      },
    };
  }

  /** Show or hide the "Kept designs" button (shown while copies are kept). */
  private refreshKeptButton(): void {
    const n = this.autosave.kept().length;
    const b = byId('kept-designs');
    b.hidden = n === 0;
    b.textContent = `Kept designs (${n})`;
  }

  /** One notice per kept copy, newest first, each with Restore and Download. */
  private showKept(): void {
    const kept = this.autosave.kept();
    kept.forEach((copy, i) => {
      this.messages.show(
        'info',
        `Kept ${copy.keptAt.replace('T', ' ').slice(0, 19)} UTC: ${copy.reason}.`,
        [],
        `kept-${i}`,
        [this.restoreKeptAction(copy), this.downloadKeptAction(copy)],
      );
    });
  }

  /** Another tab saved its design to the shared autosave. */
  private otherTabSaved(): void {
    this.messages.show(
      'info',
      'Another tab saved a different design to this browser’s autosave. This tab keeps showing its own; if you change it here, the other tab’s design is kept aside first (not lost), and you can restore it from the notice.',
      [],
      'tabs',
    );
  }

  private onHashChange(): void {
    if (location.hash === (stateToHashOrNull(this.state) ?? '')) return;
    const parsed = hashToState(location.hash);
    if (parsed === null) return;
    if (!parsed.ok) {
      this.messages.show(
        'error',
        "The link's design could not be opened; the current design is unchanged.",
        parsed.errors,
        'link',
      );
      this.showHash(this.state, true);
      return;
    }
    this.messages.clear('link');
    const before = stateToProjectText(this.state);
    const keptCopy =
      before !== stateToProjectText(parsed.value)
        ? this.autosave.keepAside(before, 'the design shown when a link was opened in its tab')
        : null;
    this.apply(parsed.value, { replaceUrl: false });
    if (keptCopy !== null) {
      this.startupKept = { copy: keptCopy, what: 'link', errors: [] };
      this.reportStartupKept();
    }
  }

  /** Make `next` the state: autosave, URL, controls, then recompute or redraw. */
  private apply(next: AppState, opts: { replaceUrl: boolean } = { replaceUrl: true }): void {
    this.state = next;
    const saved = this.autosave.save(next);
    this.refreshKeptButton();
    if (saved.error) this.messages.show('warning', 'Autosave failed', [saved.error], 'autosave');
    if (saved.kept) {
      this.messages.show(
        'warning',
        'Another tab had autosaved a different design since this tab last saved: it was kept aside before this tab’s change was saved.',
        [],
        'tabs',
        [this.restoreKeptAction(saved.kept), this.downloadKeptAction(saved.kept)],
      );
    }
    this.showHash(next, opts.replaceUrl);
    this.controls.refresh(next);
    byId('clear-baseline').hidden = next.baseline === null;
    this.showTab(next.view.tab, false);
    if (this.view3d && Object.keys(next.view.layers3d).length > 0) {
      if (
        JSON.stringify(this.view3d.layers()) !==
        JSON.stringify({ ...this.view3d.layers(), ...next.view.layers3d })
      ) {
        this.view3d.setLayers(next.view.layers3d);
      }
    }
    this.showRoadInputs(next);
    this.showCalibrationBadge(next.calibration ?? null);
    const caseKey = JSON.stringify(next.case);
    if (caseKey !== this.lastCaseKey) {
      if (this.lastCaseKey !== '') this.data?.designChanged();
      this.lastCaseKey = caseKey;
    }
    const key = computeKey(next);
    if (key !== this.lastComputeKey) this.scheduleCompute(150);
    else this.renderAll();
    if (next.view.tab === 'road') this.scheduleRide(200);
  }

  /** Put the state in the address bar, or clear it there (and say so) when too long for a link. */
  private showHash(state: AppState, always: boolean): void {
    const hash = stateToHashOrNull(state);
    if (hash === null) {
      history.replaceState(null, '', `${location.pathname}${location.search}`);
      this.messages.show(
        'warning',
        `This design is too large for a link (more than ${MAX_LINK_CHARS / 1024} kB), so the address no longer holds it; it is still autosaved here. Save a project file to share it.`,
        [],
        'link-size',
      );
      return;
    }
    this.messages.clear('link-size');
    if (always || location.hash !== hash) history.replaceState(null, '', hash);
  }

  private onEdit(field: Field, value: FieldValue): readonly string[] | null {
    const ctx = { case: this.state.case, view: this.state.view };
    const raw = structuredClone(
      field.target === 'case' ? this.state.case : this.state.view,
    ) as unknown as Record<string, unknown>;
    try {
      field.set(raw, value, ctx);
    } catch (error) {
      this.messages.show('error', `Not applied: ${field.label(ctx)}`, [(error as Error).message], 'edit');
      return [(error as Error).message];
    }
    if (field.target === 'case') {
      const r = validateCase(raw);
      const long = r.ok ? nameErrors({ case: r.value }, 'design') : [];
      if (long.length > 0) {
        this.messages.show('error', `Not applied: ${field.label(ctx)}`, long, 'edit');
        return long;
      }
      if (!r.ok) {
        this.messages.show(
          'error',
          `Not applied: ${field.label(ctx)} — the design is unchanged.`,
          r.errors,
          'edit',
        );
        return r.errors;
      }
      this.messages.clear('edit');
      this.apply({ ...this.state, case: r.value });
    } else {
      const r = validateView(raw);
      if (!r.ok) {
        this.messages.show(
          'error',
          `Not applied: ${field.label(ctx)} — the view is unchanged.`,
          r.errors,
          'edit',
        );
        return r.errors;
      }
      this.messages.clear('edit');
      this.apply({ ...this.state, view: r.value });
    }
    return null;
  }

  private setView(patch: Partial<ViewState>): void {
    const r = validateView({ ...this.state.view, ...patch });
    if (r.ok) this.apply({ ...this.state, view: r.value });
  }

  // -------------------------------------------------------------------------------------------
  // Compute

  private setPhase(phase: Phase): void {
    document.body.dataset.state = phase;
  }

  private scheduleCompute(delayMs: number): void {
    if (this.timer) clearTimeout(this.timer);
    this.lastComputeKey = computeKey(this.state);
    this.setPhase('computing');
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.compute();
    }, delayMs);
  }

  private status(text: string, progress: SweepProgress | null = null): void {
    byId('status-text').textContent = text;
    const bar = byId<HTMLProgressElement>('progress');
    const cancel = byId('cancel');
    if (progress) {
      bar.hidden = false;
      bar.max = Math.max(1, progress.pointsTotal);
      bar.value = progress.pointsDone;
      cancel.hidden = false;
    } else {
      bar.hidden = true;
    }
  }

  /**
   * runSweep on the pool, one run at a time: WorkerPool.run is not re-entrant (a cancelled run
   * terminates its busy workers, which a second run may already be waiting on), so each run waits
   * for the previous one, which ends promptly once its signal is aborted.
   */
  private sweep(cases: readonly WheelInput[], options: Parameters<typeof runSweep>[2]) {
    const previous = this.poolIdle;
    const run = previous.then(() => runSweep(this.pool, cases, options));
    this.poolIdle = run.then(
      () => undefined,
      () => undefined,
    );
    return run;
  }

  private async compute(): Promise<void> {
    try {
      await this.computeStages();
    } catch (error) {
      this.fail(`Internal error while computing: ${(error as Error).message}`);
    }
  }

  private async computeStages(): Promise<void> {
    this.abort?.abort();
    const ac = new AbortController();
    this.abort = ac;
    const state = this.state;
    let plan: ComputePlan;
    try {
      plan = computePlan(state.case, state.view, state.baseline);
    } catch (error) {
      this.fail(`The design could not be prepared for the model: ${(error as Error).message}`);
      return;
    }
    const r: Results = {
      plan,
      current: null,
      family: plan.family.inputs.map(() => null),
      cover: plan.cover.inputs.map(() => null),
      map: plan.map.inputs.map(() => null),
      baseline: plan.baseline ? { curve: null, cover: null, map: null } : null,
      rhoKgPerM3: caseAirDensity(state.case),
    };
    const superseded = () => this.abort !== ac;
    byId('cancel').hidden = false;
    this.status('Solving the current design…');
    this.stage('current');
    const started = performance.now();

    // 1. The current design, exactly as its case file says, but first without the grid-convergence
    //    lattices (the same values, about half the cost): its numbers show at once; the uncertainty
    //    estimate follows with the next stage.
    const gci = plan.current.options.gridConvergence;
    const quick = gci
      ? { ...plan.current, options: { ...plan.current.options, gridConvergence: false } }
      : plan.current;
    const s1 = await this.sweep([quick], { signal: ac.signal });
    if (superseded()) return;
    if (s1.cancelled) return this.cancelled(r);
    const currentSolution = s1.solutions[0] ?? null;
    if (!currentSolution) {
      this.fail(`The model could not solve this design: ${s1.errors[0] ?? 'unknown error'}`);
      return;
    }
    r.current = currentSolution;
    this.results = r;
    const t1 = performance.now();
    this.messages.clear('model');
    // The first numbers: the headline and the plots now; the tables and the map with the next stage.
    this.renderAll({ light: true });
    if (this.firstResultMs === null) {
      // On screen: the figures and plots are drawn (the browser paints them at the next frame).
      this.firstResultMs = performance.now();
      document.body.dataset.firstResultMs = this.firstResultMs.toFixed(0);
    }
    // The 3D view (a large module and a WebGL context) starts once the first numbers are on screen.
    if (!this.view3dStarted) {
      this.view3dStarted = true;
      void this.setUp3d();
    } else {
      void this.update3d();
    }

    // 2. The current design with its grid-convergence estimate, the family, drag vs cover and the
    //    baseline.
    this.stage('sweeps');
    const extra: WheelInput[] = [...plan.family.inputs, ...plan.cover.inputs];
    if (plan.baseline) extra.push(plan.baseline.curve, plan.baseline.cover, plan.baseline.map);
    if (gci) extra.push(plan.current);
    const nf = plan.family.inputs.length;
    const nc = plan.cover.inputs.length;
    const gciIndex = gci ? extra.length - 1 : -1;
    const s2 = await this.sweep(extra, {
      signal: ac.signal,
      onProgress: (p) => this.status(`Cover-fraction sweeps: ${p.casesDone}/${p.casesTotal} cases`, p),
      onCase: (i, sol) => {
        if (i === gciIndex && sol && !superseded()) {
          r.current = sol;
          this.renderAll();
        }
      },
    });
    if (superseded()) return;
    const t2 = performance.now();
    s2.solutions.forEach((sol, i) => {
      if (i === gciIndex) {
        if (sol) r.current = sol;
      } else if (i < nf) r.family[i] = sol;
      else if (i < nf + nc) r.cover[i - nf] = sol;
      else if (r.baseline) {
        const k = i - nf - nc;
        if (k === 0) r.baseline.curve = sol;
        else if (k === 1) r.baseline.cover = sol;
        else r.baseline.map = sol;
      }
    });
    this.renderAll();
    if (s2.cancelled) return this.cancelled(r);

    // 3. The design map (the longer sweep).
    this.stage('map');
    const s3 = await this.sweep(plan.map.inputs, {
      signal: ac.signal,
      onProgress: (p) => {
        const left = Number.isFinite(p.remainingMs)
          ? `, about ${(p.remainingMs / 1000).toFixed(1)} s left`
          : '';
        this.status(`Design map: ${p.casesDone}/${p.casesTotal} designs${left}`, p);
      },
      onCase: (i, sol) => {
        r.map[i] = sol;
      },
    });
    if (superseded()) return;
    s3.solutions.forEach((sol, i) => {
      r.map[i] = sol;
    });
    this.renderAll();
    if (s3.cancelled) return this.cancelled(r);
    const failed = s2.failedCount + s3.failedCount;
    if (failed > 0) {
      const first = [...s2.errors, ...s3.errors].find((e) => e !== null) ?? '';
      this.messages.show(
        'warning',
        `${failed} swept design(s) could not be solved and are left blank.`,
        [first],
        'sweep',
      );
    } else {
      this.messages.clear('sweep');
    }
    const t3 = performance.now();
    document.body.dataset.timings = JSON.stringify({
      scriptStartMs: Math.round(scriptStartMs),
      workersReadyMs: Math.round(workersReadyMs),
      computeStartMs: Math.round(started),
      firstResultMs: Math.round(this.firstResultMs ?? Number.NaN),
      currentMs: Math.round(t1 - started),
      sweepsMs: Math.round(t2 - t1),
      mapMs: Math.round(t3 - t2),
    });
    const seconds = ((t3 - started) / 1000).toFixed(2);
    this.status(`Done in ${seconds} s on ${this.pool.size} worker${this.pool.size > 1 ? 's' : ''}.`);
    byId('cancel').hidden = true;
    this.abort = null;
    this.stage('done');
    this.setPhase('done');
  }

  private stage(name: 'current' | 'sweeps' | 'map' | 'done'): void {
    document.body.dataset.stage = name;
  }

  private cancelled(r: Results): void {
    this.results = r.current ? r : this.results;
    this.renderAll();
    this.status('Cancelled: the sweeps are incomplete. Change any control to compute again.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.lastComputeKey = '';
    this.setPhase('done');
  }

  private fail(message: string): void {
    this.messages.show('error', message, [], 'model');
    this.status('Stopped: see the message above.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.setPhase('error');
  }

  // -------------------------------------------------------------------------------------------
  // Display helpers

  private units(): DisplayUnits {
    const v = this.state.view;
    return {
      speed: v.speedUnit,
      force: v.forceUnit,
      area: v.areaUnit,
      referenceSpeedMps: kmhToMps(this.state.case.conditions.reference_speed_kmh),
    };
  }

  private conditionsText(speedMps: number, rho: number, short = false): string {
    const u = this.state.view.speedUnit;
    if (short) return `${fmt(speedFromMps(speedMps, u), 3)} ${speedUnitText(u)}, ρ ${rho.toFixed(3)} kg/m³`;
    return `at ${fmt(speedFromMps(speedMps, u), 3)} ${speedUnitText(u)} (${fmt(speedMps, 3)} m/s), ρ ${rho.toFixed(3)} kg/m³`;
  }

  private display(spec: OutputSpec, p: PointResult): number {
    return toDisplay(spec.get(p), spec.kind, this.units(), p);
  }

  /** A value, or its difference from the baseline point under the difference mode. */
  private compared(
    spec: OutputSpec,
    p: PointResult,
    b: PointResult | undefined,
    mode: DifferenceMode,
  ): number {
    if (mode === 'none' || !b) return this.display(spec, p);
    if (mode === 'force') return this.display(spec, p) - this.display(spec, b);
    if (mode === 'power') return p.powerW - b.powerW;
    const base = spec.get(b);
    return (100 * (spec.get(p) - base)) / Math.abs(base);
  }

  private comparedLabel(spec: OutputSpec, mode: DifferenceMode): string {
    const unit = unitText(spec.kind, this.units());
    const name = spec.short ?? spec.label;
    if (mode === 'force') return `${name} − baseline, ${unit}`;
    if (mode === 'power') return 'Power − baseline, W';
    if (mode === 'percent') return `${name} vs baseline, %`;
    return `${spec.label}, ${unit}`;
  }

  private differenceMode(): DifferenceMode {
    return this.state.baseline && this.results?.baseline ? this.state.view.difference : 'none';
  }

  /** The current design's points at its first (main) airspeed. */
  private mainPoints(sol: WheelSolution): PointResult[] {
    return sol.points.slice(0, this.state.case.conditions.yaw_deg.length);
  }

  // -------------------------------------------------------------------------------------------
  // Rendering

  private renderAll(opts: { light?: boolean } = {}): void {
    const r = this.results;
    if (!r?.current) return;
    this.renderFlags(r);
    this.renderHeadline(r);
    this.renderYawPlots(r);
    this.renderCoverPlot(r);
    if (!opts.light) {
      this.renderMap(r);
      this.renderTables(r);
    }
    const notes = [...r.plan.notes];
    if (this.state.case.conditions.airspeed_mps.length > 1) {
      notes.push(
        `This design lists ${this.state.case.conditions.airspeed_mps.length} airspeeds; the plots show the first, the “current design” table lists all.`,
      );
    }
    byId('plot-notes').textContent = notes.join(' ');
  }

  private renderFlags(r: Results): void {
    const flags = new Set<string>();
    for (const p of r.current!.points) for (const f of p.flags) flags.add(f);
    if (flags.size === 0) {
      this.messages.clear('flags');
      return;
    }
    this.messages.show(
      'warning',
      'Some points of this design are outside the model’s validity range (flagged in the tables):',
      [...flags].map((f) => FLAG_MESSAGES[f] ?? f),
      'flags',
    );
  }

  private renderHeadline(r: Results): void {
    const u = this.units();
    const pts = this.mainPoints(r.current!);
    const yaws = this.state.case.conditions.yaw_deg;
    const i0 = nearestIndex(yaws, 0);
    const i10 = nearestIndex(yaws, 10);
    const base = r.baseline?.curve ? r.baseline.curve.points : null;
    const cards: Array<{ label: string; spec: OutputSpec; i: number; extra?: string }> = [];
    const p0 = pts[i0]!;
    const gfRef = toDisplay(p0.axialN, 'force', { ...u, force: 'gf' }, p0);
    cards.push({
      label: `Axial drag at ${fmt(yaws[i0]!)}° yaw`,
      spec: OUTPUTS.axial,
      i: i0,
      extra:
        u.force === 'N'
          ? `${fixed(gfRef, 0)} gf at ${fmt(speedFromMps(u.referenceSpeedMps, u.speed), 3)} ${speedUnitText(u.speed)}`
          : `${fixed(p0.axialN, 3)} N at the airspeed`,
    });
    cards.push({ label: `Axial drag at ${fmt(yaws[i10]!)}° yaw`, spec: OUTPUTS.axial, i: i10 });
    cards.push({ label: `Side force at ${fmt(yaws[i10]!)}° yaw`, spec: OUTPUTS.side, i: i10 });
    cards.push({ label: `Steering moment at ${fmt(yaws[i10]!)}°`, spec: OUTPUTS.steering, i: i10 });
    cards.push({ label: `Power at ${fmt(yaws[i0]!)}° (one wheel)`, spec: OUTPUTS.power, i: i0 });
    cards.push({ label: `Drag area at ${fmt(yaws[i0]!)}° yaw`, spec: OUTPUTS.cda, i: i0 });
    const box = byId('headline');
    const frag = document.createDocumentFragment();
    for (const c of cards) {
      const p = pts[c.i]!;
      const card = document.createElement('div');
      card.className = 'figure-card';
      const label = document.createElement('div');
      label.className = 'label';
      label.textContent = c.label;
      const value = document.createElement('div');
      value.className = 'value';
      const decimals = c.spec.kind === 'force' ? (u.force === 'N' ? 3 : 0) : c.spec.kind === 'moment' ? 3 : 2;
      value.textContent = `${fixed(this.display(c.spec, p), decimals)} ${unitText(c.spec.kind, u)}`;
      card.append(label, value);
      const subs: string[] = [];
      if (c.extra) subs.push(c.extra);
      if (c.spec.key === 'axial' && p.uncertaintyAxialN > 0) {
        subs.push(
          `lattice ± ${fixed(toDisplay(p.uncertaintyAxialN, 'force', u, p), u.force === 'N' ? 3 : 1)}`,
        );
      }
      if (c.spec.key === 'side' && p.uncertaintySideN > 0) {
        subs.push(
          `lattice ± ${fixed(toDisplay(p.uncertaintySideN, 'force', u, p), u.force === 'N' ? 3 : 1)}`,
        );
      }
      if (subs.length > 0) {
        const sub = document.createElement('div');
        sub.className = 'sub';
        sub.textContent = subs.join(' · ');
        card.append(sub);
      }
      const b = base?.[c.i];
      if (b) {
        const delta = document.createElement('div');
        delta.className = 'delta';
        const d = this.display(c.spec, p) - this.display(c.spec, b);
        const pct = (100 * (c.spec.get(p) - c.spec.get(b))) / Math.abs(c.spec.get(b));
        const parts = [`${d >= 0 ? '+' : ''}${fixed(d, decimals)} ${unitText(c.spec.kind, u)}`];
        if (Number.isFinite(pct)) parts.push(`${pct >= 0 ? '+' : ''}${fixed(pct, 1)} %`);
        if (c.spec.key === 'axial')
          parts.push(`${p.powerW - b.powerW >= 0 ? '+' : ''}${fixed(p.powerW - b.powerW, 2)} W`);
        delta.textContent = `vs baseline: ${parts.join(', ')}`;
        card.append(delta);
      }
      frag.append(card);
    }
    box.replaceChildren(frag);
  }

  private renderYawPlots(r: Results): void {
    const u = this.units();
    const c = this.state.case;
    const yaws = [...c.conditions.yaw_deg];
    const pts = this.mainPoints(r.current!);
    const mode = this.differenceMode();
    const basePts = r.baseline?.curve?.points;
    const cond = this.conditionsText(c.conditions.airspeed_mps[0]!, r.rhoKgPerM3);
    const xLabel = `Yaw angle, deg — ${cond}`;
    const xLabelShort = `Yaw, deg — ${this.conditionsText(c.conditions.airspeed_mps[0]!, r.rhoKgPerM3, true)}`;
    const fractions = r.plan.family.fractions;
    const famSeries = (spec: OutputSpec, m: DifferenceMode): PlotSeries[] =>
      fractions.map((f, k) => ({
        label: `cover ${fmt(f, 3)}`,
        stroke: familyColour(k, fractions.length),
        width: 1.2,
        values: r.family[k]
          ? r.family[k]!.points.map((p, i) => nullIfNaN(this.compared(spec, p, basePts?.[i], m)))
          : yaws.map(() => null),
      }));
    const currentLabel = `this design (cover ${fmt(c.wheel.cover.fraction, 3)}, ${c.wheel.cover.placement})`;
    // Axial drag vs yaw.
    const dragSeries = famSeries(OUTPUTS.axial, mode);
    dragSeries.push({
      label: currentLabel,
      stroke: CURRENT_COLOUR,
      width: 2.6,
      values: pts.map((p, i) => nullIfNaN(this.compared(OUTPUTS.axial, p, basePts?.[i], mode))),
    });
    if (basePts && mode === 'none') {
      dragSeries.push({
        label: 'baseline',
        stroke: BASELINE_COLOUR,
        width: 1.8,
        dash: [6, 4],
        values: basePts.map((p) => nullIfNaN(this.display(OUTPUTS.axial, p))),
      });
    }
    const dragTitle =
      mode === 'none'
        ? 'Axial drag (along travel) vs yaw'
        : 'Axial drag vs yaw, as a difference from the baseline';
    setFigTitle('fig-drag-yaw', dragTitle);
    this.plots.dragYaw.render({
      title: dragTitle,
      xLabel,
      xLabelShort,
      yLabel: this.comparedLabel(OUTPUTS.axial, mode),
      xs: yaws,
      xIsYawDeg: true,
      series: dragSeries,
    });
    // Side force vs yaw.
    const sideSeries = famSeries(OUTPUTS.side, 'none');
    sideSeries.push({
      label: currentLabel,
      stroke: CURRENT_COLOUR,
      width: 2.6,
      values: pts.map((p) => nullIfNaN(this.display(OUTPUTS.side, p))),
    });
    if (basePts) {
      sideSeries.push({
        label: 'baseline',
        stroke: BASELINE_COLOUR,
        width: 1.8,
        dash: [6, 4],
        values: basePts.map((p) => nullIfNaN(this.display(OUTPUTS.side, p))),
      });
    }
    setFigTitle('fig-side-yaw', 'Side force vs yaw');
    this.plots.sideYaw.render({
      title: 'Side force vs yaw',
      xLabel,
      xLabelShort,
      yLabel: `Side force, ${unitText('force', u)}`,
      xs: yaws,
      xIsYawDeg: true,
      series: sideSeries,
    });
    // Centre of pressure and steering moment.
    const handling: PlotSeries[] = [
      {
        label: 'CP ahead of hub, mm',
        stroke: '#1c6876',
        width: 2,
        values: pts.map((p) => nullIfNaN(p.cpXM * 1000)),
      },
      {
        label: 'CP above hub, mm',
        stroke: '#6b4fa0',
        width: 2,
        values: pts.map((p) => nullIfNaN(p.cpZM * 1000)),
      },
      {
        label: 'steering moment, N m',
        stroke: CURRENT_COLOUR,
        width: 2.4,
        scale: 'y2',
        values: pts.map((p) => nullIfNaN(p.steeringMomentNm)),
      },
    ];
    if (basePts) {
      handling.push({
        label: 'baseline steering moment, N m',
        stroke: BASELINE_COLOUR,
        width: 1.6,
        dash: [6, 4],
        scale: 'y2',
        values: basePts.map((p) => nullIfNaN(p.steeringMomentNm)),
      });
    }
    const s = c.steering;
    const handlingTitle = `Centre of pressure and steering moment vs yaw (head ${fmt(s.head_angle_deg)}°, offset ${fmt(s.fork_offset_m * 1000)} mm)`;
    setFigTitle('fig-handling', handlingTitle);
    this.plots.handling.render({
      title: handlingTitle,
      xLabel,
      xLabelShort,
      yLabel: 'Centre of pressure, mm',
      y2Label: 'Steering moment, N m',
      xs: yaws,
      xIsYawDeg: true,
      series: handling,
    });
  }

  private renderCoverPlot(r: Results): void {
    const { fractions, speedsMps, yawsDeg } = r.plan.cover;
    const mode = this.differenceMode();
    const basePts = r.baseline?.cover?.points;
    const series: PlotSeries[] = [];
    const u = this.state.view.speedUnit;
    let k = 0;
    speedsMps.forEach((v, si) => {
      yawsDeg.forEach((yaw, yi) => {
        const idx = si * yawsDeg.length + yi;
        series.push({
          label: `${fmt(yaw)}° at ${fmt(speedFromMps(v, u), 3)} ${speedUnitText(u)}`,
          stroke: SPEED_YAW_COLOURS[yi % SPEED_YAW_COLOURS.length]!,
          width: 1.8,
          ...(si > 0 ? { dash: si === 1 ? [7, 4] : [2, 3] } : {}),
          values: r.cover.map((sol) =>
            sol ? nullIfNaN(this.compared(OUTPUTS.axial, sol.points[idx]!, basePts?.[idx], mode)) : null,
          ),
        });
        k++;
      });
    });
    void k;
    const c = this.state.case;
    const title =
      mode === 'none'
        ? 'Axial drag (along travel) vs covered fraction'
        : 'Axial drag vs covered fraction, as a difference from the baseline';
    setFigTitle('fig-drag-cover', title);
    const placement = c.wheel.cover.placement === 'explicit' ? 'rim' : c.wheel.cover.placement;
    this.plots.dragCover.render({
      title,
      xLabel: `Covered fraction (covers at the ${placement}) — ρ ${r.rhoKgPerM3.toFixed(3)} kg/m³; yaw and airspeed per line`,
      xLabelShort: `Covered fraction — ρ ${r.rhoKgPerM3.toFixed(3)} kg/m³`,
      yLabel: this.comparedLabel(OUTPUTS.axial, mode),
      xs: [...fractions],
      series,
      markerX: c.wheel.cover.placement === 'explicit' ? null : c.wheel.cover.fraction,
    });
  }

  private mapGrid(r: Results, key: OutputKey, mode: DifferenceMode): Float64Array {
    const spec = OUTPUTS[key];
    const b = r.baseline?.map?.points[0];
    return Float64Array.from(r.map, (sol) => {
      const p = sol?.points[0];
      return p ? this.compared(spec, p, b, mode) : Number.NaN;
    });
  }

  private renderMap(r: Results): void {
    const v = this.state.view;
    const c = this.state.case;
    const mode = this.differenceMode();
    const { fractions, depthsM, yawDeg } = r.plan.map;
    const colourSpec = OUTPUTS[v.mapColour];
    const contourSpec = OUTPUTS[v.mapContour];
    const colourLabel = this.comparedLabel(colourSpec, mode);
    const contourLabel = `${contourSpec.label}, ${unitText(contourSpec.kind, this.units())}`;
    const title = [
      `Colour: ${colourLabel}.  Lines: ${contourLabel}.`,
      `At ${fmt(yawDeg)}° yaw, ${this.conditionsText(c.conditions.airspeed_mps[0]!, r.rhoKgPerM3)}.`,
    ];
    setFigTitle('fig-map', `Design map: covered fraction × rim depth at ${fmt(yawDeg)}° yaw`);
    const explicit = c.wheel.cover.placement === 'explicit';
    const b = this.state.baseline;
    this.designMap.render({
      xs: fractions,
      ys: depthsM.map((d) => d * 1000),
      colour: this.mapGrid(r, v.mapColour, mode),
      colourLabel,
      diverging: mode !== 'none',
      contour: this.mapGrid(r, v.mapContour, 'none'),
      contourLabel,
      title,
      current: explicit ? null : { x: c.wheel.cover.fraction, y: c.wheel.rim_depth_m * 1000 },
      baseline:
        b && b.wheel.cover.placement !== 'explicit'
          ? { x: b.wheel.cover.fraction, y: b.wheel.rim_depth_m * 1000 }
          : null,
    });
  }

  // -------------------------------------------------------------------------------------------
  // Tables

  private buildTables(): void {
    const host = byId('tables');
    const specs: Array<[string, string]> = [
      ['table-current', 'Current design at each airspeed and yaw (drag and yaw plots, handling plot)'],
      ['table-components', 'Current design: axial drag by model component (first airspeed)'],
      ['table-family', 'Covering-fraction family vs yaw (drag and side-force plots)'],
      ['table-cover', 'Axial drag vs covered fraction (drag vs cover plot)'],
      ['table-map', 'Design map grid'],
      ['table-baseline', 'Current design against the pinned baseline'],
    ];
    for (const [id, caption] of specs) {
      const block = document.createElement('section');
      block.className = 'table-block';
      block.id = `${id}-block`;
      const head = document.createElement('div');
      head.className = 'table-head';
      const csv = document.createElement('button');
      csv.type = 'button';
      csv.textContent = 'CSV';
      csv.setAttribute('aria-label', `Save as CSV: ${caption}`);
      const scroll = document.createElement('div');
      scroll.className = 'table-scroll';
      scroll.tabIndex = 0;
      scroll.setAttribute('role', 'region');
      scroll.setAttribute('aria-label', caption);
      const table = new DataTable(scroll, id, caption);
      csv.addEventListener('click', () =>
        downloadText(
          `${safeFileStem(this.state.case.name, 'coversweep')}-${id.replace('table-', '')}.csv`,
          table.toCsv(),
          'text/csv',
        ),
      );
      head.append(csv);
      block.append(head, scroll);
      host.append(block);
      this.tables.set(id, table);
    }
  }

  private renderTables(r: Results): void {
    const u = this.units();
    const fu = unitShort('force', u);
    const au = unitShort('area', u);
    const fd = u.force === 'N' ? 4 : 1;
    const ad = u.area === 'm2' ? 6 : 2;
    const refText = `${fmt(speedFromMps(u.referenceSpeedMps, u.speed), 3)} ${speedUnitText(u.speed)}`;
    const sp = speedUnitText(u.speed);
    const c = this.state.case;
    const yaws = c.conditions.yaw_deg;
    // Current design.
    const cur = r.current!;
    const curColumns: TableColumn[] = [
      { header: 'Yaw, deg', decimals: 2 },
      { header: `Airspeed, ${sp}`, decimals: 2 },
      { header: `Axial drag, ${fu}`, decimals: fd },
      { header: `Axial drag, gf at ${refText}`, decimals: 1 },
      { header: `Axial lattice ±, ${fu}`, decimals: fd },
      { header: `Side force, ${fu}`, decimals: fd },
      { header: `Side lattice ±, ${fu}`, decimals: fd },
      { header: `Vertical force, ${fu}`, decimals: fd },
      { header: `Wind-axis drag, ${fu}`, decimals: fd },
      { header: `Wind-axis lift, ${fu}`, decimals: fd },
      { header: 'CP ahead of hub, mm', decimals: 1 },
      { header: 'CP above hub, mm', decimals: 1 },
      { header: 'Yaw moment, N m', decimals: 4 },
      { header: 'Roll moment, N m', decimals: 4 },
      { header: 'Steering moment, N m', decimals: 4 },
      { header: 'Axle torque, N m', decimals: 5 },
      { header: 'Power, W', decimals: 3 },
      { header: `Drag area, ${au}`, decimals: ad },
      { header: 'Flags' },
    ];
    const curRows: Cell[][] = cur.points.map((p, i) => [
      yaws[i % yaws.length]!,
      speedFromMps(p.airspeedMps, u.speed),
      toDisplay(p.axialN, 'force', u, p),
      toDisplay(p.axialN, 'force', { ...u, force: 'gf' }, p),
      toDisplay(p.uncertaintyAxialN, 'force', u, p),
      toDisplay(p.sideN, 'force', u, p),
      toDisplay(p.uncertaintySideN, 'force', u, p),
      toDisplay(p.verticalN, 'force', u, p),
      toDisplay(p.windDragN, 'force', u, p),
      toDisplay(p.windLiftN, 'force', u, p),
      p.cpXM * 1000,
      p.cpZM * 1000,
      p.yawMomentNm,
      p.rollMomentNm,
      p.steeringMomentNm,
      p.axleTorqueNm,
      p.powerW,
      toDisplay(p.cdaAxialM2, 'area', u, p),
      p.flags.join(' '),
    ]);
    this.tables.get('table-current')!.setData(curColumns, curRows);
    // Components.
    const names = COMPONENT_NAMES;
    const compColumns: TableColumn[] = [
      { header: 'Yaw, deg', decimals: 2 },
      ...names.map((n) => ({ header: `${n.replace('_', ' & ')} axial, ${fu}`, decimals: fd })),
      ...names.map((n) => ({ header: `${n.replace('_', ' & ')} axle torque, N m`, decimals: 5 })),
      { header: `Total axial, ${fu}`, decimals: fd },
    ];
    const compRows: Cell[][] = this.mainPoints(cur).map((p, i) => [
      yaws[i]!,
      ...names.map((n) => toDisplay(-p.components[n].fxN, 'force', u, p)),
      ...names.map((n) => p.components[n].axleTorqueNm),
      toDisplay(p.axialN, 'force', u, p),
    ]);
    this.tables.get('table-components')!.setData(compColumns, compRows);
    // Family.
    const fr = r.plan.family.fractions;
    const famColumns: TableColumn[] = [
      { header: 'Yaw, deg', decimals: 2 },
      ...fr.map((f) => ({ header: `Axial drag at cover ${fmt(f, 3)}, ${fu}`, decimals: fd })),
      ...fr.map((f) => ({ header: `Side force at cover ${fmt(f, 3)}, ${fu}`, decimals: fd })),
    ];
    const famRows: Cell[][] = yaws.map((yaw, i) => [
      yaw,
      ...fr.map((_, k) => {
        const p = r.family[k]?.points[i];
        return p ? toDisplay(p.axialN, 'force', u, p) : null;
      }),
      ...fr.map((_, k) => {
        const p = r.family[k]?.points[i];
        return p ? toDisplay(p.sideN, 'force', u, p) : null;
      }),
    ]);
    this.tables.get('table-family')!.setData(famColumns, famRows);
    // Cover.
    const { speedsMps, yawsDeg } = r.plan.cover;
    const coverBase = r.baseline?.cover?.points;
    const coverColumns: TableColumn[] = [
      { header: 'Covered fraction', decimals: 2 },
      { header: `Airspeed, ${sp}`, decimals: 2 },
      { header: 'Yaw, deg', decimals: 2 },
      { header: `Axial drag, ${fu}`, decimals: fd },
      { header: `Side force, ${fu}`, decimals: fd },
      { header: 'Steering moment, N m', decimals: 4 },
      { header: 'Power, W', decimals: 3 },
      ...(coverBase
        ? [
            { header: `Axial drag − baseline, ${fu}`, decimals: fd },
            { header: 'Power − baseline, W', decimals: 3 },
            { header: 'Axial drag vs baseline, %', decimals: 1 },
          ]
        : []),
    ];
    const coverRows: Cell[][] = [];
    r.cover.forEach((sol, fi) => {
      if (!sol) return;
      speedsMps.forEach((v, si) => {
        yawsDeg.forEach((yaw, yi) => {
          const idx = si * yawsDeg.length + yi;
          const p = sol.points[idx]!;
          const b = coverBase?.[idx];
          coverRows.push([
            r.plan.cover.fractions[fi]!,
            speedFromMps(v, u.speed),
            yaw,
            toDisplay(p.axialN, 'force', u, p),
            toDisplay(p.sideN, 'force', u, p),
            p.steeringMomentNm,
            p.powerW,
            ...(b
              ? [
                  toDisplay(p.axialN, 'force', u, p) - toDisplay(b.axialN, 'force', u, b),
                  p.powerW - b.powerW,
                  (100 * (p.axialN - b.axialN)) / Math.abs(b.axialN),
                ]
              : []),
          ]);
        });
      });
    });
    this.tables.get('table-cover')!.setData(coverColumns, coverRows);
    // Map.
    const v = this.state.view;
    const mapKeys: OutputKey[] = [
      ...new Set<OutputKey>([v.mapColour, v.mapContour, 'axial', 'side', 'steering', 'power']),
    ];
    const mapColumns: TableColumn[] = [
      { header: 'Covered fraction', decimals: 2 },
      { header: 'Rim depth, mm', decimals: 1 },
      ...mapKeys.map((k) => ({
        header: `${OUTPUTS[k].label}, ${unitShort(OUTPUTS[k].kind, u)}`,
        decimals:
          OUTPUTS[k].kind === 'force'
            ? fd
            : OUTPUTS[k].kind === 'moment'
              ? 4
              : OUTPUTS[k].kind === 'area'
                ? ad
                : 2,
      })),
    ];
    const mapRows: Cell[][] = [];
    const nx = r.plan.map.fractions.length;
    r.map.forEach((sol, k) => {
      const p = sol?.points[0];
      if (!p) return;
      mapRows.push([
        r.plan.map.fractions[k % nx]!,
        r.plan.map.depthsM[Math.floor(k / nx)]! * 1000,
        ...mapKeys.map((key) => this.display(OUTPUTS[key], p)),
      ]);
    });
    const mapTable = this.tables.get('table-map')!;
    mapTable.setCaption(
      `Design map grid at ${fmt(r.plan.map.yawDeg)}° yaw, ${this.conditionsText(c.conditions.airspeed_mps[0]!, r.rhoKgPerM3)}`,
    );
    mapTable.setData(mapColumns, mapRows);
    // Baseline.
    const block = byId('table-baseline-block');
    const bpts = r.baseline?.curve?.points;
    block.hidden = !bpts;
    if (bpts) {
      const pts = this.mainPoints(cur);
      this.tables.get('table-baseline')!.setData(
        [
          { header: 'Yaw, deg', decimals: 2 },
          { header: `Baseline axial drag, ${fu}`, decimals: fd },
          { header: `This design's axial drag, ${fu}`, decimals: fd },
          { header: `Difference, ${fu}`, decimals: fd },
          { header: 'Difference, gf at reference speed', decimals: 1 },
          { header: 'Power difference, W', decimals: 3 },
          { header: 'Axial drag difference, %', decimals: 1 },
          { header: `Baseline side force, ${fu}`, decimals: fd },
          { header: `This design's side force, ${fu}`, decimals: fd },
          { header: 'Baseline steering moment, N m', decimals: 4 },
          { header: "This design's steering moment, N m", decimals: 4 },
        ],
        pts.map((p, i) => {
          const b = bpts[i]!;
          const gf = { ...u, force: 'gf' as const };
          return [
            yaws[i]!,
            toDisplay(b.axialN, 'force', u, b),
            toDisplay(p.axialN, 'force', u, p),
            toDisplay(p.axialN, 'force', u, p) - toDisplay(b.axialN, 'force', u, b),
            toDisplay(p.axialN, 'force', gf, p) - toDisplay(b.axialN, 'force', gf, b),
            p.powerW - b.powerW,
            (100 * (p.axialN - b.axialN)) / Math.abs(b.axialN),
            toDisplay(b.sideN, 'force', u, b),
            toDisplay(p.sideN, 'force', u, p),
            b.steeringMomentNm,
            p.steeringMomentNm,
          ];
        }),
      );
    }
  }

  // -------------------------------------------------------------------------------------------
  // 3D view

  private async setUp3d(): Promise<void> {
    const note = byId('view3d-note');
    const loader = view3dLoader();
    if (!loader) {
      note.textContent = 'The 3D view is not part of this build.';
      return;
    }
    try {
      const mod = await loader();
      this.view3d = mod.createWheelView(byId('view3d'));
      if (Object.keys(this.state.view.layers3d).length > 0) this.view3d.setLayers(this.state.view.layers3d);
      // The view's own layer switches become part of the state (link, autosave, project file).
      byId('view3d').addEventListener('change', () => {
        if (!this.view3d) return;
        const layers = { ...this.view3d.layers() };
        if (JSON.stringify(layers) !== JSON.stringify(this.state.view.layers3d))
          this.setView({ layers3d: layers });
      });
      note.textContent = '';
      void this.update3d();
    } catch (error) {
      note.textContent = `The 3D view could not start: ${(error as Error).message}`;
    }
  }

  private async update3d(): Promise<void> {
    if (!this.view3d || !this.results?.current) return;
    const c = this.state.case;
    const input = caseToModelInput(c);
    const p0 = input.points[0]!;
    const yawDeg = this.state.view.view3dYawDeg;
    const request = {
      input: {
        ...input,
        options: { ...input.options, gridConvergence: false },
        points: [{ ...p0, yawRad: degToRad(yawDeg) }],
      },
    };
    const ticket = ++this.view3dRequest;
    try {
      this.view3dWorker ??= spawnTracked();
      const field = (await Promise.race([
        this.view3dWorker.api.viewField(request),
        this.view3dWorker.failed,
      ])) as ViewField;
      if (ticket !== this.view3dRequest || !this.view3d) return;
      this.view3d.update(field);
      byId('view3d-note').textContent =
        `Pressure jump on the wheel at ${fmt(yawDeg)}° yaw, ${this.conditionsText(p0.airspeedMps, p0.rhoKgPerM3)}; drag to orbit.`;
    } catch (error) {
      this.view3dWorker?.terminate();
      this.view3dWorker = null;
      byId('view3d-note').textContent =
        `The 3D view's flow field could not be computed: ${(error as Error).message}`;
    }
  }

  // -------------------------------------------------------------------------------------------
  // Buttons, files, tabs

  private wireFigureActions(): void {
    const figures: Array<[string, () => Promise<Blob>, string | null]> = [
      ['fig-drag-yaw', () => this.plots.dragYaw.toPngBlob(), 'table-family'],
      ['fig-side-yaw', () => this.plots.sideYaw.toPngBlob(), 'table-family'],
      ['fig-drag-cover', () => this.plots.dragCover.toPngBlob(), 'table-cover'],
      ['fig-handling', () => this.plots.handling.toPngBlob(), 'table-current'],
      ['fig-map', () => this.designMap.toPngBlob(), 'table-map'],
      [
        'fig-3d',
        () =>
          this.view3d ? this.view3d.toPngBlob() : Promise.reject(new Error('the 3D view is not available')),
        null,
      ],
    ];
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
          (blob) =>
            downloadBlob(
              `${safeFileStem(this.state.case.name, 'coversweep')}-${id.replace('fig-', '')}.png`,
              blob,
            ),
          (error: Error) => this.messages.show('error', 'PNG export failed', [error.message], 'png'),
        );
      });
      actions.append(pngButton);
      if (tableId) {
        const tableButton = document.createElement('button');
        tableButton.type = 'button';
        tableButton.textContent = 'Table';
        tableButton.setAttribute('aria-label', `Show the numbers: ${title}`);
        tableButton.addEventListener('click', () => {
          this.setView({ tab: 'tables' });
          const block = document.getElementById(`${tableId}-block`);
          block?.scrollIntoView({ block: 'start' });
          block?.querySelector<HTMLElement>('.table-scroll')?.focus();
        });
        actions.append(tableButton);
      }
      cap.append(actions);
    }
  }

  private wireActions(): void {
    byId('cancel').addEventListener('click', () => {
      if (this.abort) this.abort.abort();
      const ac = this.abort;
      if (ac) {
        // compute() sees the abort as a cancel (it is still the current run).
      }
    });
    byId('pin-baseline').addEventListener('click', () => this.pinBaseline());
    byId('clear-baseline').addEventListener('click', () => {
      this.apply({ ...this.state, baseline: null, view: { ...this.state.view, difference: 'none' } });
      this.messages.clear('baseline');
    });
    byId('copy-link').addEventListener('click', () => {
      if (stateToHashOrNull(this.state) === null) {
        this.messages.show(
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
          this.messages.show(
            'info',
            'Link copied: it reopens this design, view and baseline.',
            [],
            'link-copy',
          ),
        () =>
          this.messages.show(
            'info',
            'Copy this link (it reopens this design and view):',
            [link],
            'link-copy',
          ),
      ) ??
        this.messages.show('info', 'Copy this link (it reopens this design and view):', [link], 'link-copy');
    });
    byId('save-project').addEventListener('click', () => {
      downloadText(
        `${safeFileStem(this.state.case.name, 'coversweep')}.coversweep-project.json`,
        stateToProjectText(this.state),
        'application/json',
      );
    });
    byId('export-case').addEventListener('click', () => {
      downloadText(
        `${safeFileStem(this.state.case.name, 'coversweep')}.case.json`,
        `${JSON.stringify(this.state.case, null, 2)}\n`,
        'application/json',
      );
    });
    byId<HTMLInputElement>('open-project').addEventListener('change', (event) => {
      const input = event.target as HTMLInputElement;
      void this.openFile(input, (text, name) => {
        const r = projectTextToState(text, name);
        if (!r.ok) return r.errors;
        this.apply(r.value);
        return null;
      });
    });
    byId<HTMLInputElement>('open-case').addEventListener('change', (event) => {
      const input = event.target as HTMLInputElement;
      void this.openFile(input, (text, name) => {
        const r = parseCaseFile(text);
        if (!r.ok) return r.errors.map((e) => `${name}: ${e}`);
        const long = nameErrors({ case: r.value }, name);
        if (long.length > 0) return long;
        this.apply({ ...this.state, case: r.value });
        return null;
      });
    });
    byId('kept-designs').addEventListener('click', () => this.showKept());
    byId('reset').addEventListener('click', () => {
      this.apply({
        case: defaultCase(),
        view: defaultView(),
        baseline: null,
        road: defaultRoad(),
        calibration: null,
      });
      this.messages.show(
        'info',
        'Back to the demo wheel and the default view (the baseline is cleared).',
        [],
        'reset',
      );
    });
  }

  private async openFile(
    input: HTMLInputElement,
    use: (text: string, name: string) => string[] | null,
  ): Promise<void> {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    let text: string;
    try {
      if (file.size > MAX_PROJECT_BYTES)
        throw new Error(
          `the file is ${Math.round(file.size / 1024)} kB, more than the ${MAX_PROJECT_BYTES / 1024} kB limit; a design file is a few kB`,
        );
      text = await file.text();
    } catch (error) {
      this.messages.show(
        'error',
        `Could not read ${file.name}; nothing changed.`,
        [(error as Error).message],
        'file',
      );
      return;
    }
    const errors = use(text, file.name);
    if (errors) {
      this.messages.show(
        'error',
        `${file.name} could not be opened; the current design is unchanged.`,
        errors,
        'file',
      );
    } else {
      this.messages.clear('file');
      this.messages.show('info', `Opened ${file.name}.`, [], 'file');
    }
  }

  private wireTabs(): void {
    const tabs = [...document.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
    for (const tab of tabs) {
      tab.addEventListener('click', () => this.setView({ tab: tab.dataset.tab as TabId }));
      tab.addEventListener('keydown', (e) => {
        const i = tabs.indexOf(tab);
        let j = -1;
        if (e.key === 'ArrowRight') j = (i + 1) % tabs.length;
        else if (e.key === 'ArrowLeft') j = (i - 1 + tabs.length) % tabs.length;
        else if (e.key === 'Home') j = 0;
        else if (e.key === 'End') j = tabs.length - 1;
        if (j >= 0) {
          e.preventDefault();
          this.setView({ tab: tabs[j]!.dataset.tab as TabId });
          tabs[j]!.focus();
        }
      });
    }
  }

  private showTab(tab: TabId, focus: boolean): void {
    for (const id of TAB_IDS) {
      const button = byId(`tab-${id}`);
      const selected = id === tab;
      button.setAttribute('aria-selected', String(selected));
      button.tabIndex = selected ? 0 : -1;
      byId(`panel-${id}`).hidden = !selected;
      if (selected && focus) button.focus();
    }
    if (tab === 'data') void this.dataPanel().then((panel) => panel.shown());
    if (tab === 'road') void this.roadPanel();
    if (tab === 'help') void this.validationPanel().then((panel) => panel.shown());
  }

  private pinBaseline(): void {
    this.apply({ ...this.state, baseline: structuredClone(this.state.case) });
    this.messages.show(
      'info',
      'Baseline pinned: the current wheel. Change the design to compare against it.',
      [],
      'baseline',
    );
  }

  // -------------------------------------------------------------------------------------------
  // On the road

  /** The ride's baseline wheel: the pinned baseline's, or this wheel without covers. */
  private rideBaseline(s: AppState): { wheel: CaseWheel; label: string; pinned: boolean } {
    if (s.baseline) {
      return {
        wheel: s.baseline.wheel,
        label: `the pinned baseline (${s.baseline.name ?? 'unnamed'})`,
        pinned: true,
      };
    }
    const w = s.case.wheel;
    const uncovered = w.cover.fraction === 0 && w.cover.placement !== 'explicit';
    return {
      wheel: { ...w, cover: { fraction: 0, placement: 'rim', sides: w.cover.sides } },
      label: uncovered
        ? 'no baseline is pinned, so this same wheel without covers (identical to the design: pin a baseline, then change the design)'
        : 'no baseline is pinned, so this same wheel without covers (fully spoked)',
      pinned: false,
    };
  }

  private roadContext(s: AppState): RoadContext {
    const b = this.rideBaseline(s);
    return {
      speedUnit: s.view.speedUnit,
      referenceSpeedMps: kmhToMps(s.case.conditions.reference_speed_kmh),
      designLabel: `${s.case.name ?? 'this design'}${s.calibration ? ' (CALIBRATED model)' : ''}`,
      baselineLabel: b.label,
      baselinePinned: b.pinned,
      hubHeightM: s.case.wheel.outer_radius_m,
    };
  }

  private showRoadInputs(s: AppState): void {
    const road = s.road ?? defaultRoad();
    const key = JSON.stringify(road);
    const ctx = this.roadContext(s);
    const refresh = key !== this.roadShown.road || s.view.speedUnit !== this.roadShown.unit;
    if (!this.road) return;
    this.road.setRoad(road, ctx, refresh);
    if (refresh) this.road.clearErrors();
    this.roadShown = { road: key, unit: s.view.speedUnit };
  }

  /** The ride as a ride file (what `coversweep ride` reads), as far as it is valid. */
  private saveRideFile(): void {
    const s = this.state;
    const b = this.rideBaseline(s);
    const raw = roadToRideRaw(
      s.road ?? defaultRoad(),
      s.case,
      b.wheel,
      `${s.case.name ?? 'design'} against ${b.pinned ? (s.baseline?.name ?? 'the baseline') : 'the same wheel without covers'}`,
    );
    downloadText(
      `${safeFileStem(s.case.name, 'coversweep')}.ride.json`,
      `${JSON.stringify(raw, null, 2)}\n`,
      'application/json',
    );
  }

  private onRoadChange(candidate: RoadState): void {
    const b = this.rideBaseline(this.state);
    const r = validateRoadFor(candidate, this.state.case, b.wheel);
    if (!r.ok) {
      this.road?.showErrors(r.errors, candidate);
      return;
    }
    this.road?.clearErrors();
    this.apply({ ...this.state, road: candidate });
  }

  private scheduleRide(delayMs: number): void {
    if (this.rideTimer) clearTimeout(this.rideTimer);
    this.rideTimer = setTimeout(() => {
      this.rideTimer = null;
      void this.computeRide();
    }, delayMs);
  }

  private async computeRide(): Promise<void> {
    const panel = await this.roadPanel();
    const s = this.state;
    const road = s.road ?? defaultRoad();
    const b = this.rideBaseline(s);
    const r = validateRoadFor(road, s.case, b.wheel);
    if (!r.ok) {
      panel.showErrors(r.errors, road);
      panel.setStatus('invalid', 'This ride cannot be computed: see the messages above the inputs.');
      this.lastRideKey = '';
      return;
    }
    const key = JSON.stringify(r.value);
    if (key === this.lastRideKey) return;
    this.lastRideKey = key;
    panel.setStatus(
      'computing',
      "Solving both wheels' yaw curves (0–90°) and the ride's wind states in the background…",
    );
    const started = performance.now();
    const out = await this.rideWorker.run((api) => api.ride({ ride: r.value }));
    if (out.status === 'superseded' || out.status === 'cancelled') return;
    if (key !== this.lastRideKey) return;
    if (out.status === 'failed') {
      this.lastRideKey = '';
      panel.setStatus('error', `The ride could not be computed: ${out.error}`);
      return;
    }
    const ctx = this.roadContext(this.state);
    panel.showResult(out.value, ctx);
    const seconds = fmt((performance.now() - started) / 1000, 2);
    panel.setStatus(
      'done',
      `Computed in ${seconds} s${out.value.curvesReused ? ' (the yaw curves were reused)' : ''}: ${ctx.designLabel} against ${b.pinned ? 'the pinned baseline' : 'this wheel without covers'}.`,
    );
  }

  // -------------------------------------------------------------------------------------------
  // Your data

  private dataContext(): DataContext {
    const c = this.state.case;
    const R = c.wheel.outer_radius_m;
    return {
      referenceAreaM2: Math.PI * R * R,
      airspeedMps: c.conditions.airspeed_mps[0]!,
      rhoKgPerM3: caseAirDensity(c),
      speedUnit: this.state.view.speedUnit,
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
      this.apply({ ...this.state, case: c.value, calibration: null });
      this.messages.show(
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
    const caseFile: CaseFile = this.state.case;
    panel.setDefaultRanges(caseAirDensity(caseFile));
    const heavy = req.calibrate || req.convergence || req.uncertainty !== null;
    const out = await this.dataWorker.run<PackedResult>(
      (api) =>
        api.compareTable({
          caseFile,
          ref: req.ref,
          map: req.map,
          dataLabel: req.label,
          calibrate: req.calibrate ? {} : false,
          convergence: req.convergence ? {} : false,
          uncertainty: req.uncertainty ? { ranges: req.uncertainty } : false,
        }),
      compareDeadlineMs(req.rowCount, heavy),
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
    await panel.showReport(out.value.value, req);
  }

  private useCalibrated(use: boolean, calibration: CalibrationResult | null, points: number): void {
    const s = this.state;
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
        this.messages.show('error', 'The calibrated values could not be used:', r.errors, 'calibration');
        this.data?.setCalibratedInUse(false);
        return;
      }
      this.apply({
        ...s,
        case: r.value,
        calibration: { data: calibration.fitted_to.data, points, values, original: before },
      });
    } else if (s.calibration) {
      const r = validateCase({ ...s.case, model: { ...s.case.model, ...s.calibration.original } });
      if (r.ok) this.apply({ ...s, case: r.value, calibration: null });
    }
  }

  private showCalibrationBadge(mark: CalibrationMark | null): void {
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

/**
 * Deadlines of the data panel's background jobs (a worker silent for longer is taken as hung, replaced
 * and the job retried once): generous on purpose, scaled by the job's size. Reading: 60 s plus 10 s per
 * MB (reading runs at tens of MB/s). Comparing: 60 s plus 2 ms per data row, 50 times that for a fit,
 * a convergence study or an uncertainty band (each evaluates the model many times per row).
 */
function readDeadlineMs(bytes: number): number {
  return 60_000 + (10_000 * bytes) / 1_048_576;
}

function compareDeadlineMs(rows: number, heavy: boolean): number {
  return 60_000 + 2 * rows * (heavy ? 50 : 1);
}

function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (!el) throw new Error(`page element #${id} is missing`);
  return el as T;
}

function plotDiv(figureId: string): HTMLElement {
  return byId(figureId).querySelector<HTMLElement>('.plot')!;
}

function setFigTitle(figureId: string, text: string): void {
  const el = byId(figureId).querySelector('.fig-title');
  if (el) el.textContent = text;
}

function nullIfNaN(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
