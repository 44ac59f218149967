/**
 * Several pinned baselines. The state keeps `baseline` (the reference: differences, the design map,
 * the road panel use it, as before) and `baselines` (every pinned design, in pinning order, the
 * reference among them; absent in states from before, which read as the one `baseline`). Plots draw
 * them all, each in its own colour and dash by its place in this list, so changing the reference
 * leaves every colour where it was.
 */
import type { CaseFile } from '../../compute/caseFile';
import type { DifferenceMode } from '../viewState';

/** The part of the page's state (AppState) that holds the pinned baselines. */
export interface Pinnable {
  case: CaseFile;
  baseline: CaseFile | null;
  baselines?: CaseFile[];
  view: { difference: DifferenceMode };
}

/** Most designs that can be pinned at once (readable on one plot beside the family). */
export const MAX_BASELINES = 4;

/** Line colours and dashes of the pinned baselines by their place (the page's palette, darker tones). */
export const BASELINE_STYLES: ReadonlyArray<{ stroke: string; dash: number[] }> = [
  { stroke: '#111111', dash: [6, 4] },
  { stroke: '#6b4fa0', dash: [2, 3] },
  { stroke: '#b8860b', dash: [10, 3, 2, 3] },
  { stroke: '#2e7d32', dash: [4, 2] },
];

export const sameCase = (a: CaseFile, b: CaseFile): boolean => JSON.stringify(a) === JSON.stringify(b);

/** Every pinned design in pinning order (the reference among them); none when no reference is set. */
export function pinnedBaselines(s: Pick<Pinnable, 'baseline' | 'baselines'>): CaseFile[] {
  if (s.baseline === null) return [];
  const list = s.baselines ?? [];
  return list.some((b) => sameCase(b, s.baseline!)) ? [...list] : [...list, s.baseline];
}

/** Where the reference sits in pinnedBaselines (-1 when none is pinned). */
export function referenceIndex(s: Pick<Pinnable, 'baseline' | 'baselines'>): number {
  const list = pinnedBaselines(s);
  return s.baseline === null ? -1 : list.findIndex((b) => sameCase(b, s.baseline!));
}

/** A state with this list of pinned designs and reference (null and [] when the list is empty). */
function withList<S extends Pinnable>(s: S, list: CaseFile[], reference: CaseFile | null): S {
  const next: S = { ...s, baseline: list.length > 0 ? reference : null };
  if (list.length > 1) next.baselines = list;
  else delete next.baselines;
  if (list.length === 0) next.view = { ...s.view, difference: 'none' };
  return next;
}

export type PinOutcome<S> = { ok: true; state: S; message: string } | { ok: false; message: string };

/** Pin the current design; the first one pinned becomes the reference. */
export function pinCurrent<S extends Pinnable>(s: S): PinOutcome<S> {
  const list = pinnedBaselines(s);
  const k = list.findIndex((b) => sameCase(b, s.case));
  if (k >= 0) return { ok: false, message: `This design is already pinned (baseline ${k + 1}).` };
  if (list.length >= MAX_BASELINES) {
    return {
      ok: false,
      message: `Not pinned: at most ${MAX_BASELINES} baselines at once; remove one first (× beside it).`,
    };
  }
  const design = structuredClone(s.case);
  const next = withList(s, [...list, design], s.baseline ?? design);
  const message =
    list.length === 0
      ? 'Baseline pinned: the current wheel. Change the design to compare against it.'
      : `Baseline ${list.length + 1} pinned. Differences stay against the reference (baseline ${referenceIndex(s) + 1}); choose another in the list.`;
  return { ok: true, state: next, message };
}

/** Remove the k-th pinned design; removing the reference makes the first remaining one the reference. */
export function removeBaseline<S extends Pinnable>(s: S, k: number): S {
  const list = pinnedBaselines(s);
  if (!(k >= 0 && k < list.length))
    throw new RangeError(`no pinned baseline ${k + 1} (${list.length} pinned)`);
  const removed = list[k]!;
  const rest = list.filter((_, i) => i !== k);
  const reference = s.baseline && !sameCase(removed, s.baseline) ? s.baseline : (rest[0] ?? null);
  return withList(s, rest, reference);
}

/** Make the k-th pinned design the reference of the differences. */
export function chooseReference<S extends Pinnable>(s: S, k: number): S {
  const list = pinnedBaselines(s);
  if (!(k >= 0 && k < list.length))
    throw new RangeError(`no pinned baseline ${k + 1} (${list.length} pinned)`);
  return withList(s, list, list[k]!);
}
