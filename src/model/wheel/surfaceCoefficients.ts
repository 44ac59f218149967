import { gridConvergenceIndex } from '../convergence';
import {
  edgeSuctionShares,
  type LatticeSolution,
  porousDragSlope,
  solveLattice,
  type WheelLattice,
} from '../lattice';
import { cachedWheelLattice, FIXED } from './latticeCache';
import { openAnnuli, panelOpenness } from './panelOpenness';
import { partialPanelOpenness } from './partialPanelOpenness';
import type { ConvergenceEstimate, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** The lifting surface's coefficients for one wheel and rotation ratio; yaw and speed scale them. */
export interface SurfaceCoefficients {
  /** Potential normal-force slope Kp per radian, on S = pi R^2. */
  normalSlope: number;
  /** Ki = C_Di / C_N^2 (Trefftz plane). */
  inducedDragFactor: number;
  /** Porous dissipation drag per sin^2(beta), on S. */
  porousDragSlope: number;
  /** Potential leading-edge suction per sin^2(beta), on S: Kp - Kp^2 Ki - Kd (Polhamus 1966). */
  suctionSlope: number;
  centreXM: number;
  centreZM: number;
  panels: number;
  /** Where the suction sits (edgeSuctionShares): share at the tyre's edge in each strip of the lattice,
   * the strips' edges in z (spanCount + 1 values, m) and the leading panels' bound points (m). */
  tyreEdgeShare: Float64Array;
  innerEdgeShare: number;
  stripEdgeZM: Float64Array;
  edgeXM: Float64Array;
  edgeZM: Float64Array;
  /** Convergence of Kp and of the suction slope over three lattices (null when not asked). */
  normalSlopeConvergence: ConvergenceEstimate | null;
  suctionSlopeConvergence: ConvergenceEstimate | null;
}

/** The wheel's lattice, its panels' openness and the lattice solved for unit forcing (V sin beta = 1).
 * By default the lattice follows the design's region edges (buildWheelLattice with openAnnuli); with
 * `options.fixedLattice` it is the plain disc lattice of the radius (buildWheelLattice without annuli),
 * cached with its influence matrix and shared by every design of that radius, and the regions enter the
 * boundary condition only (partialPanelOpenness). */
export function surfaceSolution(
  wheel: WheelGeometry,
  radii: WheelRadii,
  options: ModelOptions,
  rotationRatio: number,
  spanCount = options.latticeSpanCount,
  chordCount = options.latticeChordCount,
): { lattice: WheelLattice; openness: Float64Array; solidShare?: Float64Array; solution: LatticeSolution } {
  const fixed = options.fixedLattice === true;
  const lattice = cachedWheelLattice(
    radii.outerRadiusM,
    spanCount,
    chordCount,
    options.ground,
    fixed ? FIXED : openAnnuli(radii),
  );
  if (!fixed) {
    const openness = panelOpenness(lattice, wheel, radii, rotationRatio, options.porosityScale);
    return { lattice, openness, solution: solveLattice(lattice, openness) };
  }
  const n = lattice.panelCount;
  const openness = new Float64Array(n);
  const solidShare = new Float64Array(n);
  partialPanelOpenness(lattice, wheel, radii, rotationRatio, options.porosityScale, openness, solidShare);
  const solution = solveLattice(lattice, openness);
  // A partly solid panel holds a solid edge, whose square-root singularity of the sheet strength its
  // uniform gamma cannot represent: its through-flow is left out of the dissipation (measured: counting
  // it takes a share of the edge suction that does not vanish with refinement, the open wheel's suction
  // slope converging 14 % low at 80 x 40); the edge's suction is placed by edgeSuctionShares.
  const wholeOpen = openness.map((o, p) => (solidShare[p]! > 0 ? 0 : o));
  solution.porousDragSlope = porousDragSlope(lattice, solution.gamma, wholeOpen);
  return { lattice, openness, solidShare, solution };
}

/** The slopes of one lattice's solution: Kp, Ki, Kd and the suction slope Kt = Kp - Kp^2 Ki - Kd. */
function slopesOf(s: LatticeSolution, n: number) {
  return {
    kp: s.normalSlope,
    ki: s.inducedDragFactor,
    kd: s.porousDragSlope,
    kt: s.normalSlope - s.normalSlope * s.normalSlope * s.inducedDragFactor - s.porousDragSlope,
    cx: s.centreX,
    cz: s.centreZ,
    n,
  };
}

/** The slopes on the finest lattice, with where its suction sits (edgeSuctionShares). */
function coefficientsOn({ lattice, openness, solidShare, solution: s }: ReturnType<typeof surfaceSolution>) {
  const shares = edgeSuctionShares(lattice, s.gamma, openness, solidShare);
  const edgeX = new Float64Array(lattice.spanCount);
  const edgeZ = new Float64Array(lattice.spanCount);
  for (let strip = 0; strip < lattice.spanCount; strip++) {
    edgeX[strip] = lattice.boundX[strip * lattice.chordCount]!;
    edgeZ[strip] = lattice.boundZ[strip * lattice.chordCount]!;
  }
  return { ...slopesOf(s, lattice.panelCount), shares, stripEdgeZ: lattice.edgeZ, edgeX, edgeZ };
}

/** The observed order used in the index is capped at 1: porous rings converge at about first order
 * on this lattice (measured; the solid disc at about second), and Roache (1994) advises using the
 * formal order when the observed one exceeds it. */
const ORDER_CAP = 1;

/**
 * Grid-convergence estimate of a lattice output from three refinements (Celik et al. 2008 procedure,
 * gridConvergenceIndex). When the three values converge monotonically, GCI = 1.25 |e21| / (r21^p - 1)
 * with p = min(observed order, ORDER_CAP). When they oscillate or diverge, the conservative fallback
 * of Roache (1994) for uncertain orders: 3 x the largest relative change between refinements.
 */
function estimate(h: number[], phi: number[]): ConvergenceEstimate {
  // On a lattice too coarse to coarsen twice (e.g. 4 x 2) the refinements have equal panel counts: no
  // error estimate exists. Report it as not computed (NaN), which assemblePoint flags as not converged.
  if (!(h[0]! < h[1]! && h[1]! < h[2]!)) {
    return { fine: phi[0]!, extrapolated: Number.NaN, observedOrder: Number.NaN, gciRelative: Number.NaN };
  }
  const g = gridConvergenceIndex({
    h1: h[0]!,
    h2: h[1]!,
    h3: h[2]!,
    phi1: phi[0]!,
    phi2: phi[1]!,
    phi3: phi[2]!,
  });
  const scale = Math.max(Math.abs(phi[0]!), 1e-300);
  if (g.status === 'identical')
    return { fine: phi[0]!, extrapolated: phi[0]!, observedOrder: Number.NaN, gciRelative: 0 };
  if (g.status === 'monotonic') {
    const p = Math.min(g.observedOrder, ORDER_CAP);
    const e21 = Math.abs(phi[0]! - phi[1]!) / scale;
    return {
      fine: phi[0]!,
      extrapolated: g.extrapolated,
      observedOrder: g.observedOrder,
      gciRelative: (1.25 * e21) / (g.refinementRatio21 ** p - 1),
    };
  }
  const change = Math.max(Math.abs(phi[0]! - phi[1]!), Math.abs(phi[1]! - phi[2]!)) / scale;
  return { fine: phi[0]!, extrapolated: Number.NaN, observedOrder: Number.NaN, gciRelative: 3 * change };
}

/**
 * Solve the lifting surface of a wheel (vortex lattice with porous spoked region and optional ground
 * image) and, when asked, two coarser lattices (each count divided by 1.5 and 2.25) for a
 * grid-convergence index (Roache 1994; Celik et al. 2008) with representative size h = sqrt(S / n).
 */
export function surfaceCoefficients(
  wheel: WheelGeometry,
  radii: WheelRadii,
  options: ModelOptions,
  rotationRatio: number,
): SurfaceCoefficients {
  const span = options.latticeSpanCount;
  const chord = options.latticeChordCount;
  const fine = coefficientsOn(surfaceSolution(wheel, radii, options, rotationRatio, span, chord));
  let normalConv: ConvergenceEstimate | null = null;
  let suctionConv: ConvergenceEstimate | null = null;
  if (options.gridConvergence) {
    // The coarser lattices give their slopes only: where the suction sits is read on the finest.
    const slopesOn = (factor: number) => {
      const { lattice, solution } = surfaceSolution(
        wheel,
        radii,
        options,
        rotationRatio,
        Math.max(4, Math.round(span / factor)),
        Math.max(2, Math.round(chord / factor)),
      );
      return slopesOf(solution, lattice.panelCount);
    };
    const medium = slopesOn(1.5);
    const coarse = slopesOn(2.25);
    const area = Math.PI * radii.outerRadiusM * radii.outerRadiusM;
    const h = [fine.n, medium.n, coarse.n].map((n) => Math.sqrt(area / n));
    normalConv = estimate(h, [fine.kp, medium.kp, coarse.kp]);
    suctionConv = estimate(h, [fine.kt, medium.kt, coarse.kt]);
  }
  return {
    normalSlope: fine.kp,
    inducedDragFactor: fine.ki,
    porousDragSlope: fine.kd,
    suctionSlope: fine.kt,
    centreXM: fine.cx,
    centreZM: fine.cz,
    panels: fine.n,
    tyreEdgeShare: fine.shares.outerEdgeShare,
    innerEdgeShare: fine.shares.innerEdgeShare,
    stripEdgeZM: fine.stripEdgeZ,
    edgeXM: fine.edgeX,
    edgeZM: fine.edgeZ,
    normalSlopeConvergence: normalConv,
    suctionSlopeConvergence: suctionConv,
  };
}
