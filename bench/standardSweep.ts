/**
 * One run of the standard sweep (21 cover fractions x 6 rim depths x 41 yaw angles x 4 airspeeds =
 * 20,664 points) on a pool of compiled worker threads, in its own process: prints one JSON line with
 * the wall time and the process's peak resident memory (main thread + workers, sampled every 10 ms).
 * Usage (from bench/run.ts): tsx --expose-gc bench/standardSweep.ts WORKERS COMPILED_WORKER.mjs
 */
import { availableParallelism, cpus } from 'node:os';
import { nodeWorkerSpawner } from '../src/cli/nodeWorker';
import { runSweep } from '../src/compute/engine/runSweep';
import { WorkerPool } from '../src/compute/engine/workerPool';
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL, type WheelInput } from '../src/model/wheel';

const workers = Number(process.argv[2]);
const entry = process.argv[3];
// `map`: the same 126 designs as a design map with its yaw curves at one speed (13.41 m/s, the 41 yaw
// angles), solved as the page solves its map's designs: without the grid-convergence lattices.
const mapMode = process.argv[4] === 'map';
if (!(workers >= 1) || !entry) throw new Error('usage: standardSweep.ts WORKERS COMPILED_WORKER.mjs [map]');
const deg = Math.PI / 180;
const cases: WheelInput[] = [];
for (let i = 0; i <= 20; i++) {
  for (const depthMm of [20, 35, 50, 65, 80, 90]) {
    cases.push({
      wheel: { ...DEMO_WHEEL, coverFraction: i * 0.05, rimDepthM: depthMm / 1000 },
      options: { ...DEFAULT_MODEL_OPTIONS, ...(mapMode ? { gridConvergence: false } : {}) },
      steering: DEFAULT_STEERING,
      points: (mapMode ? [13.41] : [6, 8, 10, 13.41]).flatMap((speed) =>
        Array.from({ length: 41 }, (_, k) => ({
          airspeedMps: speed,
          yawRad: k * 0.5 * deg,
          groundSpeedMps: speed,
          rhoKgPerM3: 1.225,
          muPaS: 1.7894e-5,
        })),
      ),
    });
  }
}
const points = cases.reduce((n, c) => n + c.points.length, 0);
let peakRss = process.memoryUsage().rss;
const timer = setInterval(() => {
  peakRss = Math.max(peakRss, process.memoryUsage().rss);
}, 10);
const pool = new WorkerPool(nodeWorkerSpawner(entry), workers);
await pool.warm();
// One untimed pass warms each worker's JIT; the timed pass is a fresh sweep (other boundary
// conditions, so no surface is reused from the warm-up).
const warmUp = await runSweep(
  pool,
  cases.map((c) => ({ ...c, wheel: { ...c.wheel, rimWidthM: c.wheel.rimWidthM + 1e-6 } })),
);
if (warmUp.failedCount > 0) throw new Error('warm-up sweep failed');
(globalThis as { gc?: () => void }).gc?.();
const t0 = performance.now();
const out = await runSweep(pool, cases);
const ms = performance.now() - t0;
peakRss = Math.max(peakRss, process.memoryUsage().rss);
clearInterval(timer);
pool.close();
const checksum = out.solutions.reduce((s, sol) => s + (sol?.points[0]?.axialN ?? 0), 0);
console.log(
  JSON.stringify({
    bench: mapMode ? 'design_map_126' : 'standard_sweep',
    cases: cases.length,
    points,
    workers,
    wallMs: Math.round(ms),
    pointsPerSecond: Math.round(points / (ms / 1000)),
    casesPerSecond: +(cases.length / (ms / 1000)).toFixed(1),
    failed: out.failedCount,
    peakRssMB: Math.round(peakRss / 2 ** 20),
    checksum,
    machine: { cores: availableParallelism(), cpu: cpus()[0]?.model ?? 'unknown', node: process.version },
  }),
);
