/** The page's status line and progress bar while it computes (pageCompute.ts). */
import type { SweepProgress } from '../compute/engine/runCases';
import type { StudyPlan } from '../compute/study/studyPlan';
import { byId } from './views/present';

/** A run's stage on the status line, and the cases of the sweeps and the map landed so far. */
export interface Progress {
  phase: 'current' | 'sweeps' | 'map';
  sweeps: number;
  map: number;
}

/** The status text, and the progress bar (and the Cancel button) while a run has progress to show. */
export function showStatus(text: string, progress: SweepProgress | null = null): void {
  byId('status-text').textContent = text;
  const bar = byId<HTMLProgressElement>('progress');
  const cancel = byId('cancel');
  if (progress) {
    bar.hidden = false;
    bar.max = Math.max(1, progress.pointsTotal);
    bar.value = progress.pointsDone;
    cancel.hidden = false;
  } else {
    bar.hidden = true;
  }
}

/** Least time between two progress texts (ms): each costs the page a repaint (6-9 ms of the main thread
 * measured in a page-bench trace on 2 cores, 2026-12-02), taken from the workers on a small machine. */
const PROGRESS_EVERY_MS = 100;
let lastProgressMs = Number.NEGATIVE_INFINITY;

/** The status line as a run's stages land: the sweeps' cases, then the map's designs (at most one
 * update per PROGRESS_EVERY_MS; the run's end sets its own status). */
export function showProgress(
  at: Progress,
  sweeps: readonly StudyPlan[],
  map: StudyPlan,
  p: SweepProgress,
): void {
  if (at.phase === 'current') return;
  const now = performance.now();
  if (now - lastProgressMs < PROGRESS_EVERY_MS) return;
  lastProgressMs = now;
  if (at.phase === 'sweeps') {
    const total = sweeps.reduce((n, plan) => n + plan.inputs.length, 0);
    showStatus(`Cover-fraction sweeps: ${at.sweeps}/${total} cases`, p);
    return;
  }
  const left = Number.isFinite(p.remainingMs) ? `, about ${(p.remainingMs / 1000).toFixed(1)} s left` : '';
  showStatus(`Design map: ${at.map}/${map.inputs.length} designs${left}`, p);
}
