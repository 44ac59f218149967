import { buildStripLattice } from './buildStripLattice';
import type { DiscLattice } from './types';

export interface DiscLatticeOptions {
  radiusM: number;
  /** Strips across the disc (z), >= 2. */
  spanCount: number;
  /** Panels along each strip (x), >= 1. */
  chordCount: number;
  /** Mirror the lattice about the ground plane z = -radiusM (the tyre's contact point). */
  ground: boolean;
}

/**
 * Vortex-ring lattice of the thin circular disc of radius R in the x-z plane, hub at the origin,
 * air arriving from +x (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3).
 *
 * Strips: cosine spacing in z, edges z_k = -R cos(pi k / N), k = 0..N, each edge line carrying the
 * disc's chord there (leading edge x = +sqrt(R^2 - z^2)), so the end strips are triangles with a
 * corner at z = +-R. Control points: at the strip's mid-angle z_c = -R cos(pi (k + 1/2) / N)
 * rather than the mid-span of the strip (second-order convergence, measured in the tests), at the
 * three-quarter chord of their panel, measured on the disc's own chord at z_c. Chordwise panels: uniform in the local chord fraction (measured to
 * converge better than cosine spacing with the quarter/three-quarter-chord rule; see the tests).
 * Ground: mirror image about z = -R (groundZM = -R). Reference area pi R^2.
 */
export function buildDiscLattice(options: DiscLatticeOptions): DiscLattice {
  const { radiusM, spanCount, chordCount, ground } = options;
  if (!(radiusM > 0) || !Number.isFinite(radiusM)) {
    throw new RangeError(`buildDiscLattice: radiusM=${radiusM} must be finite and > 0`);
  }
  if (!Number.isInteger(spanCount) || spanCount < 2) {
    throw new RangeError(`buildDiscLattice: spanCount=${spanCount} must be an integer >= 2`);
  }
  if (!Number.isInteger(chordCount) || chordCount < 1) {
    throw new RangeError(`buildDiscLattice: chordCount=${chordCount} must be an integer >= 1`);
  }
  if (typeof ground !== 'boolean') {
    throw new RangeError(`buildDiscLattice: ground=${String(ground)} must be a boolean`);
  }
  const edgeZ = new Float64Array(spanCount + 1);
  const edgeLeadingX = new Float64Array(spanCount + 1);
  const edgeChordM = new Float64Array(spanCount + 1);
  for (let k = 0; k <= spanCount; k++) {
    // -cos(pi k / N) written as sin(pi (2k - N) / (2N)): exactly antisymmetric about z = 0.
    const twice = 2 * k - spanCount;
    let angle = (Math.PI * twice) / (2 * spanCount);
    if (process.env.SPAN === 'half' && ground) angle = Math.asin(-1 + 2 * Math.sin((Math.PI * k) / (2 * spanCount)));
    edgeZ[k] = radiusM * Math.sin(angle);
    const half = Math.abs(twice) === spanCount ? 0 : radiusM * Math.cos(angle);
    edgeLeadingX[k] = half;
    edgeChordM[k] = 2 * half;
  }
  edgeZ[0] = -radiusM;
  edgeZ[spanCount] = radiusM;
  const controlZ = new Float64Array(spanCount);
  const controlLeadingX = new Float64Array(spanCount);
  const controlChordM = new Float64Array(spanCount);
  for (let s = 0; s < spanCount; s++) {
    const angle = (Math.PI * (2 * s + 1 - spanCount)) / (2 * spanCount);
    let zc = radiusM * Math.sin(angle);
    if (process.env.SPAN === 'half' && ground) zc = radiusM * (-1 + 2 * Math.sin((Math.PI * (s + 0.5)) / (2 * spanCount)));
    if (process.env.CTRLG === 'mid' && ground && s < spanCount / 2) zc = 0.5 * (edgeZ[s]! + edgeZ[s + 1]!);
    controlZ[s] = zc;
    if (process.env.CTRL === 'circle') {
      const half = radiusM * Math.cos(angle);
      controlLeadingX[s] = half;
      controlChordM[s] = 2 * half;
    } else {
      const t = (zc - edgeZ[s]!) / (edgeZ[s + 1]! - edgeZ[s]!);
      controlLeadingX[s] = edgeLeadingX[s]! + t * (edgeLeadingX[s + 1]! - edgeLeadingX[s]!);
      controlChordM[s] = edgeChordM[s]! + t * (edgeChordM[s + 1]! - edgeChordM[s]!);
    }
  }
  const chordFractions = new Float64Array(chordCount + 1);
  for (let m = 0; m <= chordCount; m++) chordFractions[m] = process.env.CHORD === 'cos' ? 0.5 * (1 - Math.cos((Math.PI * m) / chordCount)) : m / chordCount;
  const lattice = buildStripLattice({
    edgeZ,
    edgeLeadingX,
    edgeChordM,
    controlZ,
    controlLeadingX,
    controlChordM,
    chordFractions,
    groundZM: ground ? -radiusM : Number.NaN,
    referenceAreaM2: Math.PI * radiusM * radiusM,
  });
  return { ...lattice, radiusM, ground };
}
