/**
 * The wheel lattice build and one design's yaw curve (41 angles, warm), of the source tree at ROOT
 * (default: this one), in its own process: prints one JSON line. bench/run.ts runs it for this tree and,
 * with COVERSWEEP_BENCH_BASELINE, for the baseline's tree, interleaved, so both figures come from one run.
 * Usage: tsx bench/yawCurve.ts [ROOT]
 */
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { timeIt } from './timing';

const root = resolve(process.argv[2] ?? '.');
const load = (path: string) => import(pathToFileURL(resolve(root, path)).href);
const wheel = await load('src/model/wheel/index.ts');
const lattice = await load('src/model/lattice/index.ts');
const deg = Math.PI / 180;

// COVERSWEEP_FIXED_LATTICE=1: the same on the fixed lattice (options.fixedLattice; README, lattice convergence).
const options = {
  ...wheel.DEFAULT_MODEL_OPTIONS,
  fixedLattice: process.env.COVERSWEEP_FIXED_LATTICE === '1',
};
const buildOnce = () => {
  const l = lattice.buildWheelLattice({
    radiusM: wheel.DEMO_WHEEL.outerRadiusM,
    spanCount: options.latticeSpanCount,
    chordCount: options.latticeChordCount,
    ground: options.ground,
    openAnnuliM: [[0, 0.2]],
  });
  return l.influence[0] as number;
};
for (let i = 0; i < 3; i++) buildOnce(); // warm the JIT
const build = timeIt(15, buildOnce);
// Warm: lattice cache of the same wheel size, a new cover each time, so the surface is solved afresh,
// as when a user changes the cover and the page recomputes.
const points = Array.from({ length: 41 }, (_, k) => ({
  airspeedMps: 13.41,
  yawRad: k * 0.5 * deg,
  groundSpeedMps: 13.41,
  rhoKgPerM3: 1.225,
  muPaS: 1.7894e-5,
}));
let k = 0;
const input = (gci: boolean) => ({
  wheel: { ...wheel.DEMO_WHEEL, coverFraction: ((k++ % 20) + 0.5) / 21 },
  options: { ...options, gridConvergence: gci },
  steering: wheel.DEFAULT_STEERING,
  points,
});
for (let i = 0; i < 5; i++) wheel.solveWheel(input(true));
const withGci = timeIt(15, () => wheel.solveWheel(input(true)).points[40].axialN as number);
const withoutGci = timeIt(15, () => wheel.solveWheel(input(false)).points[40].axialN as number);
console.log(
  JSON.stringify({
    latticeBuild: {
      panels: options.latticeSpanCount * options.latticeChordCount,
      medianMs: +build.medianMs.toFixed(2),
      checksum: build.checksum,
    },
    yawCurve: {
      panels: options.latticeSpanCount * options.latticeChordCount,
      warmMsWithConvergence: +withGci.medianMs.toFixed(2),
      warmMsFinestOnly: +withoutGci.medianMs.toFixed(2),
      checksum: withGci.checksum + withoutGci.checksum,
    },
  }),
);
