/**
 * The "Design study" tab: on the left the study's inputs (search, design space, objective, handling
 * limits with the caution beside them, lattice), on the right the run controls, the current design, and
 * once a study has run its optimum card, trade-off front and designs table. The panel only shows and
 * reads; src/ui/studyGlue.ts runs the study and makes a chosen design current.
 */
import { OBJECTIVES, type StudyDocument } from '../../compute/design/index';
import type { RideFile } from '../../compute/ride/index';
import { button, el } from '../dom';
import { designTable } from './designTable';
import { type ExtraVariablesForm, extraVariablesForm } from './extraVariablesForm';
import { type ObjectivePicker, objectivePicker } from './objectivePicker';
import { optimumSummary } from './optimumSummary';
import { studyCautions } from './studyCautions';
import { LIMIT_IDS, type StudyInputs } from './studyState';
import { type TradeOffPlot, tradeOffPlot } from './tradeOffPlot';

export interface StudyPanelActions {
  /** An input changed: the inputs as read from the form (not yet checked by the study file's rules). */
  change(candidate: StudyInputs): void;
  run(): void;
  cancel(): void;
  undo(): void;
  saveStudy(): void;
  /** A design of the result (its index) chosen in the table, the plot or the optimum card. */
  select(index: number): void;
}

interface NumberInput {
  /** Key path in the inputs, e.g. "coverFraction.min", "limits.steering_gust_Nm". */
  key: string;
  input: HTMLInputElement;
  error: HTMLElement;
}

function numberField(key: string, label: string, unit: string, step: string, fields: NumberInput[]) {
  const id = `study-${key.replace(/[^\w]+/g, '-')}`;
  const input = el('input', { attrs: { id, type: 'number', step, inputmode: 'decimal', name: key } });
  const error = el('div', { className: 'field-error', attrs: { id: `${id}-error`, 'aria-live': 'polite' } });
  input.setAttribute('aria-describedby', error.id);
  fields.push({ key, input, error });
  return el('div', { className: 'field' }, [
    el('label', { text: label, attrs: { for: id } }),
    el('div', { className: 'input' }, [input, el('span', { className: 'unit', text: unit })]),
    error,
  ]);
}

const getPath = (o: StudyInputs, key: string): number | undefined =>
  key.split('.').reduce<unknown>((x, k) => (x as Record<string, unknown> | undefined)?.[k], o) as
    | number
    | undefined;

export class StudyPanel {
  private readonly fields: NumberInput[] = [];
  private readonly extra: ExtraVariablesForm = extraVariablesForm();
  private readonly method: HTMLSelectElement;
  private picker: ObjectivePicker;
  private readonly pickerSlot: HTMLElement;
  private readonly formErrors: HTMLElement;
  private readonly status: HTMLElement;
  private readonly progress: HTMLProgressElement;
  private readonly runButton: HTMLButtonElement;
  private readonly cancelButton: HTMLButtonElement;
  private readonly current: HTMLElement;
  private readonly rideLine: HTMLElement;
  private readonly results: HTMLElement;
  private plot: TradeOffPlot | null = null;
  private table: ReturnType<typeof designTable> | null = null;
  private inputs: StudyInputs | null = null;
  private objectiveIds = '';

  constructor(
    host: HTMLElement,
    private readonly actions: StudyPanelActions,
  ) {
    host.replaceChildren();
    const f = this.fields;
    this.method = el('select', { attrs: { id: 'study-method', name: 'method' } }, [
      el('option', { text: 'Grid: every design', attrs: { value: 'grid' } }),
      el('option', { text: 'Optimiser (Nelder-Mead)', attrs: { value: 'nelder-mead' } }),
    ]);
    this.pickerSlot = el('div', { className: 'field study-objective' });
    this.picker = this.makePicker([], 'time_s');
    this.formErrors = el('div', { className: 'field-error form-errors', attrs: { 'aria-live': 'polite' } });
    const form = el(
      'form',
      { className: 'road-form study-form', attrs: { id: 'study-form', novalidate: '' } },
      [
        this.formErrors,
        el('fieldset', {}, [
          el('legend', { text: 'Design space' }),
          el('div', { className: 'field' }, [
            el('label', { text: 'Search', attrs: { for: 'study-method' } }),
            el('div', { className: 'input' }, [this.method]),
          ]),
          numberField('coverFraction.min', 'Cover fraction from', '0–1', '0.05', f),
          numberField('coverFraction.max', 'Cover fraction to', '0–1', '0.05', f),
          numberField('coverFraction.points', 'Cover fraction values', 'points', '1', f),
          numberField('rimDepthMm.min', 'Rim depth from', 'mm', '5', f),
          numberField('rimDepthMm.max', 'Rim depth to', 'mm', '5', f),
          numberField('rimDepthMm.points', 'Rim depth values', 'points', '1', f),
        ]),
        this.extra.element,
        el('fieldset', {}, [el('legend', { text: 'Objective (minimised)' }), this.pickerSlot]),
        el('fieldset', { className: 'study-limits' }, [
          el('legend', { text: 'Handling limits in the design gust' }),
          el('p', {
            className: 'small',
            text: 'Blank: no limit. There are no defaults: no published or trade figure supporting one was found, so these are yours to state.',
          }),
          numberField('limits.steering_gust_Nm', 'Largest steering moment', 'N m', '0.1', f),
          numberField('limits.lean_gust_deg', 'Largest lean', 'deg', '0.5', f),
          numberField('limits.side_gust_N', 'Largest side force', 'N', '1', f),
          studyCautions(),
        ]),
        el('fieldset', {}, [
          el('legend', { text: 'Lattice of the evaluations' }),
          numberField('lattice.span', 'Panels along the radius', 'count', '1', f),
          numberField('lattice.chord', 'Panels around', 'count', '1', f),
        ]),
      ],
    );
    form.addEventListener('submit', (e) => e.preventDefault());
    form.addEventListener('change', () => this.changed());
    this.runButton = button('Run study', () => actions.run(), { id: 'study-run' });
    this.cancelButton = button('Cancel', () => actions.cancel(), { id: 'study-cancel' });
    this.cancelButton.hidden = true;
    const undo = button('Undo design choice', () => actions.undo(), {
      id: 'study-undo',
      class: 'undo-pick',
    });
    undo.hidden = true;
    const save = button('Save study file', () => actions.saveStudy(), {
      id: 'study-save',
      title:
        'These inputs and the ride as a study file: coversweep optimise study.json computes the same study',
    });
    this.progress = el('progress', { attrs: { max: '1', value: '0', id: 'study-progress' } });
    this.progress.hidden = true;
    this.status = el('p', { className: 'road-status', attrs: { id: 'study-status', 'aria-live': 'polite' } });
    this.current = el('p', { className: 'study-current', attrs: { id: 'study-current' } });
    this.rideLine = el('p', { className: 'small road-context', attrs: { id: 'study-ride' } });
    this.results = el('div', { className: 'study-results', attrs: { id: 'study-results' } });
    host.append(
      el('h2', { text: 'Design study: which cover fraction and rim depth for this ride?' }),
      this.rideLine,
      el('div', { className: 'road-layout' }, [
        form,
        el('div', {}, [
          el('div', { className: 'button-row' }, [
            this.runButton,
            this.cancelButton,
            undo,
            save,
            this.progress,
          ]),
          this.status,
          this.current,
          this.results,
        ]),
      ]),
    );
  }

  private makePicker(objectives: typeof OBJECTIVES, selected: string): ObjectivePicker {
    const picker = objectivePicker('Objective', objectives, selected, () => this.changed());
    this.pickerSlot.replaceChildren(picker.element);
    return picker;
  }

  /** The form's inputs (numbers as typed; a blank limit is no limit). */
  private read(): StudyInputs {
    const base = structuredClone(this.inputs!);
    base.method = this.method.value as StudyInputs['method'];
    base.objective = this.pickerSlot.querySelector('select')?.value ?? base.objective;
    base.limits = {};
    for (const { key, input } of this.fields) {
      const [group, name] = key.split('.') as [string, string];
      const text = input.value.trim();
      if (group === 'limits') {
        if (text !== '') base.limits[name as (typeof LIMIT_IDS)[number]] = Number(text);
        continue;
      }
      (base as unknown as Record<string, Record<string, number>>)[group]![name] =
        text === '' ? Number.NaN : Number(text);
    }
    this.extra.read(base);
    return base;
  }

  private changed(): void {
    if (this.inputs) this.actions.change(this.read());
  }

  /** Show inputs (refreshing the form) and the objectives that apply to the ride. */
  setInputs(inputs: StudyInputs, ride: RideFile | null): void {
    this.inputs = inputs;
    this.method.value = inputs.method;
    for (const { key, input } of this.fields) {
      const v = getPath(inputs, key);
      input.value = v === undefined || Number.isNaN(v) ? '' : String(v);
    }
    this.extra.set(inputs);
    const applicable = OBJECTIVES.filter((o) => ride === null || o.applies(ride) === null);
    const ids = applicable.map((o) => o.id).join(',');
    if (ids !== this.objectiveIds) {
      this.objectiveIds = ids;
      this.picker = this.makePicker(applicable, inputs.objective);
    } else this.picker.setSelected(inputs.objective);
    for (const id of LIMIT_IDS) {
      const row = this.fields.find((x) => x.key === `limits.${id}`)!.input.closest<HTMLElement>('.field')!;
      row.hidden = !applicable.some((o) => o.id === id);
    }
  }

  /** Messages of the study file's rules: each beside its input where there is one, the rest on top. */
  showErrors(errors: readonly { input: string | null; message: string }[]): void {
    const rest: string[] = [];
    for (const f of this.fields) {
      f.error.textContent = '';
      f.input.removeAttribute('aria-invalid');
    }
    this.extra.clearErrors();
    for (const e of errors) {
      const f = this.fields.find((x) => x.key === e.input);
      if (f) {
        f.error.textContent = f.error.textContent ? `${f.error.textContent} ${e.message}` : e.message;
        f.input.setAttribute('aria-invalid', 'true');
      } else if (e.input === null || !this.extra.showError(e.input, e.message)) rest.push(e.message);
    }
    this.formErrors.replaceChildren(...rest.map((m) => el('div', { text: m })));
  }

  setContext(rideText: string, currentText: string): void {
    this.rideLine.textContent = rideText;
    this.current.textContent = currentText;
  }

  setStatus(state: 'idle' | 'running' | 'done' | 'error' | 'stale', text: string): void {
    this.status.textContent = text;
    this.status.dataset.state = state;
    const running = state === 'running';
    this.runButton.disabled = running;
    this.cancelButton.hidden = !running;
    this.progress.hidden = !running;
    if (!running) this.progress.value = 0;
  }

  setProgress(done: number, budget: number): void {
    this.progress.max = Math.max(1, budget);
    this.progress.value = Math.min(done, budget);
    this.status.textContent = `Evaluating designs on the ride: ${done} of ${budget}…`;
  }

  /** Show a study's result (null: none yet); `selected` is the index of the current design, if evaluated. */
  showResult(doc: StudyDocument | null, selected: number | null): void {
    this.plot?.dispose();
    this.plot = null;
    this.table = null;
    if (doc === null) {
      this.results.replaceChildren();
      return;
    }
    const select = (i: number) => this.actions.select(i);
    // As wide as the column allows (one column on a narrow screen), at most 540 px.
    const width = Math.max(260, Math.min(540, (this.results.clientWidth || 564) - 24));
    this.plot = tradeOffPlot(doc, select, width, 300);
    this.table = designTable(doc, select);
    this.table.setSelected(selected);
    this.results.replaceChildren(
      el('h3', { text: 'Optimum' }),
      optimumSummary(doc, select),
      this.plot.element,
      this.table.element,
    );
  }

  setSelected(index: number | null): void {
    this.table?.setSelected(index);
  }
}
