/**
 * `npm run bench:limits`: memory and time of the largest sweeps the command line allows. Prints JSON
 * lines; never fails. Figures: resident set size (RSS) before, at its sampled peak and after; MB = 10^6
 * bytes. The sweep streams its rows to a file as it goes, so the rows themselves do not accumulate;
 * what does is the expanded plan (every case's normalised case file is held in memory, about 1 kB
 * each), measured separately at the case limit (MAX_PLAN_CASES).
 */
import { spawnSync } from 'node:child_process';
import { closeSync, mkdtempSync, openSync, rmSync, statSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeSweep } from '../src/cli/main';
import { expandPlan, MAX_PLAN_CASES, MAX_PLAN_POINTS } from '../src/compute/planFile';
import { buildNodeWorker } from './buildNodeWorker';

const MB = 1e6;
const rss = () => process.memoryUsage().rss;

function print(name: string, figures: Record<string, unknown>): void {
  console.log(JSON.stringify({ bench: name, ...figures, node: process.version }));
}

function expansion(cases: number): void {
  const before = rss();
  const t0 = performance.now();
  const plan = expandPlan({
    conditions: { airspeed_mps: 10, yaw_deg: 0 },
    wheel: { rim_depth_m: Array.from({ length: cases }, (_, j) => 0.02 + j * (0.08 / cases)) },
  });
  const ms = performance.now() - t0;
  const after = rss();
  print('expand plan', {
    cases,
    ok: plan.ok,
    ms: Math.round(ms),
    rssBeforeMB: Math.round(before / MB),
    rssAfterMB: Math.round(after / MB),
    perCaseBytes: Math.round((after - before) / cases),
  });
}

async function streamedSweep(cases: number, pointsPerCase: number): Promise<void> {
  const yaw = Array.from({ length: pointsPerCase / 10 }, (_, k) => (k * 30) / (pointsPerCase / 10));
  const airspeed = Array.from({ length: 10 }, (_, k) => 5 + k);
  const parsed = expandPlan({
    wheel: { cover: { fraction: Array.from({ length: cases }, (_, k) => k / cases) } },
    conditions: { airspeed_mps: airspeed, yaw_deg: yaw },
    model: { lattice_span: 16, lattice_chord: 8, grid_convergence: false },
  });
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const dir = mkdtempSync(join(tmpdir(), 'coversweep-bench-'));
  const path = join(dir, 'rows.csv');
  const fd = openSync(path, 'w');
  const before = rss();
  let peak = before;
  const t0 = performance.now();
  const failed = await writeSweep(
    parsed.value,
    'csv',
    (chunk) => {
      if (typeof chunk === 'string') writeSync(fd, chunk);
      else writeSync(fd, chunk);
    },
    () => {
      peak = Math.max(peak, rss());
    },
  );
  const ms = performance.now() - t0;
  closeSync(fd);
  const bytes = statSync(path).size;
  rmSync(dir, { recursive: true, force: true });
  print('streamed sweep (in process, rows to a file)', {
    cases,
    points: parsed.value.pointCount,
    failed,
    ms: Math.round(ms),
    fileMB: Math.round(bytes / MB),
    rssBeforeMB: Math.round(before / MB),
    rssPeakMB: Math.round(peak / MB),
    rssAfterMB: Math.round(rss() / MB),
  });
}

print('limits', { maxPlanPoints: MAX_PLAN_POINTS, maxPlanCases: MAX_PLAN_CASES });
await streamedSweep(100, 1000);
expansion(MAX_PLAN_CASES);
// A 993,840-point plan in process and on 2 worker threads, each in its own process (peak RSS is per
// process); the outputs' SHA-256 must match.
const entry = buildNodeWorker();
for (const workers of [0, 2]) {
  const run = spawnSync('npx', ['tsx', 'bench/limitsSweep.ts', String(workers), entry], {
    stdio: ['ignore', 'pipe', 'inherit'],
    encoding: 'utf8',
  });
  process.stdout.write(run.stdout);
}
