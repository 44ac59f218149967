import type { ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** Gauss-Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun, Table 25.4, n = 6). */
const GL_X = [
  -0.932469514203152, -0.661209386466265, -0.238619186083197, 0.238619186083197, 0.661209386466265,
  0.932469514203152,
];
const GL_W = [
  0.17132449237917, 0.360761573048139, 0.467913934572691, 0.467913934572691, 0.360761573048139,
  0.17132449237917,
];

/** Quadrature elements along a spoke: radii (m), lengths (m, already weighted by the cover share) and
 * the cover share each carries (1 in the open, `oneSidedCoverSpokeShare` behind one cover). */
export interface SpokeElements {
  radiusM: number[];
  weightM: number[];
  share: number[];
}

/**
 * The spoke elements a wheel's loads integrate over: Gauss-Legendre nodes (6 per piece) on the spoke's
 * pieces inside, over and outside the covered annulus, each weighted by its length; the piece over the
 * cover counts `oneSidedCoverSpokeShare` behind one cover and not at all behind two. Pieces of zero length
 * are left out.
 */
export function spokeElements(wheel: WheelGeometry, radii: WheelRadii, options: ModelOptions): SpokeElements {
  const coverShare = wheel.coverSides === 2 ? 0 : options.oneSidedCoverSpokeShare;
  const edges = [radii.hubRadiusM, radii.coverInnerRadiusM, radii.coverOuterRadiusM, radii.rimInnerRadiusM];
  const radiusM: number[] = [];
  const weightM: number[] = [];
  const share: number[] = [];
  for (let piece = 0; piece < 3; piece++) {
    const r0 = edges[piece]!;
    const r1 = edges[piece + 1]!;
    const weight = piece === 1 ? coverShare : 1;
    if (!(r1 > r0) || weight === 0) continue;
    const half = 0.5 * (r1 - r0);
    const mid = 0.5 * (r1 + r0);
    for (let g = 0; g < GL_X.length; g++) {
      radiusM.push(mid + half * GL_X[g]!);
      weightM.push(half * GL_W[g]! * weight);
      share.push(weight);
    }
  }
  return { radiusM, weightM, share };
}
