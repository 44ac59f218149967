/**
 * Whole-process figures of the command line as users run it: `coversweep --help` and a sweep of the
 * standard plan (the same 20,664 points as bench/standardSweep.ts, written as a plan file), each a fresh
 * `node bin/coversweep.mjs` process, compiled (dist-cli/, `npm run build:cli`) against the sources
 * through tsx (COVERSWEEP_FROM_SOURCE=1). Medians of a few runs; printed, never asserted.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { builtCli, sourceFingerprint } from '../bin/builtCli.mjs';
import { median } from './timing';

type Print = (name: string, figures: Record<string, unknown>) => void;

const BIN = resolve('bin/coversweep.mjs');

/** The standard sweep (21 cover fractions x 6 rim depths x 41 yaws x 4 airspeeds) as a plan file. */
const STANDARD_PLAN = {
  format: 'coversweep-plan',
  version: 1,
  name: 'bench standard sweep',
  wheel: {
    rim_depth_m: [0.02, 0.035, 0.05, 0.065, 0.08, 0.09],
    cover: { fraction: { from: 0, to: 1, step: 0.05 }, placement: 'rim', sides: 2 },
  },
  conditions: {
    airspeed_mps: [6, 8, 10, 13.41],
    yaw_deg: { from: 0, to: 20, step: 0.5 },
    air_density_kgpm3: 1.225,
  },
};

/** Wall time of one process (ms); throws on a non-zero exit. */
function timeProcess(command: string, args: string[], cwd: string, fromSource: boolean): number {
  const env = { ...process.env };
  delete env.COVERSWEEP_FROM_SOURCE;
  if (fromSource) env.COVERSWEEP_FROM_SOURCE = '1';
  const t0 = performance.now();
  const r = spawnSync(command, args, { cwd, env, stdio: ['ignore', 'pipe', 'pipe'], maxBuffer: 1 << 26 });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${r.stderr}`);
  return ms;
}

export function benchWholeProcess(print: Print): void {
  const build = spawnSync('npm', ['run', '--silent', 'build:cli'], {
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (build.status !== 0) throw new Error('npm run build:cli failed');
  const t0 = performance.now();
  const built = builtCli(resolve('.'));
  const checkMs = performance.now() - t0;
  if (!built) throw new Error('dist-cli/ is stale right after npm run build:cli (a source changed?)');
  const warm: number[] = [];
  for (let i = 0; i < 9; i++) {
    const t = performance.now();
    sourceFingerprint(resolve('.'));
    warm.push(performance.now() - t);
  }
  print('cli_stamp_check', { firstMs: +checkMs.toFixed(2), warmMedianMs: +median(warm).toFixed(2) });

  const runs = 5;
  const help = (command: string, args: string[], fromSource: boolean) =>
    Math.round(median(Array.from({ length: runs }, () => timeProcess(command, args, '.', fromSource))));
  print('cli_help_process', {
    runs,
    builtMedianMs: help(process.execPath, [BIN, '--help'], false),
    tsxMedianMs: help(process.execPath, [BIN, '--help'], true),
    npxBuiltMedianMs: help('npx', ['coversweep', '--help'], false),
    npxTsxMedianMs: help('npx', ['coversweep', '--help'], true),
  });

  const dir = mkdtempSync(join(tmpdir(), 'coversweep-bench-cli-'));
  try {
    writeFileSync(join(dir, 'plan.json'), JSON.stringify(STANDARD_PLAN));
    const sweepRuns = 3;
    for (const workers of [1, 2]) {
      const figures: Record<string, unknown> = { points: 20_664, workers, runs: sweepRuns };
      const hashes: string[] = [];
      for (const [label, fromSource] of [
        ['built', false],
        ['tsx', true],
      ] as const) {
        const times: number[] = [];
        for (let i = 0; i < sweepRuns; i++) {
          const out = `${label}-${workers}-${i}.csv`;
          const args = [BIN, 'sweep', 'plan.json', '--workers', String(workers), '--out', out];
          times.push(timeProcess(process.execPath, args, dir, fromSource));
          hashes.push(
            createHash('sha256')
              .update(readFileSync(join(dir, out)))
              .digest('hex'),
          );
          rmSync(join(dir, out));
        }
        figures[`${label}MedianMs`] = Math.round(median(times));
      }
      figures.outputsIdentical = hashes.every((h) => h === hashes[0]);
      figures.sha256 = hashes[0]!.slice(0, 16);
      print('standard_plan_process', figures);
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
