/**
 * Interrupts at random moments (issue 14, items 3 and 12): a pooled sweep to a file is sent SIGINT or
 * SIGTERM at seeded random times; its `.partial` must hold every case the progress line had reported
 * finished, each row equal to the same row of a complete run, and nothing under the output's name.
 * SIGKILL leaves a hidden temporary file, which the next run to the same output removes and names.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { chunkText, writeSweep } from '../../src/cli/main';
import { expandPlan } from '../../src/compute/planFile';
import { mulberry32 } from '../../src/model/random';
import { BIN, cliProcess } from './cliProcess';
import { family, STACK_TRACE } from './tally';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-interrupts-'));
const signals = family(
  'CLI: SIGINT, SIGTERM, SIGKILL at random moments',
  'test/adversarial/interrupts.test.ts',
);
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
  signals.save();
});

// 72 cases (cover fraction x rim depth: the pool's jobs run in lattice order, not plan order) of 4
// points each, on a lattice fine enough (44 x 18) that the sweep outlasts the longest seeded delay
// (1.5 s) with the faster LU, so the signals land mid-sweep rather than after the output is written.
const plan = {
  wheel: {
    rim_depth_m: [0.02, 0.03, 0.04, 0.05, 0.06, 0.07, 0.08, 0.09],
    cover: { fraction: [0, 0.125, 0.25, 0.375, 0.5, 0.625, 0.75, 0.875, 1] },
  },
  conditions: { airspeed_mps: [10, 14], yaw_deg: [0, 10] },
  model: { lattice_span: 44, lattice_chord: 18, grid_convergence: false },
};

interface Interrupted {
  code: number | null;
  stderr: string;
  /** Cases the progress line had reported finished when the signal was sent. */
  reported: number;
}

function interrupt(out: string, signal: NodeJS.Signals, delayMs: number): Promise<Interrupted> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, [BIN, 'sweep', 'plan.json', '--out', out, '--workers', '2'], {
      cwd: dir,
    });
    let stderr = '';
    let reported = 0;
    let armed = false;
    let sent = false;
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString();
      if (!sent) {
        for (const m of stderr.matchAll(/sweep: \d+% (\d+)\/\d+ cases/g))
          reported = Math.max(reported, Number(m[1]));
      }
      // The delay starts once the sweep has begun (the first progress line).
      if (!armed && /sweep: \d+% /.test(stderr)) {
        armed = true;
        setTimeout(() => {
          sent = true;
          child.kill(signal);
        }, delayMs);
      }
    });
    const timer = setTimeout(() => child.kill('SIGKILL'), 60_000);
    child.on('error', fail);
    child.on('close', (code) => {
      clearTimeout(timer);
      done({ code, stderr, reported });
    });
  });
}

describe('interrupted pooled sweeps keep every finished case', () => {
  it('SIGINT and SIGTERM at seeded random moments: the partial holds every case reported finished, rows exact', async () => {
    writeFileSync(join(dir, 'plan.json'), JSON.stringify(plan));
    const expanded = expandPlan(plan);
    if (!expanded.ok) throw new Error(expanded.errors.join('\n'));
    let reference = '';
    await writeSweep(expanded.value, 'csv', (t) => {
      reference += chunkText(t);
    });
    const referenceRows = new Set(reference.split('\n').slice(1, -1));
    const random = mulberry32(1403);
    const summary: string[] = [];
    for (const [k, signal] of (['SIGINT', 'SIGTERM', 'SIGINT', 'SIGTERM'] as const).entries()) {
      const delayMs = Math.round(random() * 1500);
      const out = `r${k}.csv`;
      const run = await interrupt(out, signal, delayMs);
      signals.tried++;
      if (STACK_TRACE.test(run.stderr)) signals.crashes++;
      if (run.code === null) signals.hangs++;
      if (run.code === 0) {
        // Finished before the signal: the whole output is there.
        expect(readFileSync(join(dir, out), 'utf8')).toBe(reference);
        summary.push(`${signal} at +${delayMs} ms: finished first`);
        continue;
      }
      expect(run.code, run.stderr).toBe(130);
      expect(existsSync(join(dir, out)), 'nothing under the output name').toBe(false);
      expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
      const partialPath = join(dir, `${out}.partial`);
      const rows = existsSync(partialPath) ? readFileSync(partialPath, 'utf8').split('\n').slice(1, -1) : [];
      const cases = new Set<string>();
      for (const row of rows) {
        expect(
          referenceRows.has(row),
          `a row of ${out}.partial equals the complete run's: ${row.slice(0, 80)}`,
        ).toBe(true);
        cases.add(row.split(',').slice(0, 2).join(','));
      }
      const lost = Math.max(0, run.reported - cases.size);
      signals.lostRows += lost;
      summary.push(
        `${signal} at +${delayMs} ms: ${run.reported} case(s) reported finished, ${cases.size} kept (${rows.length} rows)`,
      );
      expect(
        cases.size,
        `${signal} at +${delayMs} ms: ${run.reported} reported, ${cases.size} kept\n${run.stderr}`,
      ).toBeGreaterThanOrEqual(run.reported);
      expect(rows.length % 4, 'whole cases (4 points each)').toBe(0);
    }
    console.log(`interrupts:\n  ${summary.join('\n  ')}`);
  }, 120_000);

  it('SIGKILL leaves a hidden temporary file; the next run to that output removes it and names it', async () => {
    writeFileSync(join(dir, 'plan.json'), JSON.stringify(plan));
    const killed = await interrupt('k.csv', 'SIGKILL', 200);
    signals.tried++;
    const stale = readdirSync(dir).filter((f) => f.startsWith('.k.csv.') && f.endsWith('.tmp'));
    expect(killed.code).toBe(null);
    expect(stale.length, 'SIGKILL cannot be caught: its temporary file stays').toBe(1);
    // The next run to that output (any plan: a small one here).
    writeFileSync(join(dir, 'small.json'), JSON.stringify({ ...plan, wheel: { rim_depth_m: [0.02, 0.03] } }));
    const next = await cliProcess(['sweep', 'small.json', '--out', 'k.csv', '--workers', '0'], dir);
    signals.tried++;
    if (next.code !== 0 || STACK_TRACE.test(next.stderr)) signals.crashes++;
    expect(next.code, next.stderr).toBe(0);
    expect(next.stderr).toContain(
      `removed ${join(dir, stale[0]!)}, a temporary file left by an earlier run that was killed`,
    );
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  }, 120_000);
});
