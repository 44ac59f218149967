/**
 * The "Design study" tab's glue: the study built from the state (its inputs, the ride the road inputs
 * define, the current wheel as the design space's base), checked by the study file's rules, run as a
 * task on the pool's task workers (a TaskChannel: progress, cancel) and shown; a design chosen in the result becomes
 * the current design through the map's pick path (with undo). Only the inputs live in the state: the
 * result is kept here, and marked out of date when the inputs, the ride or the base wheel change.
 */
import type { Parsed } from '../compute/caseFile';
import { designVariable, type StudyDocument, validateStudy } from '../compute/design/index';
import { TaskChannel } from '../compute/engine/taskChannel';
import type { RideFile } from '../compute/ride/index';
import type { AppState } from './appState';
import { designFileStem } from './designFileStem';
import { fmt } from './displayUnits';
import { downloadText } from './download';
import { pool } from './earlyPool';
import type { PageHost } from './pageHost';
import type { StudyPanel } from './study/studyPanel';
import {
  defaultStudyInputs,
  type StudyInputs,
  studyMessageInput,
  studyToRaw,
  validateStudyInputs,
} from './study/studyState';
import { byId } from './views/present';

export interface StudyHost extends PageHost {
  /** The ride the road inputs define for a state. */
  rideFor(s: AppState): Parsed<RideFile>;
  /** Make a design (cover fraction, rim depth in m, and any other freed variables' values by id)
   * current, with undo; `what` names it in messages. */
  chooseDesign(
    fraction: number,
    depthM: number,
    what: string,
    values?: Record<string, number | string>,
  ): void;
  undoChoice(): void;
}

/** What a study's result depends on: the study file's object, less nothing (the ride holds the wheel). */
const keyOf = (raw: unknown) => JSON.stringify(raw);

export class StudyGlue {
  private view: StudyPanel | null = null;
  private loading: Promise<StudyPanel> | null = null;
  private readonly tasks = new TaskChannel(pool);
  private doc: StudyDocument | null = null;
  private docKey = '';
  private running = false;
  private shownInputs = '';

  constructor(private readonly host: StudyHost) {}

  lastDocument(): StudyDocument | null {
    return this.doc;
  }

  /** The panel, built (and its code loaded) when first opened. */
  panel(): Promise<StudyPanel> {
    this.loading ??= import('./study/studyPanel').then(({ StudyPanel }) => {
      this.view = new StudyPanel(byId('panel-study'), {
        change: (c) => this.onChange(c),
        run: () => void this.run(),
        cancel: () => this.cancel(),
        undo: () => this.host.undoChoice(),
        saveStudy: () => this.save(),
        select: (i) => this.select(i),
      });
      this.shownInputs = '';
      this.showInputs(this.host.state);
      return this.view;
    });
    return this.loading;
  }

  private inputsOf(s: AppState): StudyInputs {
    return s.study ?? defaultStudyInputs();
  }

  /** The study file's object for a state, or the messages saying why there is none. */
  private studyRaw(s: AppState): Parsed<Record<string, unknown>> {
    const ride = this.host.rideFor(s);
    if (!ride.ok)
      return {
        ok: false,
        errors: ride.errors.map((e) => `The ride (set in “On the road”) is not valid: ${e}`),
      };
    return { ok: true, value: studyToRaw(this.inputsOf(s), ride.value, s.case.name) };
  }

  /** Show the state's inputs, the ride, the current design and whether the shown result still holds. */
  showInputs(s: AppState): void {
    const v = this.view;
    if (!v) return;
    const inputs = this.inputsOf(s);
    const ride = this.host.rideFor(s);
    const key = JSON.stringify([inputs, ride.ok ? ride.value.position : '']);
    if (key !== this.shownInputs) {
      v.setInputs(inputs, ride.ok ? ride.value : null);
      this.shownInputs = key;
    }
    const w = s.case.wheel;
    const r = ride.ok ? ride.value : null;
    const what = r
      ? `${r.position} wheel, ${r.ride.power_W !== undefined ? `${fmt(r.ride.power_W)} W` : `${fmt((r.ride.speed_mps ?? 0) * 3.6, 3)} km/h`}${r.course ? ` over a course of ${r.course.length} segments` : ` over ${fmt((r.ride.distance_m ?? 0) / 1000, 3)} km`}`
      : 'no valid ride';
    v.setContext(
      `The ride is the one “On the road” defines (${what}); the design space's base is the current wheel, its cover fraction and rim depth varied (and any variable ticked under “More design variables”). Savings are against the ride's baseline.`,
      w.cover.placement === 'explicit'
        ? 'Current design: an explicit cover list (a study sets a cover fraction at the rim instead).'
        : `Current design: cover fraction ${fmt(w.cover.fraction, 3)}, rim depth ${fmt(w.rim_depth_m * 1000, 3)} mm.`,
    );
    v.setSelected(this.currentIndex(s));
    if (!this.running && this.doc) {
      const raw = this.studyRaw(s);
      const stale = !raw.ok || keyOf(this.forKey(raw.value, s.baseline === null)) !== this.docKey;
      v.setStatus(
        stale ? 'stale' : 'done',
        stale
          ? 'The inputs, the ride or the wheel changed since this study ran: run it again to update (the result below is the earlier one).'
          : this.doneText,
      );
    }
  }

  /**
   * The study's key leaves out the varied values of the base wheel (every freed variable set to one
   * placeholder), and of the baseline when it is this wheel without covers (no pinned baseline), so
   * choosing one of its designs keeps the result.
   */
  private forKey(raw: Record<string, unknown>, derivedBaseline: boolean): unknown {
    const ride = raw.ride as RideFile;
    const freed = Object.keys((raw.variables ?? {}) as Record<string, unknown>);
    const strip = (w: RideFile['design']) =>
      freed.reduce((x, id) => {
        const v = designVariable(id);
        if (!v) return x;
        return v.kind === 'continuous' ? v.set(x, 0) : v.set(x, v.choices?.[0] ?? 0);
      }, w);
    return {
      ...raw,
      name: undefined,
      ride: {
        ...ride,
        design: strip(ride.design),
        baseline: derivedBaseline ? strip(ride.baseline) : ride.baseline,
      },
    };
  }

  /** Index of the evaluated design equal to the current design in every freed variable, if any. */
  private currentIndex(s: AppState): number | null {
    const w = s.case.wheel as unknown as RideFile['design'];
    const same = (id: string, value: number | string | null) => {
      const v = designVariable(id);
      const here = v?.get(w);
      return typeof value === 'number' && typeof here === 'number'
        ? Math.abs(value - here) < 1e-9
        : value === here;
    };
    const d = this.doc?.designs.find((x) => Object.entries(x.design).every(([id, value]) => same(id, value)));
    return d?.index ?? null;
  }

  private onChange(candidate: StudyInputs): void {
    const shape = validateStudyInputs(candidate);
    const s = { ...this.host.state, study: candidate };
    const raw = this.studyRaw(s);
    const checked = shape.ok && raw.ok ? validateStudy(raw.value) : null;
    const errors = !shape.ok ? shape.errors : !raw.ok ? raw.errors : checked?.ok ? [] : checked!.errors;
    if (errors.length > 0) {
      this.view?.showErrors(errors.map((m) => ({ input: studyMessageInput(m), message: m })));
      return;
    }
    this.view?.showErrors([]);
    this.host.apply({ ...this.host.state, study: candidate });
  }

  private doneText = '';

  async run(): Promise<void> {
    const view = await this.panel();
    const raw = this.studyRaw(this.host.state);
    const checked = raw.ok ? validateStudy(raw.value) : raw;
    if (!raw.ok || !checked.ok) {
      const errors = checked.ok ? [] : checked.errors;
      view.showErrors(errors.map((m) => ({ input: studyMessageInput(m), message: m })));
      view.setStatus('error', 'This study cannot run: see the messages beside the inputs.');
      return;
    }
    view.showErrors([]);
    this.running = true;
    view.setStatus('running', 'Starting the study in the background…');
    const started = performance.now();
    const out = await this.tasks.run(
      { kind: 'study', raw: raw.value },
      { onProgress: (done, budget) => view.setProgress(done, budget) },
    );
    this.running = false;
    if (out.status === 'superseded') return;
    if (out.status === 'cancelled') {
      view.setStatus(this.doc ? 'stale' : 'idle', 'Cancelled: nothing changed.');
      return;
    }
    if (out.status === 'failed') {
      view.setStatus('error', `The study could not be computed: ${out.error}`);
      return;
    }
    const result = out.value;
    if (!result.ok) {
      view.setStatus('error', `The study could not be computed: ${result.errors.join(' ')}`);
      return;
    }
    const doc = result.document;
    this.doc = doc;
    this.docKey = keyOf(this.forKey(raw.value, this.host.state.baseline === null));
    const seconds = fmt((performance.now() - started) / 1000, 2);
    this.doneText = `Done in ${seconds} s: ${doc.search.evaluations} designs evaluated (${doc.search.method === 'grid' ? 'every grid design' : `${doc.search.nelder_mead_runs} Nelder-Mead runs from the grid`}) on a ${doc.search.lattice_span} x ${doc.search.lattice_chord} lattice. Click a row, a point or “Make it the current design” to try a design; Undo brings back the one it replaced.`;
    view.showResult(doc, this.currentIndex(this.host.state));
    view.setStatus('done', this.doneText);
  }

  cancel(): void {
    this.tasks.cancel();
  }

  private select(index: number): void {
    const d = this.doc?.designs.find((x) => x.index === index);
    if (!d) return;
    this.host.chooseDesign(
      d.design.cover_fraction as number,
      d.design.rim_depth_m as number,
      `Design ${index} of the study`,
      Object.fromEntries(
        Object.entries(d.design).filter((e): e is [string, number | string] => e[1] !== null),
      ),
    );
  }

  private save(): void {
    const s = this.host.state;
    const raw = this.studyRaw(s);
    if (!raw.ok) {
      this.host.messages.show('error', 'The study file cannot be saved:', raw.errors, 'edit');
      return;
    }
    downloadText(
      `${designFileStem(s.case)}.study.json`,
      `${JSON.stringify(raw.value, null, 2)}\n`,
      'application/json',
    );
  }
}
