/**
 * The page's computing: for each state, its studies (pageStudies) run on the worker pool in one run of
 * four stages, dealt in order (runStudies' stages), cancellable and superseded by any newer state: the
 * current design first without its grid-convergence lattices (so its numbers show at once), then with
 * them (its uncertainty), then the family, the cover sweep and the baselines, then the design map. Each
 * stage's results land in PageResults as named-axis cubes and the host redraws: the first numbers'
 * headline at once, their plots after the next frame, the plots with the sweeps while the workers solve
 * the map, and the map alone when it lands. Performance marks (`coversweep:*`) time the stages for the
 * page bench and bench/pageTrace.ts.
 */
import { caseAirDensity } from '../compute/caseFile';
import type { WorkerPool } from '../compute/engine/workerPool';
import { inputKey } from '../compute/study/inputKey';
import { OutcomeCache } from '../compute/study/outcomeCache';
import { type PageStudies, pageStudies } from '../compute/study/pageStudies';
import {
  type RunStudiesOptions,
  runStudies,
  type StudiesOutcome,
  type StudyResult,
} from '../compute/study/runStudies';
import { isUnplanned, type StudyPlan } from '../compute/study/studyPlan';
import { AfterRest } from './afterRest';
import type { AppState } from './appState';
import { scriptStartMs, workersReadyMs } from './earlyPool';
import type { Messages } from './messages';
import { computeKey, otherBaselineCurves } from './pageComputeKey';
import { type Progress, showProgress, showStatus } from './pageStatus';
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
  /** The 3D view's redraws, after the inputs rest 250 ms: longer than the gap between a slider's or a
   * keyboard's edits, short beside the view's own drawing; its start-up at once (redraw3d). */
  private readonly threeD = new AfterRest(250, true);
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
    this.threeD.disarm();
    this.lastComputeKey = computeKey(this.host.state);
    this.setPhase('computing');
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.compute();
    }, delayMs);
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
    this.threeD.disarm();
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
    showStatus('Solving the current design…');
    this.stage('current');
    const started = performance.now();
    performance.mark('coversweep:compute');

    // One run deals every study's jobs, stage by stage: 0. the current design exactly as its case file
    // says but without the grid-convergence lattices (the same values, about half the cost), shown as
    // soon as it lands; 1. the current design with them (its uncertainty); 2. the family, drag vs cover
    // and the baselines (cases of one surface share their factorisation); 3. the design map. A worker
    // done with one stage's jobs takes the next stage's, so neither waits for the other's last job, and
    // the map is solved while this thread draws the plots.
    const b = studies.baseline;
    const sweeps: StudyPlan[] = [studies.family, studies.cover];
    if (b) sweeps.push(b.curve, b.cover, b.map);
    sweeps.push(...others.map((o) => o.plan));
    const plans = [studies.quick ?? studies.current, ...(studies.quick ? [studies.current] : [])];
    const gciStudy = studies.quick ? 1 : -1;
    const firstSweep = plans.length;
    plans.push(...sweeps, studies.map);
    const mapStudy = plans.length - 1;
    const stages = plans.map((_, k) => (k === 0 ? 0 : k === gciStudy ? 1 : k === mapStudy ? 3 : 2));
    const settle: Array<[() => void, (error: unknown) => void]> = [];
    const stageDone = [0, 1, 2, 3].map((k) => {
      const p = new Promise<void>((resolve, reject) => {
        settle[k] = [resolve, reject];
      });
      p.catch(() => undefined); // a stage not waited for must not be an unhandled rejection
      return p;
    });
    // Drawn when the sweeps land unless the map is kept from an earlier run: then all at once with it.
    const drawPlots = !this.allKept(studies.map);
    const progress: Progress = { phase: 'current', sweeps: 0, map: 0 };
    let results: StudyResult[] = [];
    let t1 = Number.NaN;
    const takeSweeps = (sofar: StudyResult[]) => {
      const [family, cover, ...rest] = sofar.slice(firstSweep);
      r.family = family!;
      r.cover = cover!;
      if (r.baseline) {
        r.baseline.curve = rest[0]!;
        r.baseline.cover = rest[1]!;
        r.baseline.map = rest[2]!;
      }
      others.forEach((o, k) => {
        o.curve = sofar[firstSweep + (b ? 5 : 2) + k]!;
      });
    };
    const whole = this.run(plans, {
      signal: ac.signal,
      stages,
      onStageDone: (k, sofar) => {
        results = sofar;
        // The sweeps on screen as soon as they are in (at once when kept: the first plots show them).
        if (k === 2 && !superseded()) takeSweeps(sofar);
        settle[k]![0]();
      },
      onProgress: (p) => showProgress(progress, sweeps, studies.map, p),
      onCase: (c) => {
        if (c.study >= firstSweep) progress[c.study === mapStudy ? 'map' : 'sweeps']++;
        if (!c.cube || superseded()) return;
        if (c.study === 0) {
          r.current = c.cube;
          t1 = this.showFirst(r);
        } else if (c.study === gciStudy && r.current) {
          r.current = c.cube;
          this.renderSoon();
        }
      },
    });
    // The run's end (a cancel, or an error it throws) ends every stage's wait.
    whole.then(
      () => {
        for (const [resolve] of settle) resolve();
      },
      (error: unknown) => {
        for (const [, reject] of settle) reject(error);
      },
    );
    // A cancel (the button) ends the run: what landed stays on screen.
    const cancelled = async () => {
      const out = await whole;
      if (superseded()) return;
      if (r.current) {
        takeSweeps(out.results);
        r.map = out.results[mapStudy]!;
      }
      this.cancelled(r);
    };

    await stageDone[0];
    if (superseded()) return;
    if (ac.signal.aborted) return cancelled();
    const first = results[0]!;
    if (first.errors[0] !== null || first.landed[0] !== 1) {
      ac.abort();
      this.fail(`The model could not solve this design: ${first.errors[0] ?? 'unknown error'}`);
      return;
    }
    progress.phase = 'sweeps';
    this.stage('sweeps');
    // (Without grid convergence there is no stage 1.)
    await Promise.all([stages.includes(1) ? stageDone[1] : null, stageDone[2]]);
    if (superseded()) return;
    const t2 = performance.now();
    const gci = gciStudy >= 0 ? results[gciStudy]! : null;
    if (gci?.cube && gci.landed[0] === 1 && gci.errors[0] === null) r.current = gci.cube;
    if (ac.signal.aborted) return cancelled();

    // The plots now (the workers are on the map's jobs), unless the map is kept: then with the map.
    progress.phase = 'map';
    this.stage('map');
    if (drawPlots) this.renderNow();
    performance.mark('coversweep:plots');
    const out = await whole;
    if (superseded()) return;
    r.map = out.results[mapStudy]!;
    if (drawPlots) this.host.renderAll({ mapOnly: true });
    else this.renderNow();
    performance.mark('coversweep:map');
    if (out.cancelled) return this.cancelled(r);
    if (out.failedCount > 0) {
      const error = out.results.flatMap((x) => x.errors).find((e) => e !== null) ?? '';
      this.host.messages.show(
        'warning',
        `${out.failedCount} swept design(s) could not be solved and are left blank.`,
        [error],
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
    showStatus(`Done in ${seconds} s on ${this.pool.size} worker${this.pool.size > 1 ? 's' : ''}.`);
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

  /** Redraw the 3D view if this run's numbers are not in it yet, once the inputs have rested (AfterRest:
   * an edit first starts its run, and the view waits for that run's end). */
  private redraw3d(): void {
    if (!this.threeDPending) return;
    this.threeD.arm(() => {
      if (!this.threeDPending || this.abort !== null || this.timer !== null) return;
      this.threeDPending = false;
      this.host.firstNumbersShown();
    });
  }

  private stage(name: 'current' | 'sweeps' | 'map' | 'done'): void {
    document.body.dataset.stage = name;
  }

  private cancelled(r: PageResults): void {
    this.host.results = r.current ? r : this.host.results;
    this.renderNow();
    showStatus('Cancelled: the sweeps are incomplete. Change any control to compute again.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.lastComputeKey = '';
    this.setPhase('done');
    this.redraw3d();
  }

  private fail(message: string): void {
    this.host.messages.show('error', message, [], 'model');
    showStatus('Stopped: see the message above.');
    byId('cancel').hidden = true;
    this.abort = null;
    this.setPhase('error');
  }
}
