/**
 * The page's wiring: the state (a validated case file + view settings + optional baseline + road inputs)
 * and its one way in (apply: store, controls, tabs, then recompute or redraw), the controls, the figures
 * and tabs. The parts live beside it: pageStore (link, autosave, kept designs), pageCompute (the studies
 * on the worker pool, stage by stage), views/ (each figure and table reads the state and the results'
 * cubes), pageActions (buttons and files), roadGlue and dataGlue (the two panels, each with its own
 * worker), view3dGlue (the 3D view).
 */
import { validateCase } from '../compute/caseFile';
import type { WorkerPool } from '../compute/engine/workerPool';
import { type AppState, nameErrors } from './appState';
import { pinCurrent } from './baselines/pinnedBaselines';
import { Controls } from './controls';
import { DataGlue } from './dataGlue';
import type { DataPlotName } from './dataPanel';
import { DesignMap } from './designMap';
import type { DurableCopy } from './durableAutosave';
import { workerTestHooks } from './earlyPool';
import { setExportSource } from './export/exportContext';
import { mapSvg } from './export/mapSvg';
import { plotSvg } from './export/plotSvg';
import { pngWithCaption } from './export/pngWithCaption';
import type { Field, FieldValue } from './fields';
import { LinePlot } from './linePlot';
import { Messages } from './messages';
import { onlyDataChanged } from './onlyDataChanged';
import { type ActionsHost, wirePageActions } from './pageActions';
import { type ComputeHost, PageCompute, type RenderOptions } from './pageCompute';
import { PageStore } from './pageStore';
import { showTabPanel, wireTabs } from './pageTabs';
import type { ReportHost, ReportPlotName } from './report/reportTypes';
import { wireReport } from './report/wireReport';
import { RoadGlue } from './roadGlue';
import type { RoadPlotName } from './roadPanel';
import { StudyGlue, type StudyHost } from './studyGlue';
import type { ValidationPanel } from './validationPanel';
import { View3dGlue } from './view3dGlue';
import { type TabId, type ViewState, validateView } from './viewState';
import { renderBaselineList } from './views/baselineList';
import { renderCoverPlot } from './views/coverPlot';
import { wireFigureActions } from './views/figureActions';
import { renderFlags } from './views/flagsMessage';
import { renderHeadline } from './views/headline';
import { MapPick } from './views/mapPick';
import { MapRide } from './views/mapRide';
import { renderMap } from './views/mapView';
import type { PageResults } from './views/pageResults';
import { PageTables } from './views/pageTables';
import { byId, plotDiv, presentOf } from './views/present';
import { renderYawPlots } from './views/yawPlots';
import { type HangReport, onWorkerHang } from './watchdog';

type MainPlotName = 'dragYaw' | 'sideYaw' | 'dragCover' | 'handling';
export type PlotName = MainPlotName | RoadPlotName | DataPlotName;

export class App implements ComputeHost, ActionsHost, StudyHost, ReportHost {
  state: AppState;
  private readonly computer: PageCompute;
  private controls!: Controls;
  readonly messages: Messages;
  results: PageResults | null = null;
  private readonly plots: Record<MainPlotName, LinePlot>;
  private readonly designMap: DesignMap;
  private tables: PageTables | null = null;
  private readonly mapPick = new MapPick(this);
  private readonly mapRide = new MapRide(this);
  private readonly view3dGlue = new View3dGlue(this);
  /** The two panels (built, and their code loaded, when first opened), each with its own task channel. */
  private readonly roadGlue = new RoadGlue(this);
  private readonly dataGlue = new DataGlue(this, (hash) => this.store.autosave.dataFor(hash));
  /** The design study tab (built when first opened), with its own task channel. */
  private readonly studyGlue = new StudyGlue(this);
  private lastCaseKey = '';

  private readonly store: PageStore;

  /** `durable`: the autosave's durable copy, read before the page starts (main.ts). */
  constructor(pool: WorkerPool, durable: DurableCopy | null = null) {
    this.store = new PageStore(this, durable);
    this.messages = new Messages(byId('messages'));
    this.state = this.store.initialState();
    this.computer = new PageCompute(pool, this);
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
      return this.roadGlue.plotSpec(name);
    if (name === 'dataForce' || name === 'dataSide') return this.dataGlue.plotSpec(name);
    return this.plots[name].currentSpec();
  }

  private validationLoading: Promise<ValidationPanel> | null = null;

  /** The Help tab's reference table, loaded and computed only when Help is opened (or a report asks). */
  private validationPanel(): Promise<ValidationPanel> {
    this.validationLoading ??= import('./validationPanel').then(
      ({ ValidationPanel }) => new ValidationPanel(byId('validation')),
    );
    return this.validationLoading;
  }

  /**
   * Start the first computation, then build the page: the first solve's message is posted to a worker
   * (which has been loading since the script started) before the controls and tables are built, and
   * its answer cannot arrive before they are.
   */
  async start(): Promise<void> {
    this.computer.startNow();
    await new Promise((resolve) => setTimeout(resolve, 0));
    this.controls = new Controls(byId('controls'), this.state, (field, value, settled) =>
      this.onEdit(field, value, settled),
    );
    setExportSource(
      () => ({
        case: this.state.case,
        calibration: this.state.calibration ?? null,
        speedUnit: this.state.view.speedUnit,
        ...(this.state.road ? { road: this.state.road } : {}),
      }),
      (what, error) => this.messages.show('error', what, [error.message], 'export'),
    );
    this.tables = new PageTables(byId('tables'), (id) =>
      id === 'table-map' ? (this.designMap.currentData()?.title ?? []) : [],
    );
    this.designMap.onPick((i, j) => this.mapPick.pick(i, j));
    this.mapRide.mount();
    byId('undo-pick').addEventListener('click', () => this.mapPick.undo());
    this.wireFigureActions();
    wirePageActions(this);
    wireReport(this);
    wireTabs((tab) => this.setView({ tab }));
    this.apply(this.state, { replaceUrl: true });
    window.addEventListener('hashchange', () => this.store.onHashChange());
    window.addEventListener('storage', (event) => {
      if (this.store.autosave.isOtherTabSave(event)) this.store.otherTabSaved();
      this.store.refreshKeptButton();
    });
    this.store.reportStartupKept();
    // Inspection for the browser tests and the curious: what each plot shows, the state, the last ride
    // and comparison. The browser tests' build (vite build --mode e2e) adds hooks that crash or hang a
    // sweep or task worker as a real fault would; the production build leaves them out.
    const inspect: Record<string, unknown> = {
      plot: (name: PlotName) => this.plotSpec(name),
      state: () => structuredClone(this.state),
      ride: () => structuredClone(this.roadGlue.lastResult()?.document ?? null),
      comparison: () => structuredClone(this.dataGlue.lastReport() ?? null),
      study: () => structuredClone(this.studyGlue.lastDocument()),
    };
    if (import.meta.env.MODE === 'e2e') Object.assign(inspect, workerTestHooks());
    (window as unknown as { coversweep: unknown }).coversweep = inspect;
  }

  // State ------------------------------------------------------------------------------------

  withDataText(state: AppState): Promise<AppState> {
    return this.dataGlue.withText(state);
  }

  /** Make `next` the state: autosave, URL, controls, then recompute (at once for a settled edit, else
   * after a pause, so a drag computes the state it ends on) or redraw. */
  apply(next: AppState, opts: { replaceUrl: boolean; settled?: boolean } = { replaceUrl: true }): void {
    const onlyData = onlyDataChanged(this.state, next);
    this.state = next;
    this.store.save(next, opts.replaceUrl);
    if (onlyData) {
      this.dataGlue.showData(next); // the imported data: kept, nothing to redraw
      return;
    }
    this.controls.refresh(next);
    byId('clear-baseline').hidden = next.baseline === null;
    renderBaselineList(byId('baseline-list'), next, (s) => this.apply(s));
    this.showTab(next.view.tab, false);
    this.view3dGlue.applyLayers(next);
    this.roadGlue.showInputs(next);
    this.studyGlue.showInputs(next);
    this.dataGlue.showCalibrationBadge(next.calibration ?? null);
    this.dataGlue.showData(next);
    const caseKey = JSON.stringify(next.case);
    if (caseKey !== this.lastCaseKey) {
      if (this.lastCaseKey !== '') this.dataGlue.designChanged();
      this.lastCaseKey = caseKey;
    }
    if (this.computer.needed(next)) this.computer.schedule(opts.settled ? 0 : 150);
    else this.renderAll();
    if (next.view.tab === 'road') this.roadGlue.schedule(200);
  }

  private onEdit(field: Field, value: FieldValue, settled: boolean): readonly string[] | null {
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
      this.apply({ ...this.state, case: r.value }, { replaceUrl: true, settled });
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
      this.apply({ ...this.state, view: r.value }, { replaceUrl: true, settled });
    }
    return null;
  }

  setView(patch: Partial<ViewState>): void {
    const r = validateView({ ...this.state.view, ...patch });
    if (r.ok) this.apply({ ...this.state, view: r.value });
  }

  // -------------------------------------------------------------------------------------------
  // Views: each reads the state and the results' cubes (src/ui/views)

  /** A run's plots and map are drawn: the 3D view (a large module and a WebGL context) starts or redraws. */
  firstNumbersShown(): void {
    this.view3dGlue.firstNumbersShown();
  }

  renderAll(opts: RenderOptions = {}): void {
    const r = this.results;
    if (!r?.current) return;
    const ctx = presentOf(this.state, r);
    if (opts.mapOnly) {
      // The map landed on results whose headline, plots and other tables are drawn: the map's parts only.
      this.mapRide.update(this.state);
      renderMap(this.designMap, ctx, r);
      this.tables?.renderMap(ctx, r);
      return;
    }
    renderFlags(this.messages, r);
    renderHeadline(byId('headline'), ctx, r);
    if (opts.headlineOnly) return;
    const yawNotes = renderYawPlots(this.plots, ctx, r, this.dataGlue.overlaySource());
    renderCoverPlot(this.plots.dragCover, ctx, r);
    if (!opts.light) {
      this.mapRide.update(this.state);
      renderMap(this.designMap, ctx, r);
      this.tables?.render(ctx, r);
    }
    const notes = [...r.studies.notes, ...yawNotes];
    if (this.state.case.conditions.airspeed_mps.length > 1) {
      notes.push(
        `This design lists ${this.state.case.conditions.airspeed_mps.length} airspeeds; the plots show the first, the “current design” table lists all.`,
      );
    }
    byId('plot-notes').textContent = notes.join(' ');
  }

  // -------------------------------------------------------------------------------------------
  // Buttons, files, tabs

  private wireFigureActions(): void {
    const plot = (p: LinePlot) => (caption: string[]) => {
      const spec = p.currentSpec();
      return spec ? plotSvg(spec, caption) : null;
    };
    wireFigureActions(
      [
        { id: 'fig-drag-yaw', svg: plot(this.plots.dragYaw), tableId: 'table-family' },
        { id: 'fig-side-yaw', svg: plot(this.plots.sideYaw), tableId: 'table-family' },
        { id: 'fig-drag-cover', svg: plot(this.plots.dragCover), tableId: 'table-cover' },
        { id: 'fig-handling', svg: plot(this.plots.handling), tableId: 'table-current' },
        {
          id: 'fig-map',
          svg: (caption) => {
            const d = this.designMap.currentData();
            return d ? mapSvg(d, caption) : null;
          },
          tableId: 'table-map',
        },
        {
          id: 'fig-3d',
          png: async (caption) => pngWithCaption(await this.view3dGlue.toPngBlob(1800), caption),
          tableId: null,
          // The view's note without its on-screen hint.
          extra: () => [(byId('view3d-note').textContent ?? '').replace(/;?\s*drag to orbit\.?/, '.')],
        },
      ],
      this,
    );
  }

  private showTab(tab: TabId, focus: boolean): void {
    showTabPanel(tab, focus);
    if (tab === 'map') this.view3dGlue.shown();
    if (tab === 'data') void this.dataGlue.panel().then((panel) => panel.shown());
    if (tab === 'road') void this.roadGlue.panel();
    if (tab === 'study') void this.studyGlue.panel();
    if (tab === 'help') void this.validationPanel().then((panel) => panel.shown());
  }

  // The printable report's host (src/ui/report).
  reportPlotSpec(name: ReportPlotName) {
    return this.plots[name].currentSpec();
  }

  lastRide() {
    return this.roadGlue.lastResult();
  }

  validationReport() {
    return this.validationPanel().then((panel) => panel.report());
  }

  computePhase() {
    const phase = document.body.dataset.state;
    if (phase === 'computing') return 'computing' as const;
    return phase === 'done' && !this.computer.needed(this.state)
      ? ('ready' as const)
      : ('incomplete' as const);
  }

  // The design study's host: the ride, and a chosen design made current through the map's pick path.
  rideFor(s: AppState) {
    return this.roadGlue.rideFor(s);
  }

  chooseDesign(...args: Parameters<MapPick['choose']>): void {
    this.mapPick.choose(...args);
  }

  undoChoice(): void {
    this.mapPick.undo();
  }

  cancelCompute(): void {
    // computeStages sees the abort as a cancel (it is still the current run).
    this.computer.cancel();
  }

  showKept(): void {
    this.store.showKept();
  }

  pinBaseline(): void {
    const pinned = pinCurrent(this.state);
    if (pinned.ok) this.apply(pinned.state);
    this.messages.show(pinned.ok ? 'info' : 'warning', pinned.message, [], 'baseline');
  }
}
