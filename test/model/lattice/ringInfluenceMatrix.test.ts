import { describe, expect, it } from 'vitest';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { planarSegmentNormalVelocity } from '../../../src/model/lattice/planarSegmentNormalVelocity';
import { planarWakeNormalVelocity } from '../../../src/model/lattice/planarWakeNormalVelocity';
import { ringInfluenceMatrix } from '../../../src/model/lattice/ringInfluenceMatrix';
import type { RingLattice } from '../../../src/model/lattice/types';

/**
 * Independent reference: each ring summed segment by segment with the plain Biot-Savart kernels
 * (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., eq. 10.115 and sec. 2.13): bound segment lower ->
 * upper corner m (+), the next ring's bound segment as its trailing side (-), the chordwise sides along
 * the upper (+) and lower (-) edge lines, the two wake legs on the trailing ring; the image ring mirrored
 * about the ground with the opposite circulation (method of images).
 */
function referenceEntry(l: RingLattice, i: number, j: number): number {
  const cc = l.chordCount;
  const cols = cc + 1;
  const s = Math.floor(j / cc);
  const m = j % cc;
  const px = l.controlX[i]!;
  const pz = l.controlZ[i]!;
  const ring = (z0: number, z1: number): number => {
    const xl = (k: number) => l.nodeLowerX[s * cols + k]!;
    const xu = (k: number) => l.nodeUpperX[s * cols + k]!;
    let v = planarSegmentNormalVelocity(xl(m), z0, xu(m), z1, px, pz);
    if (m + 1 < cc) v -= planarSegmentNormalVelocity(xl(m + 1), z0, xu(m + 1), z1, px, pz);
    v += planarSegmentNormalVelocity(xu(m), z1, xu(m + 1), z1, px, pz);
    v -= planarSegmentNormalVelocity(xl(m), z0, xl(m + 1), z0, px, pz);
    if (m === cc - 1)
      v += planarWakeNormalVelocity(xu(cc), z1, px, pz) - planarWakeNormalVelocity(xl(cc), z0, px, pz);
    return v;
  };
  const z0 = l.edgeZ[s]!;
  const z1 = l.edgeZ[s + 1]!;
  let v = ring(z0, z1);
  if (Number.isFinite(l.groundZM)) v -= ring(2 * l.groundZM - z0, 2 * l.groundZM - z1);
  return v;
}

/** The lattice's influence matrix computed afresh by ringInfluenceMatrix on `path`. */
function influenceOf(l: RingLattice, path: 'auto' | 'typescript' | 'wasm'): Float64Array {
  const n = l.panelCount;
  return ringInfluenceMatrix(
    l.edgeZ,
    l.nodeLowerX,
    l.nodeUpperX,
    l.chordCount,
    l.controlX,
    l.controlZ,
    l.groundZM,
    new Float64Array(n * n),
    path,
  );
}

describe('ringInfluenceMatrix', () => {
  // A covered wheel's lattice: strips follow the open annulus' circles, so some edge lines carry the same
  // corners on both sides and some do not (both paths of the kernel); and the plain disc (all shared).
  for (const [openAnnuliM, path] of [
    [[[0.03, 0.2]], 'auto'],
    [[], 'auto'],
    [[[0.03, 0.2]], 'typescript'],
  ] as Array<[Array<[number, number]>, 'auto' | 'typescript']>) {
    it(`equals the ring-by-ring Biot-Savart sum, ground image included (open annuli ${JSON.stringify(openAnnuliM)}, path ${path}; tolerance 1e-13 max|A|)`, () => {
      const l = buildWheelLattice({ radiusM: 0.35, spanCount: 12, chordCount: 5, ground: true, openAnnuliM });
      const n = l.panelCount;
      const got = influenceOf(l, path);
      let scale = 0;
      for (let k = 0; k < n * n; k++) scale = Math.max(scale, Math.abs(got[k]!));
      // Rounding level: the kernel's closed forms and the reference's general segment law round differently.
      const tol = 1e-13 * scale;
      let worst = { err: 0, i: 0, j: 0, ref: 0 };
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          const ref = referenceEntry(l, i, j);
          const err = Math.abs(got[i * n + j]! - ref);
          if (err > worst.err) worst = { err, i, j, ref };
        }
      }
      expect(
        worst.err,
        `worst entry (${worst.i}, ${worst.j}): got=${got[worst.i * n + worst.j]} expected=${worst.ref} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      // The lattice's own matrix is this kernel's.
      expect(Array.from(l.influence.subarray(0, n * n))).toEqual(Array.from(got));
    });
  }

  it('gives the same bits on its WebAssembly SIMD and TypeScript paths (tolerance 0; odd and even orders, with and without ground)', () => {
    // Invariant of the design: every entry receives the same IEEE-754 operations in the same order.
    const cases = [
      { spanCount: 24, chordCount: 12, ground: true, openAnnuliM: [[0.03, 0.22]] as Array<[number, number]> },
      { spanCount: 5, chordCount: 3, ground: true, openAnnuliM: [[0.1, 0.2]] as Array<[number, number]> },
      { spanCount: 7, chordCount: 5, ground: false, openAnnuliM: [] },
      { spanCount: 3, chordCount: 1, ground: true, openAnnuliM: [] },
    ];
    for (const c of cases) {
      const l = buildWheelLattice({ radiusM: 0.311, ...c });
      const n = l.panelCount;
      const viaTs = influenceOf(l, 'typescript');
      const viaWasm = influenceOf(l, 'wasm');
      let differing = -1;
      for (let k = 0; k < n * n && differing < 0; k++) if (!Object.is(viaTs[k], viaWasm[k])) differing = k;
      const at = Math.max(differing, 0);
      expect(
        differing,
        `${JSON.stringify(c)}: first differing entry ${differing}: typescript=${viaTs[at]} wasm=${viaWasm[at]} tol=0`,
      ).toBe(-1);
    }
  });

  it('rejects an unknown path by name', () => {
    const l = buildWheelLattice({
      radiusM: 0.311,
      spanCount: 3,
      chordCount: 2,
      ground: false,
      openAnnuliM: [],
    });
    const call = () => influenceOf(l, 'gpu' as never);
    expect(call).toThrow(/path=gpu must be/);
  });
});
