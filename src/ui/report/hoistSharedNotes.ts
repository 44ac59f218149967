/**
 * Notes that two or more figures share (the yaw plots' common x title, the trusted-yaw shading) are
 * printed once under the plots' heading instead of under each figure: the same words, less paper.
 * Returns the shared notes in first-seen order and the figures without them (the input is not changed).
 */
import type { ReportFigure } from './reportFigureDom';

export function hoistSharedNotes(figures: readonly ReportFigure[]): {
  shared: string[];
  figures: ReportFigure[];
} {
  const seen = new Map<string, number>();
  for (const f of figures) for (const n of new Set(f.notes)) seen.set(n, (seen.get(n) ?? 0) + 1);
  const shared = [...seen].filter(([, count]) => count >= 2).map(([note]) => note);
  const isShared = new Set(shared);
  return { shared, figures: figures.map((f) => ({ ...f, notes: f.notes.filter((n) => !isShared.has(n)) })) };
}
