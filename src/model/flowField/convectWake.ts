import type { RingLattice } from '../lattice/types';
import { traceStreamline } from './traceStreamline';
import { trailingVortices } from './trailingVortices';

let startX = new Float64Array(0);
let startZ = new Float64Array(0);
let scratchLine = new Float64Array(0);
const seed = new Float64Array(3);

/**
 * A sketch of the wheel's trailing vortex wake: each trailing vortex (trailingVortices: one per strip
 * edge line, from the wake legs' start point, with its strength) is carried `steps` steps of length
 * `stepM` downstream along the local flow, freestream plus the velocity induced by the solved lattice
 * (traceStreamline, midpoint rule). It is one convection pass of the free-wake idea (force-free wake
 * nodes moved with the local velocity; Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., ch. 13 on
 * wake roll-up, from memory), and only a picture:
 * the filaments move in the field of the linear solution, whose own wake is planar along -x; they do
 * not induce velocity on each other and the lattice is not re-solved with them (no self-consistency).
 * Filaments stop early at the ground or beyond `maxDistanceM` from the hub, like a streamline.
 *
 * Output: the filaments' points (x, y, z) packed one after the other into `outPoints`, filament f
 * holding points outOffsets[f] .. outOffsets[f + 1] - 1; its strength (m^2/s, right-handed about the
 * downstream direction) in outStrength[f]. Returns the filament count, spanCount + 1.
 * Sizes: outPoints >= 3 (spanCount + 1)(steps + 1), outOffsets >= spanCount + 2, outStrength >= spanCount + 1.
 */
export function convectWake(
  lattice: RingLattice,
  gamma: Float64Array,
  freestreamMps: ArrayLike<number>,
  stepM: number,
  steps: number,
  outPoints: Float64Array,
  outOffsets: Uint32Array,
  outStrength: Float64Array,
  maxDistanceM = Number.POSITIVE_INFINITY,
): number {
  const count = lattice.spanCount + 1;
  if (!Number.isInteger(steps) || steps < 0) {
    throw new RangeError(`convectWake: steps=${steps} must be an integer >= 0`);
  }
  const perLine = 3 * (steps + 1);
  if (outPoints.length < count * perLine) {
    throw new RangeError(
      `convectWake: outPoints.length=${outPoints.length} must be >= 3 (spanCount + 1)(steps + 1) = ${count * perLine}`,
    );
  }
  if (outOffsets.length < count + 1) {
    throw new RangeError(
      `convectWake: outOffsets.length=${outOffsets.length} must be >= spanCount + 2 = ${count + 1}`,
    );
  }
  if (startX.length < count) {
    startX = new Float64Array(count);
    startZ = new Float64Array(count);
  }
  if (scratchLine.length < perLine) scratchLine = new Float64Array(perLine);
  trailingVortices(lattice, gamma, startX, startZ, outStrength);
  let written = 0;
  outOffsets[0] = 0;
  for (let f = 0; f < count; f++) {
    seed[0] = startX[f]!;
    seed[1] = 0;
    seed[2] = startZ[f]!;
    const n = traceStreamline(lattice, gamma, freestreamMps, seed, stepM, steps, scratchLine, maxDistanceM);
    outPoints.set(scratchLine.subarray(0, 3 * n), 3 * written);
    written += n;
    outOffsets[f + 1] = written;
  }
  return count;
}
