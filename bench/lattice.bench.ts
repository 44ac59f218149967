// Benchmark of the lifting-surface lattice: influence-matrix build and LU factorisation at the
// default resolution, and LU GFLOP/s at n = 1000 (blocked luFactor vs a naive right-looking
// triple loop). Prints figures; never fails. Run: npx tsx bench/lattice.bench.ts
import { buildDiscLattice } from '../src/model/lattice/buildDiscLattice';
import { DEFAULT_CHORD_COUNT, DEFAULT_SPAN_COUNT } from '../src/model/lattice/defaults';
import { factorLattice } from '../src/model/lattice/factorLattice';
import { solveFactored } from '../src/model/lattice/solveFactored';
import { luFactor } from '../src/model/numeric/luFactor';
import { median } from './timing';

/** Deterministic filler (a linear congruential generator), diagonally dominated. */
function randomMatrix(n: number, seed: number): Float64Array {
  const a = new Float64Array(n * n);
  let state = seed >>> 0;
  for (let i = 0; i < n * n; i++) {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    a[i] = state / 4294967296 - 0.5;
  }
  for (let i = 0; i < n; i++) a[i * n + i]! += 0.1 * n;
  return a;
}

function naiveLu(a: Float64Array, n: number, pivots: Int32Array): void {
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]!) > Math.abs(a[p * n + k]!)) p = i;
    pivots[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = t;
      }
    }
    const inv = 1 / a[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const l = (a[i * n + k]! *= inv);
      for (let j = k + 1; j < n; j++) a[i * n + j]! -= l * a[k * n + j]!;
    }
  }
}

let sink = 0;
for (const ground of [false, true]) {
  const opts = { radiusM: 0.35, spanCount: DEFAULT_SPAN_COUNT, chordCount: DEFAULT_CHORD_COUNT, ground };
  const buildMs: number[] = [];
  const factorMs: number[] = [];
  for (let r = 0; r < 7; r++) {
    const t0 = performance.now();
    const lattice = buildDiscLattice(opts);
    const t1 = performance.now();
    const openness = new Float64Array(lattice.panelCount);
    const t2 = performance.now();
    const factor = factorLattice(lattice, openness);
    const t3 = performance.now();
    sink += solveFactored(factor).normalSlope;
    buildMs.push(t1 - t0);
    factorMs.push(t3 - t2);
  }
  const n = DEFAULT_SPAN_COUNT * DEFAULT_CHORD_COUNT;
  console.log(
    `lattice ${DEFAULT_SPAN_COUNT}x${DEFAULT_CHORD_COUNT} (n=${n}) ground=${ground}: build (incl. influence) ` +
      `${median(buildMs).toFixed(2)} ms, assemble+factorise ${median(factorMs).toFixed(2)} ms (median of 7)`,
  );
}

for (const n of [400, 1000]) {
  const flops = (2 / 3) * n * n * n;
  const source = randomMatrix(n, 12345);
  const pivots = new Int32Array(n);
  for (const [name, fn] of [
    ['blocked luFactor', luFactor],
    ['naive triple loop', naiveLu],
  ] as const) {
    const times: number[] = [];
    fn(Float64Array.from(source), n, pivots); // compile, tier up and warm the caches before timing
    for (let r = 0; r < 3; r++) {
      const a = Float64Array.from(source);
      const t0 = performance.now();
      fn(a, n, pivots);
      times.push(performance.now() - t0);
      sink += a[n * n - 1]!;
    }
    const ms = median(times);
    console.log(
      `LU n=${n} ${name}: ${ms.toFixed(1)} ms, ${(flops / (ms * 1e6)).toFixed(2)} GFLOP/s (median of 3)`,
    );
  }
}
console.log(`(checksum ${sink.toPrecision(6)})`);
