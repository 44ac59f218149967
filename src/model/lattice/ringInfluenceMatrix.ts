/**
 * Influence matrix of a planar vortex-ring lattice whose strips place their corners independently
 * (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3): out[i * n + j] = normal (+y)
 * velocity at control point i from unit circulation on ring j, its planar wake (trailing rings) and,
 * when groundZM is finite, its mirror image about z = groundZM with the opposite circulation (method
 * of images). Within a strip the spanwise segment m is ring m's bound segment (+) and ring m - 1's
 * trailing one (-), evaluated once; each ring's two chordwise sides (lower edge: -, upper edge: +)
 * and the trailing ring's two semi-infinite legs along -x are evaluated per strip, as strips on the
 * two sides of an edge line need not share corners. `influenceMatrix` is the special case for
 * lattices whose strips share corners.
 *
 * Kernels: the y component of the Biot-Savart segment law for coplanar points (as in
 * planarSegmentNormalVelocity), v = r0 . (r1/|r1| - r2/|r2|) / (4 pi (r1z r2x - r1x r2z)), and the
 * semi-infinite leg along -x (planarWakeNormalVelocity), v = (1 - r1x/|r1|) / (4 pi r1z). Every corner
 * is an end of up to three segments, so the unit vectors r/|r| from each corner to the control point
 * are computed once per strip and shared (a third of the square roots); on a chordwise side, which
 * lies on its edge line, the segment law reduces to (u2x - u1x) / (4 pi dz) with one reciprocal per
 * edge line (two divisions saved per ring). Where a strip's upper edge line carries the same corners
 * as the next strip's lower one (all of them on a lattice without boundary circles, about half on a
 * covered wheel's), the corners' unit vectors are computed once for both strips: same operands, same
 * bits. Same cut-off as those kernels.
 *
 * nodeLowerX / nodeUpperX: spanCount x (chordCount + 1) corner x positions on each strip's lower and
 * upper edge lines (see RingLattice).
 *
 * Two paths give the same bits: these loops in TypeScript, and the same operations in WebAssembly SIMD
 * with two control points in the two lanes (numeric/ringInfluenceKernel.wat), used where available
 * (`path` 'auto'; 'typescript' or 'wasm' force one).
 */
import { ringInfluenceWasm } from '../numeric/ringInfluenceKernel';

const CORE_RELATIVE = 1e-10;
const CORE_SQ = CORE_RELATIVE * CORE_RELATIVE;
const FOUR_PI = 4 * Math.PI;

// Module-private scratch: per-corner offsets and unit vectors to the current control point, one set per
// edge line (x offset at [m], unit vector x at [cols + m], z at [2 cols + m]); four sets (lower and
// upper edge of the real and of the image strip), swapped when a strip's upper edge line is the next
// strip's lower one; `shared[s]`: strip s's upper corners are strip s + 1's lower corners.
let scratchCols = 0;
let cornersA = new Float64Array(0);
let cornersB = new Float64Array(0);
let cornersC = new Float64Array(0);
let cornersD = new Float64Array(0);
let shared = new Uint8Array(0);

function ensureScratch(cols: number, spanCount: number): void {
  if (cols > scratchCols) {
    scratchCols = cols;
    cornersA = new Float64Array(3 * cols);
    cornersB = new Float64Array(3 * cols);
    cornersC = new Float64Array(3 * cols);
    cornersD = new Float64Array(3 * cols);
  }
  if (spanCount > shared.length) shared = new Uint8Array(spanCount);
}

/** Offsets and unit vectors from the corners of one edge line (x at nodeX[nodes..], dz = pz - z) to P. */
function edgeCorners(
  corners: Float64Array,
  cols: number,
  nodeX: Float64Array,
  nodes: number,
  px: number,
  dz: number,
): void {
  for (let m = 0; m < cols; m++) {
    const d = px - nodeX[nodes + m]!;
    const inv = 1 / Math.sqrt(d * d + dz * dz);
    corners[m] = d;
    corners[cols + m] = d * inv;
    corners[2 * cols + m] = dz * inv;
  }
}

/** Segment A -> B (corner offsets r = P - corner, with unit vectors) normal velocity at P. */
function segment(
  r1x: number,
  r1z: number,
  u1x: number,
  u1z: number,
  r2x: number,
  r2z: number,
  u2x: number,
  u2z: number,
): number {
  const c = r1z * r2x - r1x * r2z;
  // r0 = B - A = r1 - r2
  const r0x = r1x - r2x;
  const r0z = r1z - r2z;
  const l2 = r0x * r0x + r0z * r0z;
  if (!(c * c > CORE_SQ * l2 * l2)) return 0;
  return (r0x * (u1x - u2x) + r0z * (u1z - u2z)) / (FOUR_PI * c);
}

/**
 * Sum of a strip's contributions at P into row `row` (sign +1 real, -1 image), from the corner sets of
 * its lower (`low`, dz0) and upper (`up`, dz1) edge lines.
 */
function stripContributions(
  out: Float64Array,
  row: number,
  base: number,
  chordCount: number,
  low: Float64Array,
  up: Float64Array,
  dz0: number,
  dz1: number,
  sign: number,
): void {
  const cols = chordCount + 1;
  const ux = cols;
  const uz = 2 * cols;
  // A chordwise side lies on its edge line (r1z = r2z = dz, r0 = (r0x, 0)): the segment law reduces
  // to v = (u2x - u1x) / (4 pi dz), with the cut-off |dz| > CORE_RELATIVE |r0x|; the wake legs to
  // (1 - ux) / (4 pi dz). One reciprocal per edge line serves them all.
  const k0 = 1 / (FOUR_PI * dz0);
  const k1 = 1 / (FOUR_PI * dz1);
  const dz0Sq = dz0 * dz0;
  const dz1Sq = dz1 * dz1;
  for (let m = 0; m < chordCount; m++) {
    const span = segment(low[m]!, dz0, low[ux + m]!, low[uz + m]!, up[m]!, dz1, up[ux + m]!, up[uz + m]!);
    const r0u = up[m]! - up[m + 1]!;
    const upperSide = dz1Sq > CORE_SQ * r0u * r0u ? (up[ux + m + 1]! - up[ux + m]!) * k1 : 0;
    const r0l = low[m]! - low[m + 1]!;
    const lowerSide = dz0Sq > CORE_SQ * r0l * r0l ? (low[ux + m + 1]! - low[ux + m]!) * k0 : 0;
    out[row + base + m]! += sign * (span + upperSide - lowerSide);
    if (m > 0) out[row + base + m - 1]! -= sign * span;
  }
  // Wake legs from the trailing corners along -x.
  let wake = 0;
  if (dz1Sq > CORE_SQ * (up[chordCount]! ** 2 + dz1Sq)) wake += (1 - up[ux + chordCount]!) * k1;
  if (dz0Sq > CORE_SQ * (low[chordCount]! ** 2 + dz0Sq)) wake -= (1 - low[ux + chordCount]!) * k0;
  out[row + base + chordCount - 1]! += sign * wake;
}

export function ringInfluenceMatrix(
  edgeZ: Float64Array,
  nodeLowerX: Float64Array,
  nodeUpperX: Float64Array,
  chordCount: number,
  controlX: Float64Array,
  controlZ: Float64Array,
  groundZM: number,
  out: Float64Array,
  path: 'auto' | 'typescript' | 'wasm' = 'auto',
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
  if (out.length < n * n) {
    throw new RangeError(`ringInfluenceMatrix: out.length=${out.length} must be at least ${n * n}`);
  }
  if (path !== 'auto' && path !== 'typescript' && path !== 'wasm') {
    throw new RangeError(`ringInfluenceMatrix: path=${String(path)} must be 'auto', 'typescript' or 'wasm'`);
  }
  ensureScratch(cols, spanCount);
  for (let s = 0; s + 1 < spanCount; s++) {
    let same = 1;
    for (let m = 0; m < cols && same; m++) {
      if (nodeUpperX[s * cols + m] !== nodeLowerX[(s + 1) * cols + m]) same = 0;
    }
    shared[s] = same;
  }
  if (path !== 'typescript') {
    if (
      ringInfluenceWasm(edgeZ, nodeLowerX, nodeUpperX, chordCount, controlX, controlZ, groundZM, shared, out)
    ) {
      return out;
    }
    if (path === 'wasm') {
      throw new RangeError(
        "ringInfluenceMatrix: path='wasm' but the WebAssembly kernel cannot run (no SIMD here, no memory, or n > 2048)",
      );
    }
  }
  const ground = Number.isFinite(groundZM);
  const g2 = 2 * groundZM;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const px = controlX[i]!;
    const pz = controlZ[i]!;
    const row = i * n;
    let low = cornersA;
    let up = cornersB;
    let imageLow = cornersC;
    let imageUp = cornersD;
    let carried = false; // the lower corner sets already hold this strip's lower edge line
    for (let s = 0; s < spanCount; s++) {
      const z0 = edgeZ[s]!;
      const z1 = edgeZ[s + 1]!;
      const base = s * chordCount;
      const nodes = s * cols;
      const dz0 = pz - z0;
      const dz1 = pz - z1;
      if (!carried) edgeCorners(low, cols, nodeLowerX, nodes, px, dz0);
      edgeCorners(up, cols, nodeUpperX, nodes, px, dz1);
      stripContributions(out, row, base, chordCount, low, up, dz0, dz1, 1);
      // The image strip: corners mirrored to z' = 2 g - z (its lower edge line is the image of z0).
      if (ground) {
        const idz0 = pz - (g2 - z0);
        const idz1 = pz - (g2 - z1);
        if (!carried) edgeCorners(imageLow, cols, nodeLowerX, nodes, px, idz0);
        edgeCorners(imageUp, cols, nodeUpperX, nodes, px, idz1);
        stripContributions(out, row, base, chordCount, imageLow, imageUp, idz0, idz1, -1);
      }
      carried = s + 1 < spanCount && shared[s] === 1;
      if (carried) {
        // Same corners and the same dz (pz - edgeZ[s + 1]): the next strip's lower sets are these.
        const t = low;
        low = up;
        up = t;
        const it = imageLow;
        imageLow = imageUp;
        imageUp = it;
      }
    }
  }
  return out;
}
