// The smoothed time-left estimate on a synthetic uneven sweep: a 1.5 s worker start-up, then two
// workers finishing cases of uneven size (seeded sizes 5..120 points) at 50 points/s each, so cases
// come back in bursts and gaps. The truth is the simulation's own end time. Bound: common practice, no
// source (a time-left figure within a factor of 2 of the truth, never jumping by more than 2x).
import { describe, expect, it } from 'vitest';
import { progressReporter } from '../../src/cli/progress';
import { remainingTime } from '../../src/cli/remainingTime';
import { mulberry32 } from '../../src/model/random/mulberry32';

const FACTOR = 2;

function unevenSweep() {
  const rng = mulberry32(12);
  const sizes = Array.from({ length: 60 }, () => 5 + Math.floor(rng() * 116));
  const free = [1.5, 1.5]; // both workers start after 1.5 s
  const events: { t: number; size: number }[] = [];
  for (const size of sizes) {
    const w = free[0]! <= free[1]! ? 0 : 1;
    free[w] = free[w]! + size / 50;
    events.push({ t: free[w]!, size });
  }
  events.sort((a, b) => a.t - b.t);
  const total = sizes.reduce((s, x) => s + x, 0);
  const end = events.at(-1)!.t;
  let done = 0;
  return { total, end, steps: events.map((e) => ({ t: e.t, done: (done += e.size) })) };
}

describe('remainingTime', () => {
  const { total, end, steps } = unevenSweep();

  it(`stays within a factor ${FACTOR} of the true time left and never jumps by more than ${FACTOR}x`, () => {
    const est = remainingTime();
    est.update(0, 0);
    let previous: { t: number; left: number } | null = null;
    let shown = 0;
    for (const s of steps) {
      est.update(s.done, s.t);
      const left = est.estimate(total, s.t);
      const truth = end - s.t;
      if (left === null || truth < 3) continue;
      shown++;
      const ratio = left / truth;
      expect(
        ratio,
        `at ${s.t.toFixed(2)} s (${s.done}/${total}): estimate ${left}, truth ${truth}`,
      ).toBeLessThan(FACTOR);
      expect(ratio, `at ${s.t.toFixed(2)} s: estimate ${left}, truth ${truth}`).toBeGreaterThan(1 / FACTOR);
      if (previous) {
        const expected = previous.left - (s.t - previous.t);
        if (expected > 0) {
          const jump = Math.max(left / expected, expected / left);
          expect(jump, `from ${previous.left} at ${previous.t} to ${left} at ${s.t}`).toBeLessThan(FACTOR);
        }
      }
      previous = { t: s.t, left };
    }
    expect(shown).toBeGreaterThan(40);
  });

  it('the plain elapsed x (1 - f) / f estimate misses by more on the same sequence (why smoothing)', () => {
    let worst = 1;
    for (const s of steps) {
      const f = s.done / total;
      const truth = end - s.t;
      if (truth < 3) continue;
      const plain = (s.t * (1 - f)) / f;
      worst = Math.max(worst, plain / truth, truth / plain);
    }
    expect(worst).toBeGreaterThan(FACTOR);
  });

  it('gives nothing before two steps, and counts a stall as time without progress', () => {
    const est = remainingTime();
    est.update(0, 0);
    est.update(10, 1);
    expect(est.estimate(100, 1)).toBeNull();
    est.update(20, 2);
    est.update(30, 3);
    const steady = est.estimate(100, 3)!;
    expect(Math.abs(steady - 7)).toBeLessThan(1e-9); // 70 points left at 10 points/s
    expect(est.estimate(100, 13)!).toBeGreaterThan(steady); // 10 s without progress: slower
    expect(() => remainingTime(0)).toThrow(RangeError);
  });

  it('the progress line shows the smoothed figure', () => {
    const lines: string[] = [];
    let now = 0;
    const report = progressReporter(
      (s) => lines.push(s),
      false,
      () => now,
    );
    report({ casesDone: 0, casesTotal: 60, pointsDone: 0, pointsTotal: total });
    steps.forEach((s, i) => {
      now = s.t * 1000;
      report({ casesDone: i + 1, casesTotal: 60, pointsDone: s.done, pointsTotal: total });
    });
    const figures = lines
      .map((l) => Number(l.match(/about (\d+) s left/)?.[1] ?? Number.NaN))
      .filter(Number.isFinite);
    expect(figures.length).toBeGreaterThan(3);
    expect(lines.at(-1)).toMatch(/100% 60\/60 cases/);
  });
});
