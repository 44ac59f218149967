/**
 * The Design study tab's "More design variables": besides cover fraction and rim depth (always freed),
 * the user may free the tyre width (a range and its grid values, in mm) and the discrete variables the
 * study file allows (covered sides, cover placement, spoke count, spoke section: the choices every
 * design tries). Each is freed by its checkbox; unchecked, the current wheel's value holds. The values
 * are checked by the study file's rules (validateStudy), whose messages appear beside these inputs.
 */
import { designVariable } from '../../compute/design/index';
import { el } from '../dom';
import type { DISCRETE_INPUTS, StudyInputs, StudyRange } from './studyState';

type DiscreteKey = (typeof DISCRETE_INPUTS)[number][0];

/** What a freed variable starts with when its box is first ticked (a designer's usual spread). */
const START: { tyreWidthMm: StudyRange } & Record<DiscreteKey, (number | string)[]> = {
  tyreWidthMm: { min: 23, max: 32, points: 3 },
  coverSides: [1, 2],
  coverPlacement: ['rim', 'hub', 'centre'],
  spokeCount: [16, 20, 24],
  spokeSection: ['round', 'bladed'],
};

export interface ExtraVariablesForm {
  element: HTMLElement;
  /** Write the freed variables into `inputs` (and drop the others). */
  read(inputs: StudyInputs): void;
  /** Show the inputs' freed variables. */
  set(inputs: StudyInputs): void;
  clearErrors(): void;
  /** Show a message beside the input `key` names (e.g. "spokeCount"); false if none is here. */
  showError(key: string, message: string): boolean;
}

interface Row {
  key: 'tyreWidthMm' | DiscreteKey;
  /** The variable's label (designVariables.ts). */
  label: string;
  free: HTMLInputElement;
  error: HTMLElement;
  body: HTMLElement;
  read(): unknown;
  show(value: unknown): void;
}

function row(
  key: Row['key'],
  id: string,
  build: (r: Row) => Omit<Row, 'key' | 'label' | 'free' | 'error' | 'body'>,
): Row {
  const freeId = `study-free-${key}`;
  const free = el('input', { attrs: { id: freeId, type: 'checkbox', name: `free.${key}` } });
  const error = el('div', {
    className: 'field-error',
    attrs: { id: `${freeId}-error`, 'aria-live': 'polite' },
  });
  free.setAttribute('aria-describedby', error.id);
  const body = el('div', { className: 'study-free-body' });
  const r = { key, label: designVariable(id)!.label, free, error, body } as unknown as Row;
  Object.assign(r, build(r));
  free.addEventListener('change', () => {
    body.hidden = !free.checked;
  });
  return r;
}

function numberInput(id: string, step: string): HTMLInputElement {
  return el('input', { attrs: { id, type: 'number', step, inputmode: 'decimal' } });
}

function checkboxes(key: string, choices: readonly (number | string)[], r: Row) {
  const boxes = choices.map((c) =>
    el('input', { attrs: { type: 'checkbox', id: `study-${key}-${c}`, value: String(c) } }),
  );
  r.body.append(
    ...boxes.flatMap((b, i) => [b, el('label', { text: ` ${choices[i]} `, attrs: { for: b.id } })]),
  );
  return {
    read: () => choices.filter((_, i) => boxes[i]!.checked),
    show: (value: unknown) => {
      const list = value as (number | string)[];
      boxes.forEach((b, i) => {
        b.checked = list.includes(choices[i]!);
      });
    },
  };
}

export function extraVariablesForm(): ExtraVariablesForm {
  const rows: Row[] = [
    row('tyreWidthMm', 'tyre_width_m', (r) => {
      const [min, max, points] = [
        numberInput('study-tyreWidthMm-min', '1'),
        numberInput('study-tyreWidthMm-max', '1'),
        numberInput('study-tyreWidthMm-points', '1'),
      ];
      r.body.append(
        el('label', { text: 'from ', attrs: { for: min.id } }),
        min,
        el('label', { text: ' to ', attrs: { for: max.id } }),
        max,
        el('span', { className: 'unit', text: ' mm, ' }),
        el('label', { text: 'values ', attrs: { for: points.id } }),
        points,
      );
      const num = (i: HTMLInputElement) => (i.value.trim() === '' ? Number.NaN : Number(i.value));
      return {
        read: () => ({ min: num(min), max: num(max), points: num(points) }),
        show: (value: unknown) => {
          const v = value as StudyRange;
          min.value = String(v.min);
          max.value = String(v.max);
          points.value = String(v.points);
        },
      };
    }),
    row('coverSides', 'cover_sides', (r) => checkboxes('coverSides', [1, 2], r)),
    row('coverPlacement', 'cover_placement', (r) =>
      checkboxes('coverPlacement', ['rim', 'hub', 'centre'], r),
    ),
    row('spokeCount', 'spoke_count', (r) => {
      const text = el('input', {
        attrs: { id: 'study-spokeCount', type: 'text', inputmode: 'numeric', size: '14' },
      });
      r.body.append(
        el('label', { text: 'counts ', attrs: { for: text.id } }),
        text,
        el('span', { className: 'unit', text: ' (e.g. 16, 20, 24)' }),
      );
      return {
        // A token that is not a number reads as NaN: the rules name it beside this input.
        read: () =>
          text.value
            .split(/[\s,;]+/)
            .filter((t) => t !== '')
            .map(Number),
        show: (value: unknown) => {
          text.value = (value as number[]).join(', ');
        },
      };
    }),
    row('spokeSection', 'spoke_section', (r) => checkboxes('spokeSection', ['round', 'bladed'], r)),
  ];
  const element = el('fieldset', { className: 'study-more' }, [
    el('legend', { text: 'More design variables' }),
    el('p', {
      className: 'small',
      text: 'Tick a variable to vary it too; unticked, the current wheel’s value holds. Every combination of the chosen values is one more grid of cover fraction x rim depth.',
    }),
    ...rows.map((r) => {
      return el('div', { className: 'study-free' }, [
        el('div', { className: 'study-free-head' }, [
          r.free,
          el('label', { text: ` Vary the ${r.label.toLowerCase()}`, attrs: { for: r.free.id } }),
        ]),
        r.body,
        r.error,
      ]);
    }),
  ]);
  return {
    element,
    read(inputs) {
      for (const r of rows) {
        const target = inputs as unknown as Record<string, unknown>;
        if (r.free.checked) target[r.key] = r.read();
        else delete target[r.key];
      }
    },
    set(inputs) {
      for (const r of rows) {
        const value = inputs[r.key];
        r.free.checked = value !== undefined;
        r.body.hidden = value === undefined;
        // A variable not freed shows its starting values, ready for when its box is ticked.
        r.show(value ?? START[r.key]);
      }
    },
    clearErrors() {
      for (const r of rows) {
        r.error.textContent = '';
        r.free.removeAttribute('aria-invalid');
      }
    },
    showError(key, message) {
      const r = rows.find((x) => x.key === key || key.startsWith(`${x.key}.`));
      if (!r) return false;
      r.error.textContent = r.error.textContent ? `${r.error.textContent} ${message}` : message;
      r.free.setAttribute('aria-invalid', 'true');
      return true;
    },
  };
}
