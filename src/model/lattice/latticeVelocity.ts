import { segmentVelocity } from './segmentVelocity';
import { semiInfiniteSegmentVelocity } from './semiInfiniteSegmentVelocity';
import type { StripLattice } from './types';

const scratch = new Float64Array(3);

/**
 * Velocity (m/s) induced at any point (x, y, z) by the lattice's rings with circulations `gamma`,
 * their planar wakes and, with ground, their mirror images about z = groundZM (Biot-Savart,
 * Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., eq. 10.115, summed over the lattice's unique
 * segments with the net circulation of the rings sharing each one; images carry the opposite
 * circulation). The general 3-D counterpart of the planar kernels used for the influence matrix.
 * Writes (vx, vy, vz) into `out` and returns it.
 */
export function latticeVelocity(
  lattice: StripLattice,
  gamma: Float64Array,
  x: number,
  y: number,
  z: number,
  out: Float64Array,
): Float64Array {
  const { spanCount, chordCount, edgeZ, nodeX, groundZM } = lattice;
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
  for (let s = 0; s < spanCount; s++) {
    for (let m = 0; m < chordCount; m++) {
      const p = s * chordCount + m;
      const g = gamma[p]! - (m > 0 ? gamma[p - 1]! : 0);
      if (g !== 0) add(nodeX[s * cols + m]!, edgeZ[s]!, nodeX[(s + 1) * cols + m]!, edgeZ[s + 1]!, g);
    }
  }
  for (let k = 0; k <= spanCount; k++) {
    const ze = edgeZ[k]!;
    for (let m = 0; m < chordCount; m++) {
      const g =
        (k > 0 ? gamma[(k - 1) * chordCount + m]! : 0) - (k < spanCount ? gamma[k * chordCount + m]! : 0);
      if (g !== 0) add(nodeX[k * cols + m]!, ze, nodeX[k * cols + m + 1]!, ze, g);
    }
    const g =
      (k > 0 ? gamma[k * chordCount - 1]! : 0) - (k < spanCount ? gamma[(k + 1) * chordCount - 1]! : 0);
    if (g === 0) continue;
    const xw = nodeX[k * cols + chordCount]!;
    semiInfiniteSegmentVelocity(xw, 0, ze, -1, 0, 0, x, y, z, g, scratch);
    vx += scratch[0]!;
    vy += scratch[1]!;
    vz += scratch[2]!;
    if (ground) {
      semiInfiniteSegmentVelocity(xw, 0, g2 - ze, -1, 0, 0, x, y, z, -g, scratch);
      vx += scratch[0]!;
      vy += scratch[1]!;
      vz += scratch[2]!;
    }
  }
  out[0] = vx;
  out[1] = vy;
  out[2] = vz;
  return out;
}
