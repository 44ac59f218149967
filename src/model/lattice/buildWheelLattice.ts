import { ringInfluenceMatrix } from './ringInfluenceMatrix';
import type { RingLattice } from './types';

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
  const isOpen = (r: number): boolean => annuli.some(([a, b]) => r > a && r < b);
  const circles = [...new Set(annuli.flat())]
    .filter((r) => r > 0 && r < R * (1 - 1e-9))
    .sort((a, b) => b - a);
  // The spacing's parameter u in [0, 1] and its inverse (see buildDiscLattice).
  const zOf = (u: number): number =>
    ground ? R * (-1 + 2 * Math.sin((Math.PI * u) / 2)) : R * Math.sin((Math.PI * (2 * u - 1)) / 2);
  const uOf = (z: number): number =>
    ground
      ? (2 / Math.PI) * Math.asin(Math.min(1, (z / R + 1) / 2))
      : 0.5 + Math.asin(Math.max(-1, Math.min(1, z / R))) / Math.PI;

  // Strip edges: the N + 1 regular stations, warped so that the tops and bottoms of the region
  // circles fall on stations: each required parameter takes the nearest free station and the map
  // between anchors is linear, keeping the strip count and a smooth spacing.
  const required = [...new Set(circles.flatMap((r) => [uOf(-r), uOf(r)]))]
    .filter((u) => u > 1e-12 && u < 1 - 1e-12)
    .sort((a, b) => a - b);
  // Strips per zone between consecutive required parameters: in proportion to the zone's length in
  // the parameter, at least one each (largest remainder), so the spacing stays close to the regular one.
  // The zone between the bottom and top of the innermost circle needs two: a single strip there would
  // have the circle's top and bottom as its edge lines, where its crossings are both at x = 0, leaving
  // a panel of zero chord with its control point on its own bound vortex (a singular system). Like
  // the chord count, the strip count is raised when the regions need more strips than asked.
  const anchorU = [0, ...required, 1];
  const innermost = circles.length > 0 ? circles[circles.length - 1]! : Number.NaN;
  const middle = anchorU.findIndex((u, j) => u === uOf(-innermost) && anchorU[j + 1] === uOf(innermost));
  const strips = Math.max(spanCount, anchorU.length - 1 + (middle >= 0 ? 1 : 0));
  const zoneStrips = allocate(
    anchorU.slice(1).map((u, j) => u - anchorU[j]!),
    strips,
  );
  if (middle >= 0 && zoneStrips[middle]! < 2) {
    let widest = middle === 0 ? 1 : 0;
    for (let j = 0; j < zoneStrips.length; j++) {
      if (j !== middle && zoneStrips[j]! > zoneStrips[widest]!) widest = j;
    }
    zoneStrips[widest]!--;
    zoneStrips[middle]!++;
  }
  const anchorK: number[] = [0];
  for (const count of zoneStrips) anchorK.push(anchorK[anchorK.length - 1]! + count);
  const warp = (t: number): number => {
    // t in station units [0, N]; linear between anchors.
    let a = 0;
    while (a < anchorK.length - 2 && t > anchorK[a + 1]!) a++;
    const k0 = anchorK[a]!;
    const k1 = anchorK[a + 1]!;
    return anchorU[a]! + ((t - k0) / (k1 - k0)) * (anchorU[a + 1]! - anchorU[a]!);
  };
  const uniqueU = Array.from({ length: strips + 1 }, (_, k) => warp(k));
  const controlU = Array.from({ length: strips }, (_, k) => warp(k + 0.5));
  const edgeZ = new Float64Array(strips + 1);
  uniqueU.forEach((u, k) => {
    edgeZ[k] = k === 0 ? -R : k === strips ? R : zOf(u);
  });

  const half = (radius: number, z: number): number => {
    const q = radius * radius - z * z;
    return q > 0 ? Math.sqrt(q) : 0;
  };
  // Crossing x positions (descending, leading edge first) of a strip's circles on its two edge lines.
  // A region circle's crossings are scaled so the strip's trapezoid holds the circle's exact area
  // between the lines (area of a circular segment: integral of sqrt(r^2 - z^2) dz, elementary
  // calculus), so the regions keep their areas however coarse the strips; the disc's own edge keeps
  // the disc lattice's corners.
  const halfArea = (radius: number, z: number): number => {
    const c = Math.max(-radius, Math.min(radius, z));
    return 0.5 * (c * half(radius, c) + radius * radius * Math.asin(c / radius));
  };
  const crossingsOf = (crossed: number[], z0: number, z1: number): [number[], number[]] => {
    const front0: number[] = [];
    const front1: number[] = [];
    for (const r of crossed) {
      const x0 = half(r, z0);
      const x1 = half(r, z1);
      const trapezoid = 0.5 * (x0 + x1) * (z1 - z0);
      const exact = halfArea(r, z1) - halfArea(r, z0);
      const k = trapezoid > 0 ? exact / trapezoid : 1;
      front0.push(x0 * k);
      front1.push(x1 * k);
    }
    const line = (edge: number, front: number[]) => [
      edge,
      ...front,
      ...[...front].reverse().map((x) => -x),
      -edge,
    ];
    return [line(half(R, z0), front0), line(half(R, z1), front1)];
  };

  // Per strip: control station, crossed circles, panel allocation; the chord count fits the worst strip.
  const controlStation = new Float64Array(strips);
  const crossedOf: number[][] = [];
  let chordCount = options.chordCount;
  for (let s = 0; s < strips; s++) {
    const zc = zOf(controlU[s]!);
    controlStation[s] = zc;
    const crossed = circles.filter((r) => r > Math.abs(zc));
    crossedOf.push(crossed);
    chordCount = Math.max(chordCount, 2 * crossed.length + 1);
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
  const lower = new Float64Array(cols);
  const upper = new Float64Array(cols);

  for (let s = 0; s < strips; s++) {
    const z0 = edgeZ[s]!;
    const z1 = edgeZ[s + 1]!;
    const zc = controlStation[s]!;
    const t = (zc - z0) / (z1 - z0);
    const crossed = crossedOf[s]!;
    const [atLower, atUpper] = crossingsOf(crossed, z0, z1);
    // Interval lengths at the control station, on the strip's trapezoid, weighted by region.
    const intervals = atLower.length - 1;
    const lengths = new Array<number>(intervals);
    for (let j = 0; j < intervals; j++) {
      const a = (1 - t) * atLower[j]! + t * atUpper[j]!;
      const b = (1 - t) * atLower[j + 1]! + t * atUpper[j + 1]!;
      const mid = 0.5 * (a + b);
      lengths[j] = Math.max(0, a - b) * (isOpen(Math.sqrt(mid * mid + zc * zc)) ? openWeight : 1);
    }
    const counts = allocate(lengths, chordCount);
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
    panelEdgeLowerX.set(lower.subarray(0, cols), nodes);
    panelEdgeUpperX.set(upper.subarray(0, cols), nodes);
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
  const influence = new Float64Array(n * n);
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

/** Share `total` panels among intervals in proportion to length, at least one each (largest remainder). */
function allocate(lengths: number[], total: number): number[] {
  const k = lengths.length;
  const sum = lengths.reduce((a, b) => a + b, 0);
  const spare = total - k;
  const ideal = lengths.map((l) => (sum > 0 ? (l / sum) * spare : spare / k));
  const counts = ideal.map((x) => 1 + Math.floor(x));
  let left = total - counts.reduce((a, b) => a + b, 0);
  const order = ideal
    .map((x, j) => [x - Math.floor(x), j] as const)
    .sort((a, b) => b[0] - a[0] || a[1] - b[1]);
  for (let q = 0; left > 0; q = (q + 1) % k, left--) counts[order[q]![1]]!++;
  return counts;
}
