import type { RingLattice } from '../lattice/types';
import type { PlanarVortexSet } from './types';

/**
 * Packs a ring lattice with circulations `gamma` into its vortex lines, exactly as latticeVelocity
 * sums them (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3: each strip's spanwise lines
 * with the net circulation of the two rings sharing them, each ring's chordwise sides, and the
 * trailing rings' semi-infinite wake legs along -x), dropping lines of zero circulation. Reuses the
 * arrays of `out` when they are large enough. Returns `out` (or a new set).
 */
export function packLatticeVortices(
  lattice: RingLattice,
  gamma: Float64Array,
  out?: PlanarVortexSet,
): PlanarVortexSet {
  const { spanCount, chordCount, edgeZ, nodeLowerX, nodeUpperX } = lattice;
  if (gamma.length !== lattice.panelCount) {
    throw new RangeError(
      `packLatticeVortices: gamma.length=${gamma.length} must equal panelCount=${lattice.panelCount}`,
    );
  }
  const maxSegments = 3 * lattice.panelCount;
  const maxLegs = 2 * spanCount;
  const set: PlanarVortexSet = out ?? {
    segments: new Float64Array(0),
    segmentCount: 0,
    legs: new Float64Array(0),
    legCount: 0,
    groundZM: Number.NaN,
  };
  if (set.segments.length < 5 * maxSegments) set.segments = new Float64Array(5 * maxSegments);
  if (set.legs.length < 3 * maxLegs) set.legs = new Float64Array(3 * maxLegs);
  const seg = set.segments;
  const legs = set.legs;
  let ns = 0;
  let nl = 0;
  const cols = chordCount + 1;
  const push = (ax: number, az: number, bx: number, bz: number, g: number): void => {
    const o = 5 * ns++;
    seg[o] = ax;
    seg[o + 1] = az;
    seg[o + 2] = bx;
    seg[o + 3] = bz;
    seg[o + 4] = g;
  };
  for (let s = 0; s < spanCount; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const row = s * cols;
    for (let m = 0; m < chordCount; m++) {
      const p = s * chordCount + m;
      const g = gamma[p]!;
      const net = g - (m > 0 ? gamma[p - 1]! : 0);
      if (net !== 0) push(nodeLowerX[row + m]!, z0, nodeUpperX[row + m]!, z1, net);
      if (g === 0) continue;
      push(nodeLowerX[row + m]!, z0, nodeLowerX[row + m + 1]!, z0, -g);
      push(nodeUpperX[row + m]!, z1, nodeUpperX[row + m + 1]!, z1, g);
    }
    const last = gamma[s * chordCount + chordCount - 1]!;
    if (last !== 0) {
      let o = 3 * nl++;
      legs[o] = nodeLowerX[row + chordCount]!;
      legs[o + 1] = z0;
      legs[o + 2] = -last;
      o = 3 * nl++;
      legs[o] = nodeUpperX[row + chordCount]!;
      legs[o + 1] = z1;
      legs[o + 2] = last;
    }
  }
  set.segmentCount = ns;
  set.legCount = nl;
  set.groundZM = lattice.groundZM;
  return set;
}
