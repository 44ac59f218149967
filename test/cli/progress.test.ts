import { describe, expect, it } from 'vitest';
import { progressReporter } from '../../src/cli/progress';

const step = (done: number) => ({ casesDone: done, casesTotal: 10, pointsDone: done * 4, pointsTotal: 40 });

describe('progressReporter (common practice, no source)', () => {
  it('redraws one bar in place on a terminal and ends it with a newline', () => {
    let out = '';
    let t = 0;
    const report = progressReporter(
      (s) => (out += s),
      true,
      () => t,
    );
    for (let i = 0; i <= 10; i++) {
      t = i * 1000;
      report(step(i));
    }
    expect(out.startsWith('\rsweep [')).toBe(true);
    expect(out.endsWith('\n')).toBe(true);
    expect(out.split('\n')).toHaveLength(2);
    expect(out).toContain('100% 10/10 cases, 40/40 points, 10.0 s');
  });

  it('writes occasional plain lines otherwise, always the last', () => {
    const lines: string[] = [];
    let t = 0;
    const report = progressReporter(
      (s) => lines.push(s),
      false,
      () => t,
    );
    for (let i = 0; i <= 10; i++) {
      t = i * 500; // every 0.5 s: at most one line per 2 s
      report(step(i));
    }
    expect(lines.length).toBeLessThanOrEqual(4);
    expect(lines.every((l) => l.startsWith('sweep: ') && l.endsWith('\n') && !l.includes('\r'))).toBe(true);
    expect(lines.at(-1)).toContain('100% 10/10 cases');
  });
});
