/**
 * `npm run bench`: prints JSON lines of speed figures on this machine. Inputs are built before timing;
 * every result is used (summed into a checksum printed with it) so nothing is optimised away.
 * Figures are medians of repeated runs where cheap; the machine may be shared and noisy.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, symlinkSync } from 'node:fs';
import { availableParallelism, cpus, loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { luFactor } from '../src/model/numeric';
import { luKernel } from '../src/model/numeric/luKernel';
import { buildNodeWorker } from './buildNodeWorker';
import { timeWallAndCpu } from './cpuTime';
import { influenceFigures } from './influenceBuild';
import { lapackLu } from './lapackLu';
import { benchWholeProcess } from './wholeProcess';

const cores = availableParallelism();
const machine = { cores, cpu: cpus()[0]?.model ?? 'unknown', node: process.version };

/** Each line carries the machine's 1-minute load average when it was printed (the machine may be shared). */
function print(name: string, figures: Record<string, unknown>): void {
  console.log(
    JSON.stringify({ bench: name, ...figures, machine: { ...machine, load1: +loadavg()[0]!.toFixed(1) } }),
  );
}

// --- Dense LU factorisation: n = 1000, and the model's lattice sizes 648 and 288 ----------------------
// Beside it, LAPACK's LU (dgetrf through python3 + scipy, one BLAS thread) on the same matrices in the
// same run, when python3 has numpy and scipy; the ratio is printed, never asserted. Each figure also in
// CPU time (bench/cpuTime.ts), steadier than wall time when other processes share the cores.
{
  const sizes = [
    { n: 1000, repeats: 9 },
    { n: 648, repeats: 15 },
    { n: 288, repeats: 31 },
  ];
  const ours: Record<
    string,
    Record<'auto' | 'typescript', { medianMs: number; gflops: number; cpuGflops: number; checksum: number }>
  > = {};
  for (const { n, repeats } of sizes) {
    const source = new Float64Array(n * n);
    let seed = 12345;
    for (let i = 0; i < source.length; i++) {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      source[i] = seed / 2147483648 - 0.5;
    }
    for (let i = 0; i < n; i++) source[i * n + i]! += n;
    const work = new Float64Array(n * n);
    const pivots = new Int32Array(n);
    const figures = (path: 'auto' | 'typescript') => {
      work.set(source);
      luFactor(work, n, pivots, path); // compile, tier up and warm the caches before timing
      const r = timeWallAndCpu(repeats, () => {
        work.set(source);
        luFactor(work, n, pivots, path);
        return work[n * n - 1]!;
      });
      const rate = (ms: number) => +(((2 / 3) * n ** 3) / (ms * 1e-3) / 1e9).toFixed(2);
      return {
        medianMs: +r.medianMs.toFixed(2),
        gflops: rate(r.medianMs),
        cpuGflops: rate(r.medianCpuMs),
        checksum: r.checksum,
      };
    };
    ours[n] = { auto: figures('auto'), typescript: figures('typescript') };
  }
  const influence = influenceFigures();
  const lapack = lapackLu(sizes);
  const path =
    luKernel() === null
      ? 'typescript (no WebAssembly SIMD here)'
      : 'wasm-simd (panels, block rows and updates in WebAssembly)';
  for (const { n } of sizes) {
    const mine = ours[n]!.auto;
    const plain = ours[n]!.typescript;
    const ref = 'skipped' in lapack ? undefined : lapack.figures[n];
    print('lu_factor', {
      n,
      path,
      medianMs: mine.medianMs,
      gflops: mine.gflops,
      checksum: mine.checksum,
      typescriptMedianMs: plain.medianMs,
      typescriptGflops: plain.gflops,
      typescriptChecksum: plain.checksum,
      lapackGflops: ref?.gflops ?? null,
      lapackMedianMs: ref?.medianMs ?? null,
      ratioToLapack: ref ? +(mine.gflops / ref.gflops).toFixed(3) : null,
      typescriptRatioToLapack: ref ? +(plain.gflops / ref.gflops).toFixed(3) : null,
      cpuGflops: mine.cpuGflops,
      lapackCpuGflops: ref?.cpuGflops ?? null,
      cpuRatioToLapack: ref?.cpuGflops ? +(mine.cpuGflops / ref.cpuGflops).toFixed(3) : null,
      lapack: 'skipped' in lapack ? `not measured: ${lapack.skipped}` : lapack.info,
    });
  }
  // The influence build beside LAPACK's LU at n = 1000 (its flop count: bench/influenceBuild.ts).
  const ref1000 = 'skipped' in lapack ? undefined : lapack.figures[1000];
  for (const f of influence) {
    print('influence_build', {
      ...f,
      path:
        luKernel() === null
          ? 'typescript (no WebAssembly SIMD here)'
          : 'wasm-simd, two control points per f64x2',
      lapackLuGflopsN1000: ref1000?.gflops ?? null,
      ratioToLapackLu: ref1000 ? +(f.gflops / ref1000.gflops).toFixed(3) : null,
      typescriptRatioToLapackLu: ref1000 ? +(f.typescriptGflops / ref1000.gflops).toFixed(3) : null,
      lapackLuCpuGflopsN1000: ref1000?.cpuGflops ?? null,
      cpuRatioToLapackLu: ref1000?.cpuGflops ? +(f.cpuGflops / ref1000.cpuGflops).toFixed(3) : null,
      lapack: 'skipped' in lapack ? `not measured: ${lapack.skipped}` : 'dgetrf n=1000, same run',
    });
  }
}

// --- Lattice build and one design's yaw curve (bench/yawCurve.ts, in its own process per tree) --------
function yawCurveIn(root: string, label: string): void {
  const child = spawnSync('npx', ['tsx', 'bench/yawCurve.ts', resolve(root)], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  if (child.status !== 0) throw new Error(`yaw curve (${label}) failed`);
  const { latticeBuild, yawCurve } = JSON.parse(child.stdout.trim().split('\n').pop()!) as Record<
    string,
    Record<string, unknown>
  >;
  print('lattice_build', { ...latticeBuild, tree: label });
  print('yaw_curve_41', { ...yawCurve, tree: label });
}

// --- The standard sweep, each worker count in a fresh process so its peak memory is its own -------
// With COVERSWEEP_BENCH_BASELINE=<git ref> the same sweep of that commit runs in the same bench run,
// interleaved with this tree's (A, B, A, B), from a temporary git worktree sharing node_modules: the
// way to measure what a change costs on a shared, noisy machine.
function sweepIn(dir: string, workers: number, entry: string, label: string, mode = ''): void {
  const args = [
    'tsx',
    '--expose-gc',
    'bench/standardSweep.ts',
    String(workers),
    entry,
    ...(mode ? [mode] : []),
  ];
  const child = spawnSync('npx', args, {
    cwd: dir,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  if (child.status !== 0) throw new Error(`standard sweep (${label}) with ${workers} worker(s) failed`);
  for (const line of child.stdout.split('\n')) {
    if (line.trim() === '') continue;
    const figures = JSON.parse(line) as Record<string, unknown>;
    console.log(JSON.stringify({ ...figures, tree: label, load1: +loadavg()[0]!.toFixed(1) }));
  }
}
{
  const entry = buildNodeWorker();
  const baselineRef = process.env.COVERSWEEP_BENCH_BASELINE;
  let baseline: { dir: string; entry: string } | null = null;
  if (baselineRef) {
    const dir = mkdtempSync(join(tmpdir(), 'coversweep-baseline-'));
    const add = spawnSync('git', ['worktree', 'add', '--detach', dir, baselineRef], { stdio: 'ignore' });
    if (add.status !== 0) throw new Error(`git worktree add ${baselineRef} failed`);
    symlinkSync(resolve('node_modules'), join(dir, 'node_modules'));
    baseline = { dir, entry: buildNodeWorker(dir) };
  }
  try {
    for (let round = 0; round < (baseline ? 2 : 1); round++) {
      yawCurveIn('.', 'current');
      if (baseline) yawCurveIn(baseline.dir, `baseline ${baselineRef}`);
    }
    for (const workers of [...new Set([1, cores])]) {
      sweepIn('.', workers, entry, 'current');
      if (baseline) sweepIn(baseline.dir, workers, baseline.entry, `baseline ${baselineRef}`);
    }
    // The design map of the target: the 126 designs with their yaw curves at one speed, on every
    // core, as the page solves a map (no convergence lattices); the model work alone, without the page.
    sweepIn('.', cores, entry, 'current', 'map');
    // (A baseline from before this bench existed has no map mode: its script would run the whole sweep.)
    if (baseline && readFileSync(join(baseline.dir, 'bench/standardSweep.ts'), 'utf8').includes("'map'"))
      sweepIn(baseline.dir, cores, baseline.entry, `baseline ${baselineRef}`, 'map');
    // --- The command line as a whole process: start-up and the standard plan, compiled (and the
    // baseline's compiled command line, interleaved) against tsx ----
    benchWholeProcess(print, baseline ? { label: `baseline ${baselineRef}`, dir: baseline.dir } : undefined);
  } finally {
    if (baseline) spawnSync('git', ['worktree', 'remove', '--force', baseline.dir], { stdio: 'ignore' });
  }
}
