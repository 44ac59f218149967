/**
 * A labelled drop-down choosing a ride objective (its label and unit); `onChange` receives the id.
 * Standalone: the objectives, the current choice and the callback are its arguments.
 */
import { el, uniqueId } from '../dom';
import { headerText } from './studyRows';

export interface ObjectiveChoice {
  id: string;
  label: string;
  unit: string;
}

export interface ObjectivePicker {
  element: HTMLElement;
  /** Show another choice without calling onChange. */
  setSelected(id: string): void;
}

export function objectivePicker(
  label: string,
  objectives: readonly ObjectiveChoice[],
  selected: string,
  onChange: (id: string) => void,
): ObjectivePicker {
  const id = uniqueId('objective');
  const select = el('select', { attrs: { id } });
  for (const o of objectives) {
    select.append(el('option', { text: headerText(o.label, o.unit), attrs: { value: o.id } }));
  }
  select.value = selected;
  select.addEventListener('change', () => onChange(select.value));
  const element = el('div', { className: 'objective-picker' }, [
    el('label', { text: label, attrs: { for: id } }),
    ' ',
    select,
  ]);
  return {
    element,
    setSelected: (value) => {
      select.value = value;
    },
  };
}
