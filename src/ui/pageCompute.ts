/**
 * The page's computing: for each state, its studies (pageStudies) run on the worker pool in three
 * stages, cancellable and superseded by any newer state: the current design first without its
 * grid-convergence lattices (so its numbers show at once), then the family, the cover sweep, the
 * baseline and the current design with its uncertainty in one run, then the design map. Each stage's
 * results land in PageResults as named-axis cubes and the host redraws: the first numbers' headline at
 * once, their plots after the next frame. Performance marks (`coversweep:*`) time the first load for the
 * page bench.
 */
import { caseAirDensity } from '../compute/caseFile';
import type { SweepProgress } from '../compute/engine/runCases';
import type { WorkerPool } from '../compute/engine/workerPool';
import { inputKey } from '../compute/study/inputKey';
import { OutcomeCache } from '../compute/study/outcomeCache';
import { type PageStudies, pageStudies } from '../compute/study/pageStudies';
import { type RunStudiesOptions, runStudies, type StudiesOutcome } from '../compute/study/runStudies';
import { isUnplanned, type StudyPlan } from '../compute/study/studyPlan';
import type { AppState } from './appState';
import { scriptStartMs, workersReadyMs } from './earlyPool';
import type { Messages } from './messages';
import { computeKey, otherBaselineCurves } from './pageComputeKey';
import type { OtherBaseline, PageResults } from './views/pageResults';
import { byId } from './views/present';

type Phase = 'computing' | 'done' | 'error';

/** What the kept solved designs may hold: about 20 states of the default page's studies. */
const SOLVED_BUDGET_BYTES = 8e6;

/** light: the headline and the plots only (not the map and tables); headlineOnly: the headline only;
 * mapOnly: the design map and its table only (the rest is drawn from the same results). */
export interface RenderOptions {
  light?: boolean;
  headlineOnly?: boolean;
  mapOnly?: boolean;
}

/** What the computing needs of the page. */
export interface ComputeHost {
  readonly state: AppState;
  readonly messages: Messages;
  /** The results on screen; each stage replaces them. */
  results: PageResults | null;
  renderAll(opts?: RenderOptions): void;
  /** A run's plots and map are drawn (or it was cancelled): the 3D view starts, or draws the new design. */
  firstNumbersShown(): void;
}

export class PageCompute {
  private timer: ReturnType<typeof setTimeout> | null = null;
  private abort: AbortController | null = null;
  private poolIdle: Promise<void> = Promise.resolve();
  private firstResultMs: number | null = null;
  /** The computeKey of the state computed (or being computed) last. */
  lastComputeKey = '';
  /** Designs solved by earlier runs, by their exact input: an edit re-solves only what it changed. */
  private readonly solved = new OutcomeCache(SOLVED_BUDGET_BYTES);
  /** Whether the 3D view waits to draw this run's design (at the end of the run, or its cancel). */
  private threeDPending = false;
  /** A redraw asked for while a stage runs (drawn at the next task unless the stage's end draws first). */
  private soon: ReturnType<typeof setTimeout> | null = null;
  /** Whether that redraw is light (the headline and plots: the first numbers' plots) or everything. */
  private soonLight = false;

  constructor(
    private readonly pool: WorkerPool,
    private readonly host: ComputeHost,
  ) {}

  /** Whether `state` needs a new computation (else a redraw will do). */
  needed(state: AppState): boolean {
    return computeKey(state) !== this.lastComputeKey;
  }

  /** Stop the run in progress (its finished stages stay on screen). */
  cancel(): void {
    this.abort?.abort();
  }

  /** Compute the current state now (the page's start). */
  startNow(): void {
    this.lastComputeKey = computeKey(this.host.state);
    this.setPhase('computing');
    void this.compute();
  }

  setPhase(phase: Phase): void {
    document.body.dataset.state = phase;
  }

  /** Compute the current state after `delayMs` (0: at once; edits in between restart the wait). */
  schedule(delayMs: number): void {
    if (this.timer) clearTimeout(this.timer);
    this.lastComputeKey = computeKey(this.host.state);
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
   * runStudies on the pool, one run at a time: WorkerPool.run is not re-entrant (a cancelled run
   * terminates its busy workers, which a second run may already be waiting on), so each run waits
   * for the previous one, which ends promptly once its signal is aborted.
   */
  private run(plans: readonly StudyPlan[], options: RunStudiesOptions): Promise<StudiesOutcome> {
    const previous = this.poolIdle;
    const run = previous.then(() => runStudies(this.pool, plans, { ...options, cache: this.solved }));
    this.poolIdle = run.then(
      () => undefined,
      () => undefined,
    );
    return run;
  }

  /** Compute the current state now. */
  async compute(): Promise<void> {
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
    const state = this.host.state;
    let studies: PageStudies;
    let others: OtherBaseline[];
    try {
      studies = pageStudies(state.case, state.view, state.baseline);
      others = otherBaselineCurves(state);
    } catch (error) {
      this.fail(`The design could not be prepared for the model: ${(error as Error).message}`);
      return;
    }
    const r: PageResults = {
      studies,
      current: null,
      family: null,
      cover: null,
      map: null,
      baseline: studies.baseline ? { curve: null, cover: null, map: null } : null,
      otherBaselines: others,
      rhoKgPerM3: caseAirDensity(state.case),
    };
    const superseded = () => this.abort !== ac;
    byId('cancel').hidden = false;
    this.status('Solving the current design…');
    this.stage('current');
    const started = performance.now();
    performance.mark('coversweep:compute');

    // The studies of stage 2 (below), planned now: when all but the current design are kept from an
    // earlier run, the current design's grid-convergence solve joins stage 1 on the other worker.
    const b = studies.baseline;
    const plans: StudyPlan[] = [studies.family, studies.cover];
    if (b) plans.push(b.curve, b.cover, b.map);
    const firstOther = plans.length;
    plans.push(...others.map((o) => o.plan));
    const early = studies.quick !== null && plans.every((p) => this.allKept(p));
    if (studies.quick) plans.push(studies.current);
    const gciStudy = studies.quick ? plans.length - 1 : -1;

    // 1. The current design, exactly as its case file says, but first without the grid-convergence
    //    lattices (the same values, about half the cost): its numbers show as soon as they land; the
    //    uncertainty estimate follows (with stage 2, or beside this one when the rest is kept).
    let t1 = Number.NaN;
    const s1 = await this.run(
      early ? [studies.quick!, studies.current] : [studies.quick ?? studies.current],
      {
        signal: ac.signal,
        onCase: (landed) => {
          if (landed.study !== 0 || !landed.cube || superseded()) return;
          r.current = landed.cube;
          t1 = this.showFirst(r);
        },
      },
    );
    if (superseded()) return;
    if (s1.cancelled) return this.cancelled(r);
    const first = s1.results[0]!;
    if (first.errors[0] !== null || first.landed[0] !== 1) {
      this.fail(`The model could not solve this design: ${first.errors[0] ?? 'unknown error'}`);
      return;
    }

    // 2. The current design with its grid-convergence estimate, the family, drag vs cover and the
    //    baseline, in one run (cases of one surface share their factorisation).
    this.stage('sweeps');
    const s2 = await this.run(plans, {
      signal: ac.signal,
      onProgress: (p) => this.status(`Cover-fraction sweeps: ${p.casesDone}/${p.casesTotal} cases`, p),
      onCase: (landed) => {
        if (landed.study === gciStudy && landed.cube && !superseded()) {
          r.current = landed.cube;
          this.renderSoon();
        }
      },
    });
    if (superseded()) return;
    const t2 = performance.now();
    const [family, cover, ...rest] = s2.results;
    r.family = family!;
    r.cover = cover!;
    if (r.baseline) {
      r.baseline.curve = rest[0]!;
      r.baseline.cover = rest[1]!;
      r.baseline.map = rest[2]!;
    }
    others.forEach((o, k) => {
      o.curve = s2.results[firstOther + k]!;
    });
    const gci = gciStudy >= 0 ? s2.results[gciStudy]! : null;
    if (gci?.cube && gci.landed[0] === 1 && gci.errors[0] === null) r.current = gci.cube;
    if (s2.cancelled) return this.cancelled(r);

    // 3. The design map (the longer sweep), posted to the workers before the plots are drawn, so that
    //    they solve it while this thread draws. The plots are drawn now unless the map is kept from an
    //    earlier run: then the map stage draws everything at once.
    this.stage('map');
    const drawPlots = !this.allKept(studies.map);
    const mapRun = this.run([studies.map], {
      signal: ac.signal,
      onProgress: (p) => {
        const left = Number.isFinite(p.remainingMs)
          ? `, about ${(p.remainingMs / 1000).toFixed(1)} s left`
          : '';
        this.status(`Design map: ${p.casesDone}/${p.casesTotal} designs${left}`, p);
      },
    });
    if (drawPlots) {
      // The run's first jobs are posted by promise callbacks: a task later they are with the workers.
      await new Promise((resolve) => setTimeout(resolve, 0));
      if (superseded()) return;
      this.renderNow();
    }
    performance.mark('coversweep:plots');
    const s3 = await mapRun;
    if (superseded()) return;
    r.map = s3.results[0]!;
    if (drawPlots) this.host.renderAll({ mapOnly: true });
    else this.renderNow();
    performance.mark('coversweep:map');
    if (s3.cancelled) return this.cancelled(r);
    const failed = s2.failedCount + s3.failedCount;
    if (failed > 0) {
      const first = [...s2.results, ...s3.results].flatMap((x) => x.errors).find((e) => e !== null) ?? '';
      this.host.messages.show(
        'warning',
        `${failed} swept design(s) could not be solved and are left blank.`,
        [first],
        'sweep',
      );
    } else {
      this.host.messages.clear('sweep');
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
    this.redraw3d();
  }

  /** The first numbers of a run: the headline and the plots now; the tables and the map follow. */
  private showFirst(r: PageResults): number {
    this.host.results = r;
    const t1 = performance.now();
    if (this.firstResultMs === null) performance.mark('coversweep:first-solved');
    this.host.messages.clear('model');
    // The headline now, the plots after the next frame: the browser paints the headline figures before
    // the plots are built (their first drawing, with its layout, took 100-180 ms of this thread on this
    // machine, and a task queued at once runs before the frame).
    this.host.renderAll({ headlineOnly: true });
    this.renderSoon(true, true);
    if (this.firstResultMs === null) {
      // On screen: the headline's figures are drawn (the browser paints them at the next frame).
      this.firstResultMs = performance.now();
      document.body.dataset.firstResultMs = this.firstResultMs.toFixed(0);
      performance.mark('coversweep:headline');
    }
    // The 3D view (its module, a WebGL context, its own solve and frames of 100-200 ms on a software
    // renderer, all competing with the sweeps on a small machine) is drawn once the plots and the map
    // are: measured on 2 cores, every plot and the map are drawn in half the time.
    this.threeDPending = true;
    return t1;
  }

  /**
   * Redraw at the next task (`afterFrame`: once the next frame is painted; at most 100 ms later where no
   * frame comes, as in a hidden tab): light (headline and plots) only if every request since was light.
   */
  private renderSoon(light = false, afterFrame = false): void {
    this.soonLight = this.soon ? this.soonLight && light : light;
    if (this.soon) return;
    const draw = () => {
      if (this.soon !== timer) return;
      this.soon = null;
      this.host.renderAll({ light: this.soonLight });
    };
    const timer = setTimeout(draw, afterFrame ? 100 : 0);
    this.soon = timer;
    if (afterFrame) requestAnimationFrame(() => setTimeout(draw, 0));
  }

  private renderNow(): void {
    if (this.soon) clearTimeout(this.soon);
    this.soon = null; // a frame's pending draw of it sees that and does nothing
    this.host.renderAll();
  }

  /** Whether every case of `plan` is kept from an earlier run (so it lands without a solve). */
  private allKept(plan: StudyPlan): boolean {
    return plan.inputs.every((input) => !isUnplanned(input) && this.solved.has(inputKey(input)));
  }

  /** Redraw the 3D view if this run's numbers are not in it yet. */
  private redraw3d(): void {
    if (!this.threeDPending) return;
    this.threeDPending = false;
    this.host.firstNumbersShown();
  }

  private stage(name: 'current' | 'sweeps' | 'map' | 'done'): void {
    document.body.dataset.stage = name;
  }

  private cancelled(r: PageResults): void {
    this.host.results = r.current ? r : this.host.results;
    this.renderNow();
    this.status('Cancelled: the sweeps are incomplete. Change any control to compute again.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.lastComputeKey = '';
    this.setPhase('done');
    this.redraw3d();
  }

  private fail(message: string): void {
    this.host.messages.show('error', message, [], 'model');
    this.status('Stopped: see the message above.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.setPhase('error');
  }
}
