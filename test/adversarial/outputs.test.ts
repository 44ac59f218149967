/**
 * Outputs under accident and attack (issue 14, items 1, 5, 8): a full disk, a read-only file system, a
 * closed or broken stdout, a missing folder, a folder, symbolic links, devices, FIFOs and sockets under
 * the output's name, and two writers racing for one name. Every write is checked: exit 2 with one plain
 * line (no stack trace), nothing under the final name unless it is whole, a kept `.partial` ends on a
 * row boundary, a finished result is never thrown away, a special file is never replaced. The disk-full
 * cases mount an 8 kB tmpfs, which needs root: elsewhere they are skipped with a notice.
 */
import { execFileSync } from 'node:child_process';
import {
  closeSync,
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  openSync,
  readdirSync,
  readFileSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { exampleCase } from '../../src/cli/examples';
import { main } from '../../src/cli/main';
import { parseCsvLine, tableColumns } from '../../src/compute/resultTable';
import { cliProcess, type ProcessRun } from './cliProcess';
import { family, STACK_TRACE } from './tally';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-outputs-'));
const full = join(dir, 'full');
const readOnly = join(dir, 'ro');
let mounted: string[] = [];
let canMount = false;

const outputs = family(
  'CLI: outputs (disk full, special files, two writers)',
  'test/adversarial/outputs.test.ts',
);

beforeAll(() => {
  mkdirSync(full);
  mkdirSync(readOnly);
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=8k', 'tmpfs', full], { stdio: 'ignore' });
    mounted.push(full);
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=64k', 'tmpfs', readOnly], { stdio: 'ignore' });
    mounted.push(readOnly);
    execFileSync('mount', ['-o', 'remount,ro', readOnly], { stdio: 'ignore' });
    canMount = true;
  } catch {
    console.warn(
      'notice: cannot mount a small tmpfs here (needs root): the disk-full and read-only cases are skipped',
    );
  }
});
afterAll(() => {
  for (const m of mounted.reverse()) {
    try {
      execFileSync('umount', [m], { stdio: 'ignore' });
    } catch {
      // left for the system
    }
  }
  mounted = [];
  rmSync(dir, { recursive: true, force: true });
  outputs.save();
});

/** A case whose result document is ~40 kB (8 airspeeds x 5 yaws); a plan of 6 such cases. */
const bigCase = {
  ...(exampleCase() as { wheel: Record<string, unknown> }),
  conditions: { airspeed_mps: [5, 8, 11, 14, 17, 20, 23, 26], yaw_deg: [0, 5, 10, 15, 20] },
  model: { lattice_span: 10, lattice_chord: 6, grid_convergence: false },
};
const plan = {
  ...bigCase,
  format: 'coversweep-plan',
  wheel: { ...bigCase.wheel, rim_depth_m: [0.02, 0.03, 0.04, 0.05, 0.06, 0.07, 0.08, 0.09] },
};

function tally(r: ProcessRun): ProcessRun {
  outputs.tried++;
  if (r.hung) outputs.hangs++;
  if (r.code === 1 || STACK_TRACE.test(r.stderr) || r.signal !== null) outputs.crashes++;
  return r;
}

/** Exit 2 with one `coversweep: error:` line, no stack trace, nothing under the final name. */
function expectWriteRefused(r: ProcessRun, finalPath: string | null, message: RegExp, what: string): void {
  expect(r.code, `${what}: ${r.stderr}`).toBe(2);
  const errors = r.stderr.split('\n').filter((l) => l.startsWith('coversweep: error:'));
  expect(errors.length, `${what}: one error line\n${r.stderr}`).toBe(1);
  expect(errors[0], what).toMatch(message);
  expect(r.stderr, what).not.toMatch(STACK_TRACE);
  if (finalPath !== null) expect(existsSync(finalPath), `${what}: nothing under ${finalPath}`).toBe(false);
}

/** A kept CSV partial: whole rows only (each with every column); returns its row count. */
function csvPartialRows(path: string): number {
  const text = readFileSync(path, 'utf8');
  expect(text.endsWith('\n'), `${path} ends on a row boundary`).toBe(true);
  const lines = text.slice(0, -1).split('\n');
  const width = tableColumns(['wheel.rim_depth_m']).length;
  for (const line of lines) {
    const cut = parseCsvLine(line).length !== width;
    if (cut) outputs.lostRows++;
    expect(cut, `${path}: a whole row: ${line.slice(0, 80)}`).toBe(false);
  }
  return lines.length - 1;
}

describe.runIf(process.platform === 'linux')('outputs on a full or read-only disk', () => {
  it('solve --out, sweep --out (CSV in process, JSON pooled) and solve > file on an 8 kB disk: exit 2, no file, whole rows kept', async (ctx) => {
    if (!canMount) ctx.skip();
    writeFileSync(join(dir, 'case.json'), JSON.stringify(bigCase));
    writeFileSync(join(dir, 'plan.json'), JSON.stringify(plan));
    const solve = tally(await cliProcess(['solve', 'case.json', '--out', join(full, 'r.json')], dir));
    expectWriteRefused(
      solve,
      join(full, 'r.json'),
      /cannot write .*r\.json: the disk is full \(ENOSPC\)/,
      'solve --out',
    );
    expect(readdirSync(full), 'no temporary file left').toEqual([]);

    for (const [out, workers] of [
      ['s.csv', '0'],
      ['p.json', '2'],
    ] as const) {
      const run = tally(
        await cliProcess(['sweep', 'plan.json', '--out', join(full, out), '--workers', workers], dir),
      );
      expectWriteRefused(
        run,
        join(full, out),
        /the disk is full \(ENOSPC\); .* not written; (the finished rows are in|no rows had finished)/,
        `sweep ${out}`,
      );
      const kept = readdirSync(full).filter((f) => f.startsWith(`${out}.partial`));
      expect(readdirSync(full).filter((f) => f.endsWith('.tmp'))).toEqual([]);
      if (out.endsWith('.csv') && kept.length > 0) csvPartialRows(join(full, kept[0]!));
      if (out.endsWith('.json') && kept.length > 0) {
        const text = readFileSync(join(full, kept[0]!), 'utf8');
        // Whole runs only: every line after the header parses as one run.
        for (const line of text.split('\n').slice(6)) {
          if (line === '') continue;
          expect(
            () => JSON.parse(line.replace(/^,?/, '').replace(/,$/, '')),
            line.slice(0, 60),
          ).not.toThrow();
        }
      }
      for (const f of readdirSync(full)) rmSync(join(full, f));
    }

    const fd = openSync(join(full, 'stdout.json'), 'w');
    const redirected = tally(
      await cliProcess(['solve', 'case.json'], dir, { stdio: ['ignore', fd, 'pipe'] }),
    );
    closeSync(fd);
    expectWriteRefused(
      redirected,
      null,
      /cannot write to standard output: the disk is full \(ENOSPC\); the output is incomplete/,
      'solve > file',
    );
    rmSync(join(full, 'stdout.json'));
  }, 180_000);

  it('a read-only file system: exit 2 with the reason, nothing written', async (ctx) => {
    if (!canMount) ctx.skip();
    writeFileSync(join(dir, 'case.json'), JSON.stringify(bigCase));
    const r = tally(await cliProcess(['solve', 'case.json', '--out', join(readOnly, 'r.json')], dir));
    expectWriteRefused(
      r,
      join(readOnly, 'r.json'),
      /cannot create a file in .*ro: the file system is read-only \(EROFS\)/,
      'read-only',
    );
  });
});

describe('stdout closed or broken', () => {
  it('solve >&- exits 2 (not 0 with nothing written); a reader that closes the pipe gives exit 2', async () => {
    writeFileSync(join(dir, 'case.json'), JSON.stringify(bigCase));
    const closed = tally(
      await cliProcess([], dir, {
        shell: `"${process.execPath}" "${join(__dirname, '../../bin/coversweep.mjs')}" solve case.json >&-`,
      }),
    );
    expectWriteRefused(closed, null, /standard output: it is closed; nothing was written/, 'solve >&-');
    writeFileSync(join(dir, 'plan.json'), JSON.stringify(plan));
    const piped = tally(
      await cliProcess([], dir, {
        shell: `"${process.execPath}" "${join(__dirname, '../../bin/coversweep.mjs')}" sweep plan.json --workers 0 | head -c 100 > /dev/null`,
      }),
    );
    // The pipeline's exit status is head's: the message tells what the command did.
    expect(piped.stderr).toMatch(/cannot write to standard output: the reading end was closed \(EPIPE\)/);
    expect(piped.stderr).not.toMatch(STACK_TRACE);
  }, 120_000);
});

describe('output paths that are not new names or regular files', () => {
  let server: Server | null = null;
  afterAll(() => server?.close());

  async function solveTo(out: string, force: boolean) {
    let stderr = '';
    const code = await main(['solve', 'case.json', '--out', out, ...(force ? ['--force'] : [])], {
      stdout: () => undefined,
      stderr: (t) => {
        stderr += t;
      },
      stderrIsTTY: false,
      cwd: dir,
    });
    outputs.tried++;
    if (code === 1 || STACK_TRACE.test(stderr)) outputs.crashes++;
    return { code, stderr };
  }

  it('missing folder, folder, links, FIFO, device node and socket: refused, with or without --force, and left as they were', async () => {
    writeFileSync(join(dir, 'case.json'), JSON.stringify(exampleCase()));
    mkdirSync(join(dir, 'a-folder.json'));
    execFileSync('mkfifo', [join(dir, 'fifo.json')]);
    writeFileSync(join(dir, 'target.json'), 'keep');
    symlinkSync(join(dir, 'target.json'), join(dir, 'link.json'));
    symlinkSync(join(dir, 'nowhere.json'), join(dir, 'dangling.json'));
    let device = false;
    try {
      execFileSync('mknod', [join(dir, 'null.json'), 'c', '1', '3'], { stdio: 'ignore' });
      device = true;
    } catch {
      console.warn('notice: cannot make a device node here (needs root): that case is skipped');
    }
    const socketPath = join(dir, 'sock.json');
    server = createServer();
    await new Promise<void>((done) => server!.listen(socketPath, done));

    const cases: Array<[string, RegExp]> = [
      [join(dir, 'no-such-folder', 'r.json'), /the folder .*no-such-folder does not exist/],
      ['a-folder.json', /is a folder, not a regular file/],
      ['fifo.json', /is a FIFO \(named pipe\), not a regular file/],
      ['link.json', /is a symbolic link \(to a file\)/],
      ['dangling.json', /is a symbolic link \(to a missing file\)/],
      ['sock.json', /is a socket, not a regular file/],
      ...(device
        ? ([['null.json', /is a character device, not a regular file/]] as Array<[string, RegExp]>)
        : []),
    ];
    for (const [out, message] of cases) {
      for (const force of [false, true]) {
        const before = existsSync(join(dir, out)) ? lstatSync(join(dir, out)) : null;
        const r = await solveTo(out, force);
        expect(r.code, `${out} force=${force}: ${r.stderr}`).toBe(2);
        expect(r.stderr, `${out} force=${force}`).toMatch(message);
        if (before) {
          const after = lstatSync(join(dir, out));
          expect([after.ino, after.mode, after.rdev], `${out} untouched`).toEqual([
            before.ino,
            before.mode,
            before.rdev,
          ]);
        }
      }
    }
    expect(readFileSync(join(dir, 'target.json'), 'utf8')).toBe('keep');
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
    // A regular file: refused without --force, replaced with it.
    writeFileSync(join(dir, 'old.json'), 'old');
    expect((await solveTo('old.json', false)).code).toBe(2);
    expect(readFileSync(join(dir, 'old.json'), 'utf8')).toBe('old');
    expect((await solveTo('old.json', true)).code).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'old.json'), 'utf8')).format).toBe('coversweep-result');
    expect(statSync(join(dir, 'old.json')).isFile()).toBe(true);
  });

  /** Start a sweep to `out`; once it has checked the name and opened its temporary file, `intrude`
   * takes the name (another writer finishing first, a link appearing). Returns the run and whether the
   * name could be taken before the sweep finished. */
  async function sweepWhileNameTaken(out: string, intrude: () => void) {
    const run = cliProcess(['sweep', 'plan2.json', '--out', out, '--workers', '0'], dir);
    for (let i = 0; i < 800 && !readdirSync(dir).some((f) => f.startsWith(`.${out}.`)); i++) {
      await new Promise((done) => setTimeout(done, 25));
    }
    let taken = true;
    try {
      intrude();
    } catch {
      taken = false; // the sweep had finished already (the name is its output)
    }
    return { run: tally(await run), taken };
  }

  it('a name taken while the sweep runs (another writer, a dangling link): every row kept in OUT.new, said, exit 2; the intruder left alone', async () => {
    writeFileSync(
      join(dir, 'plan2.json'),
      JSON.stringify({
        ...plan,
        wheel: { ...plan.wheel, rim_depth_m: { from: 0.02, to: 0.059, step: 0.001 } },
        model: { lattice_span: 16, lattice_chord: 8, grid_convergence: false },
      }),
    );
    const expected = await cliProcess(['sweep', 'plan2.json', '--workers', '0'], dir);
    const other = await sweepWhileNameTaken('race.csv', () =>
      writeFileSync(join(dir, 'race.csv'), 'the other writer', { flag: 'wx' }),
    );
    const late = await sweepWhileNameTaken('late.csv', () =>
      symlinkSync(join(dir, 'nowhere-else'), join(dir, 'late.csv')),
    );
    for (const [name, { run, taken }, reason] of [
      ['race.csv', other, /the file already exists; use --force to overwrite it/],
      ['late.csv', late, /is a symbolic link \(to a missing file\)/],
    ] as const) {
      if (!taken) {
        console.warn(`notice: the sweep to ${name} finished before its name could be taken (a busy machine)`);
        expect(run.code).toBe(0);
        continue;
      }
      expect(run.code, run.stderr).toBe(2);
      expect(run.stderr, `${run.stderr}\n${JSON.stringify(readdirSync(dir))}`).toMatch(
        new RegExp(
          `${name.replace('.', '\\.')} was taken while the run went on \\(${reason.source}.*\\); nothing was replaced, and the finished output is kept in .*${name.replace('.', '\\.')}\\.new`,
        ),
      );
      const kept = readFileSync(join(dir, `${name}.new`), 'utf8');
      if (kept !== expected.stdout)
        outputs.lostRows += Math.abs(kept.split('\n').length - expected.stdout.split('\n').length) || 1;
      expect(kept === expected.stdout, `${name}.new holds the whole output`).toBe(true);
    }
    if (other.taken) expect(readFileSync(join(dir, 'race.csv'), 'utf8')).toBe('the other writer');
    if (late.taken) expect(lstatSync(join(dir, 'late.csv')).isSymbolicLink()).toBe(true);
  }, 120_000);
});
