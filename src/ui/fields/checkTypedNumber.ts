/**
 * Check a number typed into a control against its field's rule. The value is never clamped or snapped:
 * it is taken exactly as typed, or refused with a rule naming the control ("Rim depth: at most 200 mm").
 */
import type { Field, FieldContext } from './fieldTypes';
import { labelParts, withUnit } from './labelParts';

export type TypedCheck = { ok: true; value: number } | { ok: false; rule: string };

export function checkTypedNumber(field: Field, text: string, ctx: FieldContext): TypedCheck {
  const { name, unit } = labelParts(field.label(ctx));
  const t = String(text).trim();
  const x = t === '' ? Number.NaN : Number(t);
  if (!Number.isFinite(x)) return { ok: false, rule: `${name}: a number is needed, got "${t.slice(0, 20)}"` };
  if (field.integer && !Number.isInteger(x)) return { ok: false, rule: `${name}: a whole number, got ${x}` };
  const { min, max } = field;
  if (min !== undefined && x < min)
    return { ok: false, rule: `${name}: at least ${withUnit(min, unit)}, got ${x}` };
  if (max !== undefined && x > max)
    return { ok: false, rule: `${name}: at most ${withUnit(max, unit)}, got ${x}` };
  return { ok: true, value: x };
}
