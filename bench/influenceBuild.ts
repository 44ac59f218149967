/**
 * The influence matrix of the wheel's vortex-ring lattice (ringInfluenceMatrix) timed on its two paths
 * (WebAssembly SIMD where available, and the plain TypeScript loops), at the default lattice with the
 * ground image (a covered wheel's, n = 288) and at a lattice of n = 1000, for side-by-side figures with
 * LAPACK's LU at n = 1000.
 *
 * Flop count (the work of the textbook evaluation, Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed.,
 * sec. 12.3): every segment of every ring evaluated on its own by the segment law as written in
 * src/model/lattice/planarSegmentNormalVelocity.ts, 35 flops (a square root or a division counted as
 * one), and every wake leg by planarWakeNormalVelocity.ts, 13 flops: per control point and strip,
 * 4 chordCount - 1 segments (bound, trailing = the next ring's bound, two sides per ring) and two wake
 * legs, twice with the ground image. The kernel shares each corner's unit vector between up to three
 * segments and so executes fewer; `executedFlops` counts those (its loops' adds, multiplies,
 * divisions, square roots and comparisons).
 */
import { buildWheelLattice } from '../src/model/lattice/buildWheelLattice';
import { ringInfluenceMatrix } from '../src/model/lattice/ringInfluenceMatrix';
import { timeWallAndCpu } from './cpuTime';

const SEGMENT_FLOPS = 35;
const WAKE_LEG_FLOPS = 13;

export interface InfluenceFigures {
  n: number;
  lattice: string;
  medianMs: number;
  gflops: number;
  cpuGflops: number;
  executedGflops: number;
  typescriptMedianMs: number;
  typescriptGflops: number;
  checksum: number;
}

type Lattice = ReturnType<typeof buildWheelLattice>;

function textbookFlops(l: Lattice): number {
  const perPoint = l.spanCount * ((4 * l.chordCount - 1) * SEGMENT_FLOPS + 2 * WAKE_LEG_FLOPS);
  return l.panelCount * perPoint * (Number.isFinite(l.groundZM) ? 2 : 1);
}

/** The flops the kernel's loops execute (see ringInfluenceKernel.wat): corners, strip set-up, rings, wake. */
function executedFlops(l: Lattice): number {
  const cols = l.chordCount + 1;
  let perPoint = 0;
  let carried = false;
  for (let s = 0; s < l.spanCount; s++) {
    const edgeLines = carried ? 1 : 2;
    perPoint += edgeLines * (1 + 7 * cols) + 7 + 36 * l.chordCount - 2 + 16;
    carried = true;
    for (let m = 0; m < cols && carried; m++) {
      if (s + 1 >= l.spanCount || l.nodeUpperX[s * cols + m] !== l.nodeLowerX[(s + 1) * cols + m])
        carried = false;
    }
  }
  return l.panelCount * perPoint * (Number.isFinite(l.groundZM) ? 2 : 1);
}

export function influenceFigures(): InfluenceFigures[] {
  const cases = [
    { spanCount: 24, chordCount: 12, label: 'default 24x12, ground, open annulus 0.03-0.22 m' },
    { spanCount: 40, chordCount: 25, label: '40x25, ground, open annulus 0.03-0.22 m' },
  ];
  return cases.map(({ spanCount, chordCount, label }) => {
    const l = buildWheelLattice({
      radiusM: 0.311,
      spanCount,
      chordCount,
      ground: true,
      openAnnuliM: [[0.03, 0.22]],
    });
    const n = l.panelCount;
    const out = new Float64Array(n * n);
    const run = (path: 'auto' | 'typescript') => () => {
      ringInfluenceMatrix(
        l.edgeZ,
        l.nodeLowerX,
        l.nodeUpperX,
        l.chordCount,
        l.controlX,
        l.controlZ,
        l.groundZM,
        out,
        path,
      );
      return out[n * n - 1]!;
    };
    const repeats = n > 500 ? 9 : 31;
    run('auto')(); // compile and tier up before timing
    run('typescript')();
    const fast = timeWallAndCpu(repeats, run('auto'));
    const plain = timeWallAndCpu(repeats, run('typescript'));
    const gflops = (flops: number, ms: number) => +(flops / (ms * 1e-3) / 1e9).toFixed(2);
    return {
      n,
      lattice: label,
      medianMs: +fast.medianMs.toFixed(3),
      gflops: gflops(textbookFlops(l), fast.medianMs),
      cpuGflops: gflops(textbookFlops(l), fast.medianCpuMs),
      executedGflops: gflops(executedFlops(l), fast.medianMs),
      typescriptMedianMs: +plain.medianMs.toFixed(3),
      typescriptGflops: gflops(textbookFlops(l), plain.medianMs),
      checksum: fast.checksum + plain.checksum,
    };
  });
}
