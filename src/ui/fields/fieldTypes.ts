/** A control of the page as data: its group, what it edits, how it reads and writes its value. */
import type { CaseFile } from '../../compute/caseFile';
import type { ViewState } from '../viewState';

export type GroupId =
  | 'wheel'
  | 'spokes'
  | 'cover'
  | 'conditions'
  | 'air'
  | 'steering'
  | 'model'
  | 'units'
  | 'plots';

export const GROUP_TITLES: Record<GroupId, string> = {
  wheel: 'Wheel geometry',
  spokes: 'Spokes',
  cover: 'Covering',
  conditions: 'Speed and yaw',
  air: 'Air',
  steering: 'Steering axis (front wheel)',
  model: 'Model options',
  units: 'Units',
  plots: 'Plots and design map',
};

export type FieldValue = number | string | boolean;

export interface FieldContext {
  case: CaseFile;
  view: ViewState;
}

/** A deep copy of a case or view, edited by key before it is validated. */
// biome-ignore lint/suspicious/noExplicitAny: raw JSON is edited by key path and validated afterwards
export type RawJson = Record<string, any>;

export interface Field {
  key: string;
  group: GroupId;
  /** Label text; may depend on the units chosen. */
  label: (ctx: FieldContext) => string;
  target: 'case' | 'view';
  control: 'number' | 'select' | 'bool' | 'text';
  min?: number;
  max?: number;
  step?: number;
  options?: Record<string, FieldValue>;
  /** A typed value must be a whole number (counts). */
  integer?: boolean;
  /** The case or view key this control edits (e.g. "wheel.rim_depth_m"), to name it in messages. */
  path?: string;
  /** What the control means, in a sentence (shown on hover). */
  help?: string;
  /** A short line shown under the control (for the model's own terms). */
  hint?: string;
  get(ctx: FieldContext): FieldValue;
  /** Write the display value into `raw` (a deep copy of the case or of the view). May throw Error. */
  set(raw: RawJson, value: FieldValue, ctx: FieldContext): void;
  visible?(ctx: FieldContext): boolean;
}
