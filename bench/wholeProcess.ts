/**
 * Whole-process figures of the command line as users run it: `coversweep --help` and a sweep of the
 * standard plan (the same 20,664 points as bench/standardSweep.ts, written as a plan file), each a fresh
 * `node bin/coversweep.mjs` process, compiled (dist-cli/, `npm run build:cli`) against the sources
 * through tsx (COVERSWEEP_FROM_SOURCE=1). Medians of a few runs; printed, never asserted. Each sweep
 * process also reports when its phases happened (bench/phaseMarks.mjs): workers created and ready, the
 * first job sent, the first and last answers, the output moved into place, the exit.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
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

const PEAK_RSS = resolve('bench/peakRss.mjs');
const PHASE_MARKS = resolve('bench/phaseMarks.mjs');

/** Times (ms from the process's start) of a sweep's phases (bench/phaseMarks.mjs), for the workers:
 * the first created, the first ready (its entry loaded), the first job sent, the first answer, the
 * last answer (of every worker); then the output moved into place and the exit. */
interface Phases {
  workerCreated: number;
  workerReady: number;
  firstJobSent: number;
  firstResult: number;
  lastResult: number;
  outputMoved: number;
  exit: number;
}

interface ProcessFigures {
  ms: number;
  /** Peak resident memory (MB) and CPU time (ms) of the whole process, every thread (bench/peakRss.mjs). */
  peakRssMB: number;
  cpuMs: number;
  phases?: Phases;
}

interface PhaseLine {
  workers: Array<{
    created: number;
    ready: number | null;
    firstJob: number | null;
    firstResult: number | null;
    lastResult: number | null;
  }>;
  moved: number | null;
  exit: number;
}

function phasesOf(line: PhaseLine): Phases | undefined {
  const w = line.workers;
  const least = (xs: Array<number | null>) => Math.min(...xs.map((x) => x ?? Number.NaN));
  if (w.length === 0 || line.moved === null) return undefined;
  return {
    workerCreated: least(w.map((x) => x.created)),
    workerReady: least(w.map((x) => x.ready)),
    firstJobSent: least(w.map((x) => x.firstJob)),
    firstResult: least(w.map((x) => x.firstResult)),
    lastResult: Math.max(...w.map((x) => x.lastResult ?? Number.NaN)),
    outputMoved: line.moved,
    exit: line.exit,
  };
}

/** Wall time, peak memory and CPU time of one process; throws on a non-zero exit. */
function timeProcess(command: string, args: string[], cwd: string, fromSource: boolean): ProcessFigures {
  const env = { ...process.env };
  delete env.COVERSWEEP_FROM_SOURCE;
  if (fromSource) env.COVERSWEEP_FROM_SOURCE = '1';
  const node = command === process.execPath;
  const t0 = performance.now();
  const preload = ['--import', pathToFileURL(PHASE_MARKS).href, '--import', pathToFileURL(PEAK_RSS).href];
  const r = spawnSync(command, node ? [...preload, ...args] : args, {
    cwd,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
    maxBuffer: 1 << 26,
  });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${r.stderr}`);
  // The preloads' lines at exit (the phases, then the usage: exit handlers run in the order registered;
  // a worker thread's copy of peakRss.mjs writes one too, earlier, the main thread's is the last).
  const lines = node ? String(r.stderr).trim().split('\n') : [];
  const last = lines.pop();
  const usage = last ? (JSON.parse(last) as { peakRssKB: number; cpuMs: number }) : undefined;
  const phaseLine = lines.filter((l) => l.startsWith('{"phases":')).pop();
  const phases = phaseLine ? phasesOf((JSON.parse(phaseLine) as { phases: PhaseLine }).phases) : undefined;
  return {
    ms,
    peakRssMB: usage ? usage.peakRssKB / 1024 : Number.NaN,
    cpuMs: usage?.cpuMs ?? Number.NaN,
    ...(phases ? { phases } : {}),
  };
}

/** Whole-process figures; `baseline` (a tree with its own dist-cli/, built here) is timed beside this one. */
export function benchWholeProcess(print: Print, baseline?: { label: string; dir: string }): void {
  const build = spawnSync('npm', ['run', '--silent', 'build:cli'], {
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (build.status !== 0) throw new Error('npm run build:cli failed');
  if (baseline) {
    const other = spawnSync('npm', ['run', '--silent', 'build:cli'], {
      cwd: baseline.dir,
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    if (other.status !== 0) throw new Error(`npm run build:cli failed in ${baseline.dir}`);
  }
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
    Math.round(median(Array.from({ length: runs }, () => timeProcess(command, args, '.', fromSource).ms)));
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
    // The compiled sweep of this tree and (COVERSWEEP_BENCH_BASELINE) of the baseline's, interleaved run
    // by run, with 1 and 2 workers; the tsx sweep of this tree once per worker count.
    const trees = [
      { label: 'current', bin: BIN },
      ...(baseline ? [{ label: baseline.label, bin: join(baseline.dir, 'bin/coversweep.mjs') }] : []),
    ];
    const sweepRuns = Number(process.env.COVERSWEEP_BENCH_PROCESS_RUNS ?? 5);
    const hashes = new Set<string>();
    const runs = new Map<string, ProcessFigures[]>();
    const sweep = (bin: string, workers: number, fromSource: boolean, out: string): ProcessFigures => {
      const args = [bin, 'sweep', 'plan.json', '--workers', String(workers), '--out', out];
      const figures = timeProcess(process.execPath, args, dir, fromSource);
      hashes.add(
        createHash('sha256')
          .update(readFileSync(join(dir, out)))
          .digest('hex'),
      );
      rmSync(join(dir, out));
      return figures;
    };
    for (let i = 0; i < sweepRuns; i++) {
      for (const workers of [1, 2]) {
        for (const tree of trees) {
          const key = `${tree.label}|${workers}`;
          runs.set(key, [...(runs.get(key) ?? []), sweep(tree.bin, workers, false, `${i}-${workers}.csv`)]);
        }
      }
    }
    const tsxMs = [1, 2].map((workers) => Math.round(sweep(BIN, workers, true, `tsx-${workers}.csv`).ms));
    for (const tree of trees) {
      const of = (workers: number, pick: (f: ProcessFigures) => number) =>
        median(runs.get(`${tree.label}|${workers}`)!.map(pick));
      const one = of(1, (f) => f.ms);
      const two = of(2, (f) => f.ms);
      print('standard_plan_process', {
        tree: tree.label,
        points: 20_664,
        runs: sweepRuns,
        built1WorkerMedianMs: Math.round(one),
        built2WorkersMedianMs: Math.round(two),
        speedUp1To2: +(one / two).toFixed(2),
        cpuMs1Worker: Math.round(of(1, (f) => f.cpuMs)),
        cpuMs2Workers: Math.round(of(2, (f) => f.cpuMs)),
        peakRssMB1Worker: Math.round(of(1, (f) => f.peakRssMB)),
        peakRssMB2Workers: Math.round(of(2, (f) => f.peakRssMB)),
        all2WorkerMs: runs.get(`${tree.label}|2`)!.map((f) => Math.round(f.ms)),
        all1WorkerCpuMs: runs.get(`${tree.label}|1`)!.map((f) => Math.round(f.cpuMs)),
        all2WorkersCpuMs: runs.get(`${tree.label}|2`)!.map((f) => Math.round(f.cpuMs)),
        ...(tree.label === 'current' ? { tsx1WorkerMs: tsxMs[0], tsx2WorkersMs: tsxMs[1] } : {}),
      });
      // Where the time goes, medians over the runs, ms from the process's start (bench/phaseMarks.mjs).
      for (const workers of [1, 2]) {
        const list = runs.get(`${tree.label}|${workers}`)!.flatMap((f) => (f.phases ? [f.phases] : []));
        if (list.length === 0) continue;
        const phase = (name: keyof Phases) => Math.round(median(list.map((p) => p[name])));
        print('standard_plan_process_phases', {
          tree: tree.label,
          workers,
          runs: list.length,
          firstWorkerCreatedMs: phase('workerCreated'),
          firstWorkerReadyMs: phase('workerReady'),
          firstJobSentMs: phase('firstJobSent'),
          firstResultMs: phase('firstResult'),
          lastResultMs: phase('lastResult'),
          outputMovedMs: phase('outputMoved'),
          exitMs: phase('exit'),
        });
      }
    }
    print('standard_plan_outputs', { identical: hashes.size === 1, sha256: [...hashes][0]!.slice(0, 16) });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

// On its own (`npx tsx bench/wholeProcess.ts [BASELINE_DIR]`): only these figures, with another tree's
// command line (a checkout with its node_modules, e.g. a `git worktree` of main) interleaved when given.
// COVERSWEEP_BENCH_PROCESS_RUNS sets the sweeps per tree and worker count (default 5).
if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) {
  const baselineDir = process.argv[2];
  benchWholeProcess(
    (name, figures) =>
      console.log(JSON.stringify({ bench: name, ...figures, load1: +loadavg()[0]!.toFixed(1) })),
    baselineDir ? { label: `baseline ${baselineDir}`, dir: resolve(baselineDir) } : undefined,
  );
}
