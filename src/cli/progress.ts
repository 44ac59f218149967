import type { SweepProgress } from '../compute/engine/runCases';
import { remainingTime } from './remainingTime';

/** What the bar shows: cases and points done of the total. */
export type SweepCounts = Pick<SweepProgress, 'casesDone' | 'casesTotal' | 'pointsDone' | 'pointsTotal'>;

/**
 * Sweep progress on stderr: a redrawn bar when stderr is a terminal, otherwise a plain line at each
 * 10 % step (at most one per two seconds, plus the last). The time left is smoothed (remainingTime).
 */
export function progressReporter(
  write: (text: string) => void,
  isTTY: boolean,
  now: () => number = Date.now,
): (p: SweepCounts) => void {
  const start = now();
  let lastDraw = 0;
  let lastStep = -1;
  let lastLine = Number.NEGATIVE_INFINITY;
  const left = remainingTime();
  return (p) => {
    const fraction = p.pointsTotal > 0 ? p.pointsDone / p.pointsTotal : 1;
    const done = p.casesDone === p.casesTotal;
    const elapsedS = (now() - start) / 1000;
    left.update(p.pointsDone, elapsedS);
    const leftS = done ? 0 : (left.estimate(p.pointsTotal, elapsedS) ?? 0);
    const text = `${Math.floor(fraction * 100)}% ${p.casesDone}/${p.casesTotal} cases, ${p.pointsDone}/${p.pointsTotal} points, ${elapsedS.toFixed(1)} s${leftS > 0 ? `, about ${Math.ceil(leftS)} s left` : ''}`;
    if (isTTY) {
      const t = now();
      if (!done && t - lastDraw < 100 && p.casesDone > 0) return;
      lastDraw = t;
      const width = 30;
      const filled = Math.round(fraction * width);
      write(`\rsweep [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${text}\x1b[K${done ? '\n' : ''}`);
      return;
    }
    const step = Math.floor(fraction * 10);
    const t = now();
    if (done || (step > lastStep && t - lastLine >= 2000)) {
      lastStep = step;
      lastLine = t;
      write(`sweep: ${text}\n`);
    }
  };
}
