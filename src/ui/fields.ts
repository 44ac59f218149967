/**
 * Every control of the page, as data: where it sits (group), what it edits (the case file or the view
 * settings), how it reads its display value from the state and how it writes a changed value back into
 * a raw copy of the state. Writes touch only their own keys, so values never drift through repeated
 * unit conversions; the result is validated (validateCase / validateView) before it is applied.
 */
export { clean, listText, parseNumberList, yawRange } from './fields/fieldHelpers';
export type { Field, FieldContext, FieldValue, GroupId, RawJson } from './fields/fieldTypes';
export { GROUP_TITLES } from './fields/fieldTypes';

import { CONDITION_FIELDS } from './fields/conditionFields';
import type { Field } from './fields/fieldTypes';
import { MODEL_FIELDS } from './fields/modelFields';
import { VIEW_FIELDS } from './fields/viewFields';
import { WHEEL_FIELDS } from './fields/wheelFields';

/** Every control, in the page's order. */
export const FIELDS: readonly Field[] = [
  ...WHEEL_FIELDS,
  ...CONDITION_FIELDS,
  ...MODEL_FIELDS,
  ...VIEW_FIELDS,
];
