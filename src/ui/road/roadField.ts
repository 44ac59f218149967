/** The road form's fields: a number with its unit (which may follow the speed unit) or a choice. */
import type { RoadState } from '../roadState';
import type { SpeedUnit } from '../viewState';
import type { RoadContext } from './roadContext';

export interface NumberField {
  kind: 'number';
  key: string;
  label: string;
  unit: (u: SpeedUnit) => string;
  get(r: RoadState, u: SpeedUnit): number;
  set(r: RoadState, v: number, u: SpeedUnit): void;
  step: string;
  visible?(r: RoadState): boolean;
  help?: string;
  /** A line under the field that follows the inputs (e.g. what a wind figure becomes at the hub). */
  note?(r: RoadState, ctx: RoadContext | null): string;
}

export interface SelectField {
  kind: 'select';
  key: string;
  label: string;
  options: Array<[string, string]>;
  get(r: RoadState): string;
  set(r: RoadState, v: string): void;
  visible?(r: RoadState): boolean;
}

export type Field = NumberField | SelectField;

export interface FieldGroup {
  title: string;
  fields: Field[];
}

export interface FieldView {
  field: Field;
  row: HTMLElement;
  input: HTMLInputElement | HTMLSelectElement;
  unit: HTMLElement | null;
  error: HTMLElement;
  note: HTMLElement | null;
}

/** A number shown without binary noise (10 significant digits). */
export const clean = (x: number) => Number(x.toPrecision(10));
/** No unit. */
export const same = () => '';

/** A number field. */
export function num(
  key: string,
  label: string,
  unit: string | ((u: SpeedUnit) => string),
  get: NumberField['get'],
  set: NumberField['set'],
  step = 'any',
  visible?: (r: RoadState) => boolean,
): NumberField {
  return {
    kind: 'number',
    key,
    label,
    unit: typeof unit === 'string' ? () => unit : unit,
    get,
    set,
    step,
    ...(visible ? { visible } : {}),
  };
}
