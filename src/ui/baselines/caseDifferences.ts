/**
 * What differs between two designs, in words: each differing key of the wheel, steering and model
 * sections of `other`, read against `design`, with `other`'s value in millimetres, counts or plain
 * numbers ("rim 30 mm", "cover 0 at the rim", "24 round spokes"). Used to name pinned baselines and to
 * say why imported data does not match the current design. The conditions are left out: a baseline is
 * evaluated at the design's conditions.
 */
import type { CaseFile } from '../../compute/caseFile';
import { fmt } from '../displayUnits';

export type Section = 'wheel' | 'steering' | 'model';

/** Leaf paths (dotted) and values of an object. */
function leaves(x: unknown, prefix: string, out: Map<string, unknown>): Map<string, unknown> {
  if (x !== null && typeof x === 'object' && !Array.isArray(x)) {
    for (const [k, v] of Object.entries(x)) leaves(v, prefix ? `${prefix}.${k}` : k, out);
  } else {
    out.set(prefix, x);
  }
  return out;
}

const mm = (m: unknown) => (typeof m === 'number' ? `${fmt(m * 1000, 4)} mm` : String(m));

/** Words for the keys a designer changes most; others read as their key path and value. */
const WORDS: Record<string, (v: unknown, c: CaseFile) => string> = {
  'wheel.cover.fraction': (v, c) => `cover ${fmt(Number(v), 3)} at the ${c.wheel.cover.placement}`,
  'wheel.cover.placement': (v) => `covers at the ${String(v)}`,
  'wheel.cover.sides': (v) => `${String(v)}-sided cover`,
  'wheel.rim_depth_m': (v) => `rim ${mm(v)}`,
  'wheel.rim_width_m': (v) => `rim width ${mm(v)}`,
  'wheel.tyre_width_m': (v) => `tyre ${mm(v)}`,
  'wheel.outer_radius_m': (v) => `radius ${mm(v)}`,
  'wheel.spokes.count': (v, c) => `${String(v)} ${c.wheel.spokes.section} spokes`,
  'wheel.spokes.section': (v) => `${String(v)} spokes`,
};

/** The differing keys' paths (e.g. "wheel.rim_depth_m"), in the sections' order. */
export function differingKeys(other: CaseFile, design: CaseFile, sections: readonly Section[]): string[] {
  const keys: string[] = [];
  for (const s of sections) {
    const a = leaves(other[s], s, new Map());
    const b = leaves(design[s], s, new Map());
    for (const k of new Set([...a.keys(), ...b.keys()])) {
      if (JSON.stringify(a.get(k)) !== JSON.stringify(b.get(k))) keys.push(k);
    }
  }
  return keys;
}

/** `other` against `design` in a few words ("rim 30 mm, cover 0 at the rim"), or "same as this design". */
export function caseDifferences(
  other: CaseFile,
  design: CaseFile,
  maxParts = 3,
  sections: readonly Section[] = ['wheel', 'steering', 'model'],
): string {
  const keys = differingKeys(other, design, sections);
  if (keys.length === 0) return 'same as this design';
  const parts: string[] = [];
  const values = leaves(other, '', new Map());
  let steering = false;
  let model = false;
  for (const k of keys) {
    if (k.startsWith('steering.')) steering = true;
    else if (k.startsWith('model.')) model = true;
    else {
      const words =
        WORDS[k]?.(values.get(k), other) ?? `${k.replace(/^wheel\./, '')} ${String(values.get(k))}`;
      if (!parts.includes(words)) parts.push(words);
    }
  }
  if (steering) parts.push('other steering geometry');
  if (model) parts.push('other model options');
  const shown = parts.slice(0, maxParts);
  if (parts.length > maxParts) shown.push(`${parts.length - maxParts} more`);
  return shown.join(', ');
}
