/**
 * End-to-end tests of the real command line (node bin/coversweep.mjs ...). Spawns run concurrently
 * to keep the file fast.
 */
import { execFile } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { exampleCase, examplePlan } from '../../src/cli/examples';
import { main } from '../../src/cli/main';
import { type ResultDocument, solveCase, validateCase } from '../../src/compute/caseFile';
import { parseCsvLine, tableColumns } from '../../src/compute/resultTable';

const BIN = resolve(__dirname, '../../bin/coversweep.mjs');
const dir = mkdtempSync(join(tmpdir(), 'coversweep-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function cli(args: string[]): Promise<Run> {
  return new Promise((done) => {
    execFile(process.execPath, [BIN, ...args], { cwd: dir, maxBuffer: 64 << 20 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
      done({ code, stdout, stderr });
    });
  });
}

function write(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

/** Deep comparison with numbers equal to a relative 1e-9 (absolute 1e-12 near zero). */
function expectClose(got: unknown, expected: unknown, path: string): void {
  if (typeof expected === 'number' && typeof got === 'number') {
    const tol = 1e-9 * Math.abs(expected) + 1e-12;
    expect(
      Math.abs(got - expected),
      `${path} got=${got} expected=${expected} tol=${tol}`,
    ).toBeLessThanOrEqual(tol);
  } else if (expected !== null && typeof expected === 'object') {
    expect(typeof got, path).toBe('object');
    const keys = Object.keys(expected);
    expect(Object.keys(got as object), path).toEqual(keys);
    for (const k of keys) {
      expectClose(
        (got as Record<string, unknown>)[k],
        (expected as Record<string, unknown>)[k],
        `${path}.${k}`,
      );
    }
  } else {
    expect(got, path).toEqual(expected);
  }
}

const FAST_MODEL = { lattice_span: 8, lattice_chord: 6, grid_convergence: false };
const base = { conditions: { airspeed_mps: 12, yaw_deg: [0, 10] }, model: FAST_MODEL };

describe('coversweep (spawned)', () => {
  it('rejects each class of invalid input with exit 2, the field on stderr, nothing on stdout, no file', async () => {
    const cases: { name: string; args: string[]; stderr: RegExp }[] = [
      {
        name: 'missing file',
        args: ['solve', 'nope.json', '--out', 'o1.json'],
        stderr: /cannot read the case file nope\.json: no such file/,
      },
      {
        name: 'bad JSON',
        args: ['solve', write('bad.json', '{\n  "conditions": {\n    "yaw_deg": 0,,\n'), '--out', 'o2.json'],
        stderr: /invalid JSON at line 3, column 18/,
      },
      {
        name: 'unknown key',
        args: [
          'solve',
          write('unknown.json', JSON.stringify({ ...base, wheel: { colour: 'red' } })),
          '--out',
          'o3.json',
        ],
        stderr: /wheel\.colour: unknown key/,
      },
      {
        name: 'wrong type',
        args: [
          'solve',
          write('type.json', JSON.stringify({ ...base, wheel: { spokes: { count: 'twenty' } } })),
          '--out',
          'o4.json',
        ],
        stderr: /wheel\.spokes\.count: must be an integer between 0 and 200, got "twenty"/,
      },
      {
        name: 'out of range',
        args: [
          'solve',
          write('range.json', JSON.stringify({ ...base, wheel: { cover: { fraction: 1.3 } } })),
          '--out',
          'o5.json',
        ],
        stderr: /wheel\.cover\.fraction: must be a number between 0 and 1, got 1\.3/,
      },
      {
        name: 'rim deeper than the wheel',
        args: [
          'sweep',
          write('deep.json', JSON.stringify({ ...base, wheel: { rim_depth_m: [0.05, 0.3] } })),
          '--out',
          'o6.csv',
        ],
        stderr:
          /case 2 of 2 \(wheel\.rim_depth_m=0\.3\): wheel\.rim_depth_m: .*the rim is deeper than the wheel/,
      },
    ];
    const runs = await Promise.all(cases.map((c) => cli(c.args)));
    runs.forEach((run, i) => {
      const c = cases[i]!;
      expect(run.code, `${c.name}: stderr=${run.stderr}`).toBe(2);
      expect(run.stderr, c.name).toMatch(c.stderr);
      expect(run.stdout, c.name).toBe('');
    });
    expect(readdirSync(dir).filter((f) => f.startsWith('o'))).toEqual([]);
  });

  it('example -> solve round trip; the example files in public/examples are the printed ones', async () => {
    const [example, plan] = await Promise.all([cli(['example']), cli(['example', '--plan'])]);
    expect(example.code).toBe(0);
    expect(JSON.parse(example.stdout)).toEqual(exampleCase());
    expect(JSON.parse(plan.stdout)).toEqual(examplePlan());
    const publicDir = resolve(__dirname, '../../public/examples');
    expect(JSON.parse(readFileSync(join(publicDir, 'demo-case.json'), 'utf8'))).toEqual(exampleCase());
    expect(JSON.parse(readFileSync(join(publicDir, 'demo-plan.json'), 'utf8'))).toEqual(examplePlan());

    const casePath = write('example.json', example.stdout);
    const solved = await cli(['solve', casePath]);
    expect(solved.code, solved.stderr).toBe(0);
    const doc = JSON.parse(solved.stdout) as ResultDocument;
    expect(doc.format).toBe('coversweep-result');
    expect(doc.case.name).toBe('Demo 50 mm half-cover');
    expect(doc.results).toHaveLength((exampleCase().conditions as { yaw_deg: number[] }).yaw_deg.length);
    // The CLI and the library give the same numbers (compared to 1e-9 relative: the test runner's
    // module transform and tsx's need not agree to the last bit).
    const parsed = validateCase(exampleCase());
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    expect(doc.case).toEqual(parsed.value);
    expectClose(doc.results, JSON.parse(JSON.stringify(solveCase(parsed.value).results)), 'results');
  });

  it('sweep writes the documented CSV whose rows equal individual solves, and refuses to overwrite', async () => {
    const planJson = {
      format: 'coversweep-plan',
      wheel: { cover: { fraction: { from: 0, to: 1, step: 0.5 } }, spokes: { section: ['round', 'bladed'] } },
      conditions: { airspeed_mps: 12, yaw_deg: { from: 0, to: 10, step: 5 } },
      model: FAST_MODEL,
    };
    const planPath = write('plan.json', JSON.stringify(planJson));
    const { format: _format, ...singleJson } = {
      ...planJson,
      wheel: { cover: { fraction: 0.5 }, spokes: { section: 'bladed' } },
      conditions: { airspeed_mps: 12, yaw_deg: [0, 5, 10] },
    };
    const singlePath = write('single.json', JSON.stringify(singleJson));
    const out = join(dir, 'results.csv');
    const [first, single] = await Promise.all([
      cli(['sweep', planPath, '--out', 'results.csv']),
      cli(['solve', singlePath]),
    ]);
    expect(first.code, first.stderr).toBe(0);
    expect(single.code, single.stderr).toBe(0);
    expect(first.stdout).toBe('');
    const lines = readFileSync(out, 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe(tableColumns(['wheel.cover.fraction', 'wheel.spokes.section']).join(','));
    expect(lines).toHaveLength(1 + 3 * 2 * 3);
    const header = parseCsvLine(lines[0]!);
    // Row of case (fraction 0.5, bladed) at yaw 10: `solve` of that case alone gives the same numbers, exactly.
    const doc = JSON.parse(single.stdout) as ResultDocument;
    const row = parseCsvLine(lines[1 + 3 * 3 + 2]!);
    expect(row.slice(0, 3)).toEqual(['0.5', 'bladed', '10']);
    for (const key of ['axial_N', 'side_N', 'steering_moment_Nm', 'power_W', 'axial_gf_ref']) {
      expect(Number(row[header.indexOf(key)]), key).toBe(doc.results[2]![key as 'axial_N']);
    }

    const before = readFileSync(out, 'utf8');
    writeFileSync(out, 'keep me');
    const refused = await cli(['sweep', planPath, '--out', 'results.csv']);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/results\.csv: the file already exists; use --force to overwrite it/);
    expect(refused.stdout).toBe('');
    expect(readFileSync(out, 'utf8')).toBe('keep me');

    const forced = await cli(['sweep', planPath, '--out', 'results.csv', '--force']);
    expect(forced.code, forced.stderr).toBe(0);
    expect(readFileSync(out, 'utf8')).toBe(before);
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });
});

describe('coversweep main() (in process)', () => {
  function capture() {
    const out = { stdout: '', stderr: '' };
    const io = {
      stdout: (t: string) => {
        out.stdout += t;
      },
      stderr: (t: string) => {
        out.stderr += t;
      },
      stderrIsTTY: false,
      cwd: dir,
    };
    return { out, io };
  }

  it('usage errors exit 2 with nothing on stdout; --help exits 0', async () => {
    for (const args of [
      ['solve', 'x.json', '--fast'],
      ['frobnicate'],
      [],
      ['solve'],
      ['sweep', 'p.json', '--out', 'r.txt'],
    ]) {
      const { out, io } = capture();
      expect(await main(args, io), args.join(' ')).toBe(2);
      expect(out.stdout, args.join(' ')).toBe('');
      expect(out.stderr, args.join(' ')).toMatch(/coversweep|Usage/);
    }
    for (const args of [
      ['--help'],
      ['solve', '--help'],
      ['sweep', '-h'],
      ['example', '--help'],
      ['help', 'sweep'],
    ]) {
      const { out, io } = capture();
      expect(await main(args, io), args.join(' ')).toBe(0);
      expect(out.stdout, args.join(' ')).toMatch(/Usage/);
    }
  });

  it('sweep --out results.json writes every result document with its varied values', async () => {
    const planPath = write(
      'plan-json.json',
      JSON.stringify({
        wheel: { cover: { fraction: [0, 1] } },
        conditions: { airspeed_mps: 12, yaw_deg: [0, 10] },
        model: FAST_MODEL,
      }),
    );
    const { out, io } = capture();
    expect(await main(['sweep', planPath, '--out', 'sweep.json'], io), out.stderr).toBe(0);
    expect(out.stdout).toBe('');
    const doc = JSON.parse(readFileSync(join(dir, 'sweep.json'), 'utf8'));
    expect(doc.format).toBe('coversweep-sweep');
    expect(doc.varied_keys).toEqual(['wheel.cover.fraction']);
    expect(doc.runs).toHaveLength(2);
    expect(doc.runs[1].varied).toEqual({ 'wheel.cover.fraction': 1 });
    expect(doc.runs[1].result.format).toBe('coversweep-result');
    expect(doc.runs[1].result.results).toHaveLength(2);
  });
});
