import { planarSegmentNormalVelocity } from './planarSegmentNormalVelocity';
import { planarWakeNormalVelocity } from './planarWakeNormalVelocity';

/**
 * Influence matrix of a planar vortex-ring lattice whose strips place their corners independently
 * (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3): out[i * n + j] = normal (+y)
 * velocity at control point i from unit circulation on ring j, its planar wake (trailing rings) and,
 * when groundZM is finite, its mirror image about z = groundZM with the opposite circulation (method
 * of images). Within a strip the spanwise segment m is ring m's bound segment (+) and ring m - 1's
 * trailing one (-), evaluated once; each ring's two chordwise sides (lower edge: -, upper edge: +)
 * and the trailing ring's two semi-infinite legs along -x are evaluated per strip, as strips on the
 * two sides of an edge line need not share corners. `influenceMatrix` is the faster special case for
 * lattices whose strips share corners.
 *
 * nodeLowerX / nodeUpperX: spanCount x (chordCount + 1) corner x positions on each strip's lower and
 * upper edge lines (see RingLattice).
 */
export function ringInfluenceMatrix(
  edgeZ: Float64Array,
  nodeLowerX: Float64Array,
  nodeUpperX: Float64Array,
  chordCount: number,
  controlX: Float64Array,
  controlZ: Float64Array,
  groundZM: number,
  out: Float64Array,
): Float64Array {
  const spanCount = edgeZ.length - 1;
  const n = spanCount * chordCount;
  const cols = chordCount + 1;
  if (nodeLowerX.length !== spanCount * cols || nodeUpperX.length !== spanCount * cols) {
    throw new RangeError(
      `ringInfluenceMatrix: node arrays must have spanCount*(chordCount+1)=${spanCount * cols} values`,
    );
  }
  if (controlX.length !== n || controlZ.length !== n) {
    throw new RangeError(`ringInfluenceMatrix: control arrays must have spanCount*chordCount=${n} values`);
  }
  if (out.length < n * n)
    throw new RangeError(`ringInfluenceMatrix: out.length=${out.length} must be at least ${n * n}`);
  const ground = Number.isFinite(groundZM);
  const g2 = 2 * groundZM;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const px = controlX[i]!;
    const pz = controlZ[i]!;
    const row = i * n;
    for (let s = 0; s < spanCount; s++) {
      const z0 = edgeZ[s]!;
      const z1 = edgeZ[s + 1]!;
      const zi0 = g2 - z0;
      const zi1 = g2 - z1;
      const base = s * chordCount;
      const nodes = s * cols;
      let lowerA = nodeLowerX[nodes]!;
      let upperA = nodeUpperX[nodes]!;
      for (let m = 0; m < chordCount; m++) {
        const lowerB = nodeLowerX[nodes + m + 1]!;
        const upperB = nodeUpperX[nodes + m + 1]!;
        let span = planarSegmentNormalVelocity(lowerA, z0, upperA, z1, px, pz);
        let sides =
          planarSegmentNormalVelocity(upperA, z1, upperB, z1, px, pz) -
          planarSegmentNormalVelocity(lowerA, z0, lowerB, z0, px, pz);
        if (ground) {
          span -= planarSegmentNormalVelocity(lowerA, zi0, upperA, zi1, px, pz);
          sides -=
            planarSegmentNormalVelocity(upperA, zi1, upperB, zi1, px, pz) -
            planarSegmentNormalVelocity(lowerA, zi0, lowerB, zi0, px, pz);
        }
        out[row + base + m]! += span + sides;
        if (m > 0) out[row + base + m - 1]! -= span;
        lowerA = lowerB;
        upperA = upperB;
      }
      let wake = planarWakeNormalVelocity(upperA, z1, px, pz) - planarWakeNormalVelocity(lowerA, z0, px, pz);
      if (ground)
        wake -= planarWakeNormalVelocity(upperA, zi1, px, pz) - planarWakeNormalVelocity(lowerA, zi0, px, pz);
      out[row + base + chordCount - 1]! += wake;
    }
  }
  return out;
}
