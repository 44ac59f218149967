/**
 * A message from the case or view rules, with the file keys it names replaced by the labels on screen
 * ("wheel.rim_depth_m: ..." -> "rim depth: ..."), so a refusal shown beside a control speaks its words.
 */
import type { Field, FieldContext } from './fieldTypes';
import { labelParts } from './labelParts';

const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

export function speakLabels(message: string, fields: readonly Field[], ctx: FieldContext): string {
  let out = message;
  const named = fields.filter((f) => f.path !== undefined && f.path !== 'name');
  named.sort((a, b) => (b.path?.length ?? 0) - (a.path?.length ?? 0));
  for (const f of named) {
    const path = f.path ?? '';
    if (!out.includes(path)) continue;
    const name = labelParts(f.label(ctx)).name;
    const spoken = name.charAt(0).toLowerCase() + name.slice(1);
    // A whole key only: "wheel.cover.fraction", not part of "wheel.cover.fraction_x" or "x.wheel...".
    out = out.replace(new RegExp(`(?<![\\w.])${escapeRegExp(path)}(?![\\w])`, 'g'), spoken);
  }
  return out;
}
