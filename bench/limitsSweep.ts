/**
 * One sweep near the plan limit, in its own process, for `npm run bench:limits`:
 *   tsx bench/limitsSweep.ts WORKERS [WORKER_ENTRY.mjs]
 * WORKERS = 0 runs in this process. Prints one JSON line: time, the process's peak resident set size
 * (process.resourceUsage().maxRSS: main thread and worker threads together), the output's size and a
 * SHA-256 of it (identical outputs across worker counts).
 */
import { createHash } from 'node:crypto';
import { closeSync, mkdtempSync, openSync, readSync, rmSync, statSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeSweep } from '../src/cli/main';
import { nodeWorkerSpawner } from '../src/cli/nodeWorker';
import { WorkerPool } from '../src/compute/engine/workerPool';
import { expandPlan } from '../src/compute/planFile';

const MB = 1e6;
const workers = Number(process.argv[2] ?? '0');
const entry = process.argv[3];
// 2,424 cases (cover fraction x rim depth) x 41 yaw angles x 10 airspeeds = 993,840 operating points.
const parsed = expandPlan({
  wheel: {
    rim_depth_m: Array.from({ length: 24 }, (_, k) => 0.02 + k * 0.002),
    cover: { fraction: Array.from({ length: 101 }, (_, k) => k / 100) },
  },
  conditions: {
    airspeed_mps: Array.from({ length: 10 }, (_, k) => 5 + k),
    yaw_deg: Array.from({ length: 41 }, (_, k) => k * 0.75),
  },
  model: { lattice_span: 12, lattice_chord: 6, grid_convergence: false },
});
if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
const dir = mkdtempSync(join(tmpdir(), 'coversweep-limits-'));
const path = join(dir, 'rows.csv');
const fd = openSync(path, 'w');
const rssBefore = process.memoryUsage().rss;
const pool = workers > 0 ? new WorkerPool(nodeWorkerSpawner(entry), workers) : undefined;
// Sampled peaks of the parts of memory (the main thread's heap; worker heaps are in the RSS only).
const peak = { rss: 0, heapUsed: 0, external: 0, arrayBuffers: 0 };
const sampler = setInterval(() => {
  const m = process.memoryUsage();
  for (const k of Object.keys(peak) as (keyof typeof peak)[]) peak[k] = Math.max(peak[k], m[k]);
}, 50);
const t0 = performance.now();
const failed = await writeSweep(
  parsed.value,
  'csv',
  (chunk) => {
    if (typeof chunk === 'string') writeSync(fd, chunk);
    else writeSync(fd, chunk);
  },
  undefined,
  pool,
);
const ms = performance.now() - t0;
clearInterval(sampler);
pool?.close();
closeSync(fd);
const bytes = statSync(path).size;
const hash = createHash('sha256');
const chunk = Buffer.allocUnsafe(1 << 20);
const rfd = openSync(path, 'r');
for (let n = readSync(rfd, chunk); n > 0; n = readSync(rfd, chunk)) hash.update(chunk.subarray(0, n));
closeSync(rfd);
const sha = hash.digest('hex').slice(0, 16);
rmSync(dir, { recursive: true, force: true });
console.log(
  JSON.stringify({
    bench: `sweep near the plan limit, ${workers > 0 ? `${workers} worker thread(s)` : 'in process'}`,
    cases: parsed.value.cases.length,
    points: parsed.value.pointCount,
    failed,
    s: Number((ms / 1000).toFixed(1)),
    fileMB: Math.round(bytes / MB),
    rssBeforeMB: Math.round(rssBefore / MB),
    rssPeakMB: Math.round((process.resourceUsage().maxRSS * 1024) / MB),
    sampledPeakMB: Object.fromEntries(Object.entries(peak).map(([k, v]) => [k, Math.round(v / MB)])),
    sha256: sha,
    node: process.version,
  }),
);
process.exit(0);
