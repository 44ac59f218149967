/**
 * Nothing lost at the command line (issue 7): an interrupted sweep leaves no file under the output's
 * name and keeps its finished rows beside it (OUT.partial, never over an existing file); a case that
 * fails becomes an error row while the rest run; oversized input files are refused before reading
 * with exit 2. (Refusing to overwrite without --force, atomic writes and bad-input exit codes are in
 * test/cli/cli.test.ts.)
 */
import { execFile, spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { chunkText, writeSweep } from '../../src/cli/main';
import { InProcessRunner } from '../../src/compute/engine/inProcessRunner';
import { solveJob } from '../../src/compute/engine/solveJob';
import { expandPlan } from '../../src/compute/planFile';
import { parseCsvLine, tableColumns } from '../../src/compute/resultTable';

const BIN = resolve(__dirname, '../../bin/coversweep.mjs');
const dir = mkdtempSync(join(tmpdir(), 'coversweep-hardening-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function cli(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((done) => {
    execFile(process.execPath, [BIN, ...args], { cwd: dir }, (error, stdout, stderr) => {
      done({ code: error ? (typeof error.code === 'number' ? error.code : -1) : 0, stdout, stderr });
    });
  });
}

/** A plan of `n` cases, rim depth varied; `span` strips (the cost of a case grows with its cube). */
function plan(n: number, span = 10): string {
  return JSON.stringify({
    wheel: { rim_depth_m: { from: 0.02, to: Number((0.02 + (n - 1) * 0.00005).toFixed(6)), step: 0.00005 } },
    conditions: { airspeed_mps: 12, yaw_deg: [0, 10] },
    model: { lattice_span: span, lattice_chord: 8, grid_convergence: false },
  });
}

/** Run a sweep to a file and send SIGINT once the progress shows finished cases. */
function interruptedSweep(planPath: string, out: string): Promise<{ code: number | null; stderr: string }> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, [BIN, 'sweep', planPath, '--out', out, '--workers', '0'], {
      cwd: dir,
    });
    let stderr = '';
    let sent = false;
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString();
      // Progress lines read "sweep: 16% 320/2000 cases, ..."; interrupt after the first with cases done.
      if (!sent && /sweep: \d+% [1-9]\d*\/\d+ cases/.test(stderr)) {
        sent = true;
        child.kill('SIGINT');
      }
    });
    child.on('error', fail);
    child.on('exit', (code) => done({ code, stderr }));
  });
}

describe('nothing lost at the command line', () => {
  it('SIGINT mid-sweep: exit 130, no file under the output name, no temporary file, finished rows kept in OUT.partial', async () => {
    const planPath = join(dir, 'long-plan.json');
    writeFileSync(planPath, plan(2000, 24));
    // A partial file from an earlier run must survive: the new one goes to .partial.1.
    writeFileSync(join(dir, 'r.csv.partial'), 'keep me');
    const run = await interruptedSweep(planPath, 'r.csv');
    expect(run.code, run.stderr).toBe(130);
    expect(run.stderr).toMatch(
      /interrupted; r\.csv not written; the finished rows are in .*r\.csv\.partial\.1/,
    );
    const files = readdirSync(dir);
    expect(files).not.toContain('r.csv');
    expect(files.filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect(readFileSync(join(dir, 'r.csv.partial'), 'utf8')).toBe('keep me');

    const kept = readFileSync(join(dir, 'r.csv.partial.1'), 'utf8');
    expect(kept.endsWith('\n'), 'the kept file ends with a whole row').toBe(true);
    const lines = kept.trimEnd().split('\n');
    const header = tableColumns(['wheel.rim_depth_m']);
    expect(lines[0]).toBe(header.join(','));
    const rows = lines.slice(1).map((l) => parseCsvLine(l));
    expect(rows.length, 'rows finished before the interrupt').toBeGreaterThanOrEqual(2);
    expect(rows.length).toBeLessThan(4000);
    // Whole cases only (two yaw angles each), in plan order, each row complete and error-free.
    expect(rows.length % 2).toBe(0);
    const errorColumn = header.indexOf('error');
    rows.forEach((row, i) => {
      expect(row.length, `row ${i}`).toBe(header.length);
      expect(row[errorColumn], `row ${i}`).toBe('');
      expect(Number(row[0]), `row ${i}`).toBeCloseTo(0.02 + Math.floor(i / 2) * 0.00005, 12);
    });
  }, 60_000);

  it('a case whose solve throws becomes an error row; the cases after it still run (in-process sweep)', async () => {
    const expanded = expandPlan(JSON.parse(plan(3)));
    if (!expanded.ok) throw new Error(expanded.errors.join('; '));
    // The in-process runner with a solver that fails the second case the way the model fails one.
    const runner = new InProcessRunner((job) => {
      const input = job.cases[0]!.input;
      if (input.wheel.rimDepthM !== 0.02005) return solveJob(job);
      return {
        jobId: job.jobId,
        outcomes: [
          {
            caseIndex: job.cases[0]!.caseIndex,
            ok: false,
            error: 'wheel.rimDepthM: a stand-in model failure',
          },
        ],
      };
    });
    let csv = '';
    const failed = await writeSweep(
      expanded.value,
      'csv',
      (text) => {
        csv += chunkText(text);
      },
      undefined,
      runner,
    );
    expect(failed).toBe(1);
    const lines = csv.trimEnd().split('\n');
    const header = parseCsvLine(lines[0]!);
    const errorColumn = header.indexOf('error');
    const seen = lines.slice(1).map((l) => {
      const row = parseCsvLine(l);
      return `${row[0]} ${row[errorColumn] || 'ok'}`;
    });
    expect(seen).toEqual([
      '0.02 ok',
      '0.02 ok',
      '0.02005 wheel.rimDepthM: a stand-in model failure',
      '0.0201 ok',
      '0.0201 ok',
    ]);
  });

  it('refuses case, plan and ride files above 4 MB before reading them (exit 2, nothing on stdout)', async () => {
    const big = `{"name": "${'x'.repeat(5 * 1024 * 1024)}"}`;
    writeFileSync(join(dir, 'big.json'), big);
    const runs = await Promise.all([
      cli(['solve', 'big.json']),
      cli(['sweep', 'big.json']),
      cli(['ride', 'big.json']),
    ]);
    for (const [i, what] of ['case file', 'plan file', 'ride file'].entries()) {
      const run = runs[i]!;
      expect(run.code, run.stderr).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr).toMatch(new RegExp(`the ${what} is 5\\.0 MB, more than the 4 MB limit`));
    }
  });
});
