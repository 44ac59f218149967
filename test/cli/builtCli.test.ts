import { spawnSync } from 'node:child_process';
import {
  cpSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  renameSync,
  rmSync,
  statSync,
  symlinkSync,
  unlinkSync,
  utimesSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { builtCli, CLI_OUT_DIR, STAMP_FILE, sourceFingerprint } from '../../bin/builtCli.mjs';

// The compiled command line (vite.cli.config.ts -> dist-cli/, run by bin/coversweep.mjs when its stamp
// matches the sources) against the TypeScript sources run through tsx. Every build and run here is in a
// temporary copy of the repository: the real src/ and dist-cli/ are never touched.
const ROOT = resolve(__dirname, '../..');
const temps: string[] = [];
afterAll(() => {
  for (const dir of temps) rmSync(dir, { recursive: true, force: true });
});
function tempDir(prefix: string): string {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  temps.push(dir);
  return dir;
}

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}
/** bin/coversweep.mjs of the tree at `root`, in `cwd`; `fromSource` forces the tsx path. */
function runBin(root: string, args: string[], cwd: string, fromSource: boolean): Run {
  const env = { ...process.env };
  delete env.COVERSWEEP_FROM_SOURCE;
  if (fromSource) env.COVERSWEEP_FROM_SOURCE = '1';
  const r = spawnSync(process.execPath, [join(root, 'bin/coversweep.mjs'), ...args], {
    cwd,
    env,
    encoding: 'utf8',
    timeout: 120_000,
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

/**
 * Progress lines on stderr carry elapsed times, and how many intermediate lines print depends on how
 * fast the run goes (at most one per two seconds): drop the intermediate ones, keep the final 100 % line
 * with its times masked; everything else must match to the byte.
 */
function withoutTimes(run: Run): Run {
  const stderr = run.stderr
    .split('\n')
    .filter((line) => !/^sweep: \d{1,2}% \d+\/\d+ cases, /.test(line))
    .join('\n')
    .replace(/\d+(\.\d+)? s\b/g, '<t> s');
  return { ...run, stderr };
}

/** A copy of what the CLI's build reads, with node_modules linked to the real one. */
function copyOfRepository(): string {
  const copy = tempDir('coversweep-repo-');
  for (const part of ['bin', 'src', 'workers'])
    cpSync(join(ROOT, part), join(copy, part), { recursive: true });
  for (const file of ['package.json', 'package-lock.json', 'vite.cli.config.ts', 'tsconfig.json']) {
    cpSync(join(ROOT, file), join(copy, file));
  }
  symlinkSync(join(ROOT, 'node_modules'), join(copy, 'node_modules'), 'dir');
  return copy;
}

describe('the compiled command line', () => {
  it('gives byte-identical output to the sources, needs no installed package, and falls back when stale', () => {
    const copy = copyOfRepository();
    const build = spawnSync(
      process.execPath,
      [join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--config', 'vite.cli.config.ts'],
      { cwd: copy, encoding: 'utf8', timeout: 120_000 },
    );
    expect(build.status, `build failed:\n${build.stderr}`).toBe(0);
    expect(builtCli(copy), 'the fresh build is found').toBeDefined();

    // The same commands, once from the real sources through tsx, once compiled in the copy without
    // node_modules: neither the CLI nor its worker threads may need tsx or any installed package.
    const work = tempDir('coversweep-work-');
    const source = (args: string[]) => runBin(ROOT, args, work, true);
    writeFileSync(join(work, 'case.json'), source(['example']).stdout);
    writeFileSync(join(work, 'plan.json'), source(['example', '--plan']).stdout);
    unlinkSync(join(copy, 'node_modules'));
    const compiled = (args: string[]) => runBin(copy, args, work, false);
    const commands: string[][] = [
      ['--help'],
      ['--version'],
      ['sweep', '--help'],
      ['example'],
      ['example', '--plan'],
      ['solve', 'case.json'],
      ['solve', 'missing.json'],
      ['sweep', 'plan.json', '--workers', '0'],
    ];
    for (const args of commands) {
      const want = withoutTimes(source(args));
      const got = withoutTimes(compiled(args));
      expect(got, `coversweep ${args.join(' ')}: compiled vs source`).toEqual(want);
    }
    // Pooled sweeps into files: the exit code, stdout, stderr and the file bytes agree.
    for (const workers of ['1', '2']) {
      const want = source(['sweep', 'plan.json', '--workers', workers, '--out', `${workers}.csv`]);
      renameSync(join(work, `${workers}.csv`), join(work, `source-${workers}.csv`));
      const got = compiled(['sweep', 'plan.json', '--workers', workers, '--out', `${workers}.csv`]);
      const label = `sweep --workers ${workers}: compiled ${got.stderr} vs source ${want.stderr}`;
      expect(withoutTimes(got), label).toEqual(withoutTimes(want));
      expect(got.status, label).toBe(0);
      const wantBytes = readFileSync(join(work, `source-${workers}.csv`));
      expect(wantBytes.length, label).toBeGreaterThan(0);
      expect(readFileSync(join(work, `${workers}.csv`)).equals(wantBytes), label).toBe(true);
    }

    // Which path runs: a marker in place of the compiled CLI shows that a fresh stamp runs the build,
    // and a source edited after the build runs the sources (the real help text) again.
    symlinkSync(join(ROOT, 'node_modules'), join(copy, 'node_modules'), 'dir');
    writeFileSync(
      join(copy, CLI_OUT_DIR, 'cli/main.mjs'),
      "export async function main() { process.stdout.write('compiled marker\\n'); return 0; }\n",
    );
    expect(compiled(['--help']).stdout).toBe('compiled marker\n');
    const edited = join(copy, 'src/cli/main.ts');
    const later = new Date(statSync(edited).mtimeMs + 10_000);
    utimesSync(edited, later, later);
    expect(builtCli(copy), 'a source newer than the build').toBeUndefined();
    const fallback = compiled(['--help']);
    expect(fallback).toEqual(source(['--help']));
  }, 300_000);
});

describe('the build stamp (sourceFingerprint, builtCli)', () => {
  /** A small tree shaped like the repository, with a stamp matching it. */
  function stampedTree(): string {
    const root = tempDir('coversweep-stamp-');
    for (const dir of ['src/cli', 'src/ui', 'workers', `${CLI_OUT_DIR}/cli`, `${CLI_OUT_DIR}/workers`]) {
      mkdirSync(join(root, dir), { recursive: true });
    }
    for (const file of ['src/cli/main.ts', 'src/ui/page.ts', 'workers/solver.node.ts', 'package.json']) {
      writeFileSync(join(root, file), `// ${file}\n`);
    }
    for (const file of ['cli/main.mjs', 'workers/solver.node.mjs']) {
      writeFileSync(join(root, CLI_OUT_DIR, file), '');
    }
    const stamp = { fingerprint: sourceFingerprint(root) };
    writeFileSync(join(root, CLI_OUT_DIR, STAMP_FILE), JSON.stringify(stamp));
    return root;
  }

  it('finds a build whose stamp matches, with its CLI and worker entries', () => {
    const root = stampedTree();
    expect(builtCli(root)).toEqual({
      main: join(root, CLI_OUT_DIR, 'cli/main.mjs'),
      worker: join(root, CLI_OUT_DIR, 'workers/solver.node.mjs'),
    });
  });

  const changes: [string, (root: string) => void][] = [
    [
      'a source touched later',
      (r) => utimesSync(join(r, 'src/cli/main.ts'), new Date(), new Date(Date.now() + 5000)),
    ],
    ['a source rewritten', (r) => writeFileSync(join(r, 'workers/solver.node.ts'), '// changed, longer\n')],
    ['a new source file', (r) => writeFileSync(join(r, 'src/cli/extra.ts'), '')],
    ['a removed source file', (r) => rmSync(join(r, 'src/cli/main.ts'))],
    ['package-lock.json appearing', (r) => writeFileSync(join(r, 'package-lock.json'), '{}')],
    ['no stamp', (r) => rmSync(join(r, CLI_OUT_DIR, STAMP_FILE))],
    ['a broken stamp', (r) => writeFileSync(join(r, CLI_OUT_DIR, STAMP_FILE), '{"finger')],
    ['no compiled worker', (r) => rmSync(join(r, CLI_OUT_DIR, 'workers/solver.node.mjs'))],
  ];
  it.each(changes)('falls back to the sources after %s', (_label, change) => {
    const root = stampedTree();
    change(root);
    expect(builtCli(root)).toBeUndefined();
  });

  it('ignores the page (src/ui), which the command line never imports', () => {
    const root = stampedTree();
    writeFileSync(join(root, 'src/ui/page.ts'), '// edited page code\n');
    expect(builtCli(root)).toBeDefined();
  });
});
