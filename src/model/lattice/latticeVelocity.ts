import { segmentVelocity } from './segmentVelocity';
import { semiInfiniteSegmentVelocity } from './semiInfiniteSegmentVelocity';
import type { RingLattice } from './types';

const scratch = new Float64Array(3);

/**
 * Velocity (m/s) induced at any point (x, y, z) by the lattice's rings with circulations `gamma`,
 * their planar wakes and, with ground, their mirror images about z = groundZM (Biot-Savart,
 * Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., eq. 10.115, summed over each strip's segments:
 * spanwise ones with the net circulation of the two rings sharing them, the chordwise sides and wake
 * legs ring by ring, so strips may place their corners independently; images carry the opposite
 * circulation). The general 3-D counterpart of the planar kernels used for the influence matrix.
 * Writes (vx, vy, vz) into `out` and returns it.
 */
export function latticeVelocity(
  lattice: RingLattice,
  gamma: Float64Array,
  x: number,
  y: number,
  z: number,
  out: Float64Array,
): Float64Array {
  const { spanCount, chordCount, edgeZ, nodeLowerX, nodeUpperX, groundZM } = lattice;
  if (gamma.length !== lattice.panelCount) {
    throw new RangeError(
      `latticeVelocity: gamma.length=${gamma.length} must equal panelCount=${lattice.panelCount}`,
    );
  }
  if (out.length < 3) throw new RangeError(`latticeVelocity: out.length=${out.length} must be at least 3`);
  const ground = Number.isFinite(groundZM);
  const g2 = 2 * groundZM;
  const cols = chordCount + 1;
  let vx = 0;
  let vy = 0;
  let vz = 0;
  const add = (ax: number, az: number, bx: number, bz: number, g: number): void => {
    segmentVelocity(ax, 0, az, bx, 0, bz, x, y, z, g, scratch);
    vx += scratch[0]!;
    vy += scratch[1]!;
    vz += scratch[2]!;
    if (ground) {
      segmentVelocity(ax, 0, g2 - az, bx, 0, g2 - bz, x, y, z, -g, scratch);
      vx += scratch[0]!;
      vy += scratch[1]!;
      vz += scratch[2]!;
    }
  };
  const addWake = (ax: number, az: number, g: number): void => {
    semiInfiniteSegmentVelocity(ax, 0, az, -1, 0, 0, x, y, z, g, scratch);
    vx += scratch[0]!;
    vy += scratch[1]!;
    vz += scratch[2]!;
    if (ground) {
      semiInfiniteSegmentVelocity(ax, 0, g2 - az, -1, 0, 0, x, y, z, -g, scratch);
      vx += scratch[0]!;
      vy += scratch[1]!;
      vz += scratch[2]!;
    }
  };
  for (let s = 0; s < spanCount; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const row = s * cols;
    for (let m = 0; m < chordCount; m++) {
      const p = s * chordCount + m;
      const g = gamma[p]!;
      // Spanwise segment m: ring m's bound segment and ring m - 1's trailing one (net circulation).
      const net = g - (m > 0 ? gamma[p - 1]! : 0);
      if (net !== 0) add(nodeLowerX[row + m]!, z0, nodeUpperX[row + m]!, z1, net);
      if (g === 0) continue;
      // Ring m's sides: lower edge (leading -> trailing) with -g, upper edge with +g.
      add(nodeLowerX[row + m]!, z0, nodeLowerX[row + m + 1]!, z0, -g);
      add(nodeUpperX[row + m]!, z1, nodeUpperX[row + m + 1]!, z1, g);
    }
    const last = gamma[s * chordCount + chordCount - 1]!;
    if (last !== 0) {
      addWake(nodeLowerX[row + chordCount]!, z0, -last);
      addWake(nodeUpperX[row + chordCount]!, z1, last);
    }
  }
  out[0] = vx;
  out[1] = vy;
  out[2] = vz;
  return out;
}
