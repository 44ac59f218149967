import { planarSegmentNormalVelocity } from './planarSegmentNormalVelocity';
import { planarWakeNormalVelocity } from './planarWakeNormalVelocity';

/**
 * Fills the vortex-ring influence matrix of a planar strip lattice (Katz & Plotkin, Low-Speed
 * Aerodynamics, 2nd ed., sec. 12.3, "vortex ring" lattice; wake of the trailing rings as a
 * horseshoe, sec. 12.3 and 12.1): out[i * n + j] = normal (+y) velocity at control point i due to
 * unit circulation on ring j, its wake and (when groundZM is finite) its mirror image about the
 * plane z = groundZM carrying the opposite circulation (method of images: the image of a vortex
 * segment in a plane wall has the mirrored end points and the opposite circulation, so the wall's
 * normal velocity cancels; Milne-Thomson, Theoretical Hydrodynamics, method of images - from memory).
 *
 * Each unique segment is evaluated once per control point and scattered to the (at most two)
 * rings sharing it: spanwise segment (s, m) is ring (s, m)'s bound (leading) segment, +z, and ring
 * (s, m - 1)'s trailing one; chordwise segment (k, m) on strip edge k (leading -> trailing) is
 * ring (k - 1, m)'s upper side and ring (k, m)'s lower side. The trailing ring of a strip has no
 * trailing segment: with the steady wake ring of equal circulation it cancels, leaving the two
 * semi-infinite legs from its trailing corners along -x (the planar wake of linear theory).
 */
export function influenceMatrix(
  edgeZ: Float64Array,
  nodeX: Float64Array,
  chordCount: number,
  controlX: Float64Array,
  controlZ: Float64Array,
  groundZM: number,
  out: Float64Array,
): Float64Array {
  const spanCount = edgeZ.length - 1;
  const n = spanCount * chordCount;
  const cols = chordCount + 1;
  if (nodeX.length !== (spanCount + 1) * cols) {
    throw new RangeError(
      `influenceMatrix: nodeX.length=${nodeX.length} must be (spanCount+1)*(chordCount+1)`,
    );
  }
  if (controlX.length !== n || controlZ.length !== n) {
    throw new RangeError(`influenceMatrix: control arrays must have spanCount*chordCount=${n} values`);
  }
  if (out.length < n * n) {
    throw new RangeError(`influenceMatrix: out.length=${out.length} must be at least ${n * n}`);
  }
  const ground = Number.isFinite(groundZM);
  const g2 = 2 * groundZM;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const px = controlX[i]!;
    const pz = controlZ[i]!;
    const row = i * n;
    // Spanwise (bound / trailing) segments, strip s, vortex line m = 0..chordCount-1.
    for (let s = 0; s < spanCount; s++) {
      const za = edgeZ[s]!;
      const zb = edgeZ[s + 1]!;
      const base = s * chordCount;
      for (let m = 0; m < chordCount; m++) {
        const xa = nodeX[s * cols + m]!;
        const xb = nodeX[(s + 1) * cols + m]!;
        let v = planarSegmentNormalVelocity(xa, za, xb, zb, px, pz);
        if (ground) v -= planarSegmentNormalVelocity(xa, g2 - za, xb, g2 - zb, px, pz);
        out[row + base + m]! += v;
        if (m > 0) out[row + base + m - 1]! -= v;
      }
    }
    // Chordwise segments and wake legs on strip edge k.
    for (let k = 0; k <= spanCount; k++) {
      const z = edgeZ[k]!;
      const zi = g2 - z;
      const upper = (k - 1) * chordCount; // ring row of strip k - 1 (upper side on this edge)
      const lower = k * chordCount; // strip k (lower side on this edge)
      for (let m = 0; m < chordCount; m++) {
        const xa = nodeX[k * cols + m]!;
        const xb = nodeX[k * cols + m + 1]!;
        let v = planarSegmentNormalVelocity(xa, z, xb, z, px, pz);
        if (ground) v -= planarSegmentNormalVelocity(xa, zi, xb, zi, px, pz);
        if (k > 0) out[row + upper + m]! += v;
        if (k < spanCount) out[row + lower + m]! -= v;
      }
      const xw = nodeX[k * cols + chordCount]!;
      let v = planarWakeNormalVelocity(xw, z, px, pz);
      if (ground) v -= planarWakeNormalVelocity(xw, zi, px, pz);
      if (k > 0) out[row + upper + chordCount - 1]! += v;
      if (k < spanCount) out[row + lower + chordCount - 1]! -= v;
    }
  }
  return out;
}
