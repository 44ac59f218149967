import { allocateByLength } from './allocateByLength';
import { ringInfluenceMatrix } from './ringInfluenceMatrix';
import type { RingLattice } from './types';
import { wheelStripStations } from './wheelStripStations';

export interface WheelLatticeOptions {
  radiusM: number;
  /** Strips across the disc, >= 2 (raised if the region edges need more: one zone per pair of
   * neighbouring edges, two for the zone across the innermost circle). */
  spanCount: number;
  /** Panels along each strip, >= 1 (raised if a strip crosses more regions than that). */
  chordCount: number;
  /** Mirror image about the ground plane z = -radiusM. */
  ground: boolean;
  /** Open (porous) annuli [inner, outer] (m); their edge circles are the ones panels must not straddle. */
  openAnnuliM: ReadonlyArray<readonly [number, number]>;
  /** Share of panels an open interval gets per unit length, relative to a solid one (default 0.35):
   * open regions carry little load, solid rings and their edges carry the gradients. */
  openPanelWeight?: number;
  /** Chordwise clustering c in [0, 1] (default 0, even): within each interval panel edge q of k sits at
   * the fraction (1 - c) q / k + c (1 - cos(pi q / k)) / 2, closer together at the interval's ends. */
  chordClustering?: number;
  /** Supplies the array the influence matrix is written into, given its entry count n^2 (every entry
   * is overwritten, so its old contents do not matter): the lattice cache hands back the arrays of
   * lattices it has evicted, sparing a fresh n x n allocation per lattice. Default: a new array. */
  influenceArray?: (entries: number) => Float64Array;
}

export interface WheelLattice extends RingLattice {
  radiusM: number;
  ground: boolean;
  openAnnuliM: ReadonlyArray<readonly [number, number]>;
  chordClustering: number;
  /** x of the panels' geometric edges (m) on each strip's lower and upper edge line, row-major
   * spanCount x (chordCount + 1), leading edge first (the ring corners sit a quarter panel behind). */
  panelEdgeLowerX: Float64Array;
  panelEdgeUpperX: Float64Array;
}

/**
 * Vortex-ring lattice of the wheel's disc (radius R, hub at the origin, air from +x) whose panels
 * follow the circles where the surface changes from solid to porous, so that no panel is part solid
 * and part open. Same spacing rules as buildDiscLattice (Katz & Plotkin, Low-Speed Aerodynamics,
 * 2nd ed., sec. 12.3; strips by the cosine rule of the disc, or of the disc and its ground image,
 * control points at the strip's mid-angle, three-quarter chord on the strip's trapezoid), plus:
 * - the strip stations are warped (piecewise linearly in the spacing's parameter) so that z = +-r of
 *   every boundary circle is a strip edge: no circle's top or bottom falls inside a strip; control
 *   points stay at the strips' mid-parameter of the warped spacing;
 * - along each strip, corners are placed at the circles' crossings on each of the strip's edge lines
 *   and the strip's panels are shared among the crossed intervals in proportion to their lengths at
 *   the control station (open intervals weighted down by openPanelWeight; at least one each),
 *   uniform within an interval (or clustered toward its ends, chordClustering).
 * Strips place their corners independently (ringInfluenceMatrix). With no boundary radii it is the
 * disc lattice of buildDiscLattice.
 */
export function buildWheelLattice(options: WheelLatticeOptions): WheelLattice {
  const { radiusM: R, spanCount, ground } = options;
  if (!(R > 0) || !Number.isFinite(R))
    throw new RangeError(`buildWheelLattice: radiusM=${R} must be finite and > 0`);
  if (!Number.isInteger(spanCount) || spanCount < 2) {
    throw new RangeError(`buildWheelLattice: spanCount=${spanCount} must be an integer >= 2`);
  }
  if (!Number.isInteger(options.chordCount) || options.chordCount < 1) {
    throw new RangeError(`buildWheelLattice: chordCount=${options.chordCount} must be an integer >= 1`);
  }
  const annuli = options.openAnnuliM;
  for (const [a, b] of annuli) {
    if (!(Number.isFinite(a) && Number.isFinite(b) && a >= 0 && b > a && b <= R)) {
      throw new RangeError(
        `buildWheelLattice: open annulus [${a}, ${b}] must satisfy 0 <= inner < outer <= radiusM=${R}`,
      );
    }
  }
  const openWeight = options.openPanelWeight ?? 0.35;
  if (!(openWeight > 0 && openWeight <= 1)) {
    throw new RangeError(`buildWheelLattice: openPanelWeight=${openWeight} must be in (0, 1]`);
  }
  const cluster = options.chordClustering ?? 0;
  if (!(cluster >= 0 && cluster <= 1)) {
    throw new RangeError(`buildWheelLattice: chordClustering=${cluster} must be in [0, 1]`);
  }
  const warped = wheelStripStations(R, spanCount, ground, annuli);
  const { strips, circleCount, circles, edgeZ } = warped;
  const controlStation = warped.controlZ;

  // Per strip: the crossed circles (those with r > |z| at the control station: a prefix of the
  // descending list), panel allocation; the chord count fits the worst strip.
  let chordCount = options.chordCount;
  for (let s = 0; s < strips; s++) {
    chordCount = Math.max(chordCount, 2 * crossedCount(circles, circleCount, controlStation[s]!) + 1);
  }
  const cols = chordCount + 1;
  const n = strips * chordCount;
  const nodeLowerX = new Float64Array(strips * cols);
  const nodeUpperX = new Float64Array(strips * cols);
  const panelEdgeLowerX = new Float64Array(strips * cols);
  const panelEdgeUpperX = new Float64Array(strips * cols);
  const controlX = new Float64Array(n);
  const controlZ = new Float64Array(n);
  const boundX = new Float64Array(n);
  const boundZ = new Float64Array(n);
  const centroidX = new Float64Array(n);
  const centroidZ = new Float64Array(n);
  const areaM2 = new Float64Array(n);
  const spanWidthM = new Float64Array(n);
  const chordLengthM = new Float64Array(n);
  ensureStripScratch(cols, 2 * circleCount + 2);
  const lower = stripLower;
  const upper = stripUpper;
  const atLower = crossLower;
  const atUpper = crossUpper;
  const lengths = intervalLength;
  const counts = intervalCount;

  for (let s = 0; s < strips; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const zc = controlStation[s]!;
    const t = (zc - z0) / (z1 - z0);
    const crossed = crossedCount(circles, circleCount, zc);
    crossings(R, circles, crossed, z0, z1, atLower, atUpper);
    // Interval lengths at the control station, on the strip's trapezoid, weighted by region.
    const intervals = 2 * crossed + 1;
    for (let j = 0; j < intervals; j++) {
      const a = (1 - t) * atLower[j]! + t * atUpper[j]!;
      const b = (1 - t) * atLower[j + 1]! + t * atUpper[j + 1]!;
      const mid = 0.5 * (a + b);
      lengths[j] = Math.max(0, a - b) * (isOpen(annuli, Math.sqrt(mid * mid + zc * zc)) ? openWeight : 1);
    }
    allocateByLength(lengths, intervals, chordCount, counts);
    // Panel edges on both edge lines.
    let c = 0;
    for (let j = 0; j < intervals; j++) {
      for (let q = 0; q < counts[j]!; q++) {
        const even = q / counts[j]!;
        const f = cluster > 0 ? (1 - cluster) * even + (cluster * (1 - Math.cos(Math.PI * even))) / 2 : even;
        lower[c] = atLower[j]! + f * (atLower[j + 1]! - atLower[j]!);
        upper[c] = atUpper[j]! + f * (atUpper[j + 1]! - atUpper[j]!);
        c++;
      }
    }
    lower[chordCount] = atLower[intervals]!;
    upper[chordCount] = atUpper[intervals]!;
    const nodes = s * cols;
    for (let m = 0; m < cols; m++) {
      panelEdgeLowerX[nodes + m] = lower[m]!;
      panelEdgeUpperX[nodes + m] = upper[m]!;
    }
    for (let m = 0; m < chordCount; m++) {
      nodeLowerX[nodes + m] = lower[m]! - 0.25 * (lower[m]! - lower[m + 1]!);
      nodeUpperX[nodes + m] = upper[m]! - 0.25 * (upper[m]! - upper[m + 1]!);
    }
    nodeLowerX[nodes + chordCount] =
      lower[chordCount]! - 0.25 * (lower[chordCount - 1]! - lower[chordCount]!);
    nodeUpperX[nodes + chordCount] =
      upper[chordCount]! - 0.25 * (upper[chordCount - 1]! - upper[chordCount]!);
    const width = z1 - z0;
    for (let m = 0; m < chordCount; m++) {
      const p = s * chordCount + m;
      const front = (1 - t) * lower[m]! + t * upper[m]!;
      const back = (1 - t) * lower[m + 1]! + t * upper[m + 1]!;
      controlX[p] = front - 0.75 * (front - back);
      controlZ[p] = zc;
      boundX[p] = 0.5 * (nodeLowerX[nodes + m]! + nodeUpperX[nodes + m]!);
      boundZ[p] = 0.5 * (z0 + z1);
      // Trapezoid with sides parallel to x (Bronshtein, Handbook of Mathematics: centroid).
      const la = lower[m]! - lower[m + 1]!;
      const lb = upper[m]! - upper[m + 1]!;
      const sum = la + lb;
      areaM2[p] = 0.5 * sum * width;
      spanWidthM[p] = width;
      chordLengthM[p] = 0.5 * sum;
      const ma = 0.5 * (lower[m]! + lower[m + 1]!);
      const mb = 0.5 * (upper[m]! + upper[m + 1]!);
      centroidZ[p] = sum > 0 ? z0 + (width * (la + 2 * lb)) / (3 * sum) : 0.5 * (z0 + z1);
      centroidX[p] = sum > 0 ? (ma * (2 * la + lb) + mb * (la + 2 * lb)) / (3 * sum) : 0.5 * (ma + mb);
    }
  }
  const groundZM = ground ? -R : Number.NaN;
  const influence = options.influenceArray?.(n * n) ?? new Float64Array(n * n);
  if (influence.length !== n * n) {
    throw new RangeError(
      `buildWheelLattice: influenceArray gave ${influence.length} entries, not n*n=${n * n}`,
    );
  }
  ringInfluenceMatrix(edgeZ, nodeLowerX, nodeUpperX, chordCount, controlX, controlZ, groundZM, influence);
  return {
    spanCount: strips,
    chordCount,
    panelCount: n,
    referenceAreaM2: Math.PI * R * R,
    groundZM,
    edgeZ,
    nodeLowerX,
    nodeUpperX,
    controlX,
    controlZ,
    boundX,
    boundZ,
    centroidX,
    centroidZ,
    areaM2,
    spanWidthM,
    chordLengthM,
    influence,
    radiusM: R,
    ground,
    openAnnuliM: annuli.map(([a, b]) => [a, b] as const),
    chordClustering: cluster,
    panelEdgeLowerX,
    panelEdgeUpperX,
  };
}

// Module-private scratch (grown on demand, never returned): per strip the circles' crossings on both
// edge lines, the interval lengths and panel counts, and the panel edges on both lines.
let crossLower = new Float64Array(16);
let crossUpper = new Float64Array(16);
let intervalLength = new Float64Array(16);
let intervalCount = new Float64Array(16);
let stripLower = new Float64Array(64);
let stripUpper = new Float64Array(64);

function ensureStripScratch(cols: number, crossingCount: number): void {
  if (stripLower.length < cols) {
    stripLower = new Float64Array(cols);
    stripUpper = new Float64Array(cols);
  }
  if (crossLower.length < crossingCount) {
    crossLower = new Float64Array(crossingCount);
    crossUpper = new Float64Array(crossingCount);
    intervalLength = new Float64Array(crossingCount);
    intervalCount = new Float64Array(crossingCount);
  }
}

/** Whether radius r lies inside one of the open annuli (strictly). */
function isOpen(annuli: ReadonlyArray<readonly [number, number]>, r: number): boolean {
  for (let i = 0; i < annuli.length; i++) {
    const annulus = annuli[i]!;
    if (r > annulus[0] && r < annulus[1]) return true;
  }
  return false;
}

/** Number of the descending circles (the first circleCount) with r > |zc|: they come first. */
function crossedCount(circles: Float64Array, circleCount: number, zc: number): number {
  let crossed = 0;
  while (crossed < circleCount && circles[crossed]! > Math.abs(zc)) crossed++;
  return crossed;
}

function half(radius: number, z: number): number {
  const q = radius * radius - z * z;
  return q > 0 ? Math.sqrt(q) : 0;
}

function halfArea(radius: number, z: number): number {
  const c = Math.max(-radius, Math.min(radius, z));
  return 0.5 * (c * half(radius, c) + radius * radius * Math.asin(c / radius));
}

/**
 * Crossing x positions (descending, leading edge first) of a strip's `crossed` circles on its two edge
 * lines, 2 crossed + 2 values each: the disc's edge, the circles' fronts, their backs, the disc's
 * back. A region circle's crossings are scaled so the strip's trapezoid holds the circle's exact area
 * between the lines (area of a circular segment: integral of sqrt(r^2 - z^2) dz, elementary
 * calculus), so the regions keep their areas however coarse the strips; the disc's own edge keeps
 * the disc lattice's corners.
 */
function crossings(
  R: number,
  circles: Float64Array,
  crossed: number,
  z0: number,
  z1: number,
  atLower: Float64Array,
  atUpper: Float64Array,
): void {
  const last = 2 * crossed + 1;
  for (let j = 0; j < crossed; j++) {
    const r = circles[j]!;
    const x0 = half(r, z0);
    const x1 = half(r, z1);
    const trapezoid = 0.5 * (x0 + x1) * (z1 - z0);
    const exact = halfArea(r, z1) - halfArea(r, z0);
    const k = trapezoid > 0 ? exact / trapezoid : 1;
    const front0 = x0 * k;
    const front1 = x1 * k;
    atLower[1 + j] = front0;
    atUpper[1 + j] = front1;
    atLower[last - 1 - j] = -front0;
    atUpper[last - 1 - j] = -front1;
  }
  const edge0 = half(R, z0);
  const edge1 = half(R, z1);
  atLower[0] = edge0;
  atUpper[0] = edge1;
  atLower[last] = -edge0;
  atUpper[last] = -edge1;
}
