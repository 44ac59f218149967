import { allocateByLength } from './allocateByLength';

// Module-private scratch (grown on demand, never returned): the region circles (descending), the
// anchors' parameters and stations, the zones' lengths and strip counts, the control stations.
let circleScratch = new Float64Array(8);
let anchorUScratch = new Float64Array(16);
let anchorKScratch = new Float64Array(16);
let zoneLength = new Float64Array(16);
let zoneCount = new Float64Array(16);
let controlScratch = new Float64Array(64);

/** The strip stations of a wheel lattice (wheelStripStations). */
export interface WheelStripStations {
  /** Strip count (spanCount, or more when the regions need more). */
  strips: number;
  /** The region circles' radii (m), descending: the first circleCount values (scratch, reused). */
  circleCount: number;
  circles: Float64Array;
  /** Strip edges in z (m), strips + 1 values, increasing (a new array). */
  edgeZ: Float64Array;
  /** Each strip's control station z (m), the first `strips` values (scratch, reused). */
  controlZ: Float64Array;
}

/** z of the spacing's parameter u in [0, 1] (see buildDiscLattice). */
function zOf(u: number, R: number, ground: boolean): number {
  return ground ? R * (-1 + 2 * Math.sin((Math.PI * u) / 2)) : R * Math.sin((Math.PI * (2 * u - 1)) / 2);
}

/** The spacing's parameter of z: the inverse of zOf. */
function uOf(z: number, R: number, ground: boolean): number {
  return ground
    ? (2 / Math.PI) * Math.asin(Math.min(1, (z / R + 1) / 2))
    : 0.5 + Math.asin(Math.max(-1, Math.min(1, z / R))) / Math.PI;
}

/** Inserts v into the `count` sorted values from sorted[from] (descending when `descending`, else
 * ascending) unless already there; returns the new count (sorted must have room for one more). */
function insertUnique(
  sorted: Float64Array,
  from: number,
  count: number,
  v: number,
  descending: boolean,
): number {
  let at = from;
  const end = from + count;
  while (at < end && (descending ? sorted[at]! > v : sorted[at]! < v)) at++;
  if (at < end && sorted[at] === v) return count;
  for (let q = end; q > at; q--) sorted[q] = sorted[q - 1]!;
  sorted[at] = v;
  return count + 1;
}

/** Station parameter of t in station units [0, N]: linear between the anchors (stations anchorK,
 * parameters anchorU, anchorCount of each). */
function warp(t: number, anchorK: Float64Array, anchorU: Float64Array, anchorCount: number): number {
  let a = 0;
  while (a < anchorCount - 2 && t > anchorK[a + 1]!) a++;
  const k0 = anchorK[a]!;
  const k1 = anchorK[a + 1]!;
  return anchorU[a]! + ((t - k0) / (k1 - k0)) * (anchorU[a + 1]! - anchorU[a]!);
}

/**
 * The strip stations: the N + 1 regular stations of the spacing's parameter, warped so that the tops
 * and bottoms of the region circles fall on stations: each required parameter takes the nearest free
 * station and the map between anchors is linear, keeping the strip count and a smooth spacing.
 * Strips per zone between consecutive required parameters: in proportion to the zone's length in
 * the parameter, at least one each (largest remainder), so the spacing stays close to the regular one.
 * The zone between the bottom and top of the innermost circle needs two: a single strip there would
 * have the circle's top and bottom as its edge lines, where its crossings are both at x = 0, leaving
 * a panel of zero chord with its control point on its own bound vortex (a singular system). Like
 * the chord count, the strip count is raised when the regions need more strips than asked.
 * The spacing is buildDiscLattice's (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3: the
 * cosine rule of the disc, or of the disc and its ground image); the control stations sit at the
 * strips' mid-parameter of the warped spacing. Part of buildWheelLattice, which checks the annuli.
 */
export function wheelStripStations(
  R: number,
  spanCount: number,
  ground: boolean,
  annuli: ReadonlyArray<readonly [number, number]>,
): WheelStripStations {
  if (!(R > 0) || !Number.isFinite(R) || !Number.isInteger(spanCount) || spanCount < 2) {
    throw new RangeError(
      `wheelStripStations: radiusM=${R} must be finite and > 0, spanCount=${spanCount} >= 2`,
    );
  }
  if (circleScratch.length < 2 * annuli.length + 1) {
    circleScratch = new Float64Array(2 * annuli.length + 1);
    anchorUScratch = new Float64Array(4 * annuli.length + 3);
    anchorKScratch = new Float64Array(4 * annuli.length + 3);
    zoneLength = new Float64Array(4 * annuli.length + 3);
    zoneCount = new Float64Array(4 * annuli.length + 3);
  }
  const circles = circleScratch;
  let circleCount = 0;
  for (let i = 0; i < annuli.length; i++) {
    for (let e = 0; e < 2; e++) {
      const r = annuli[i]![e]!;
      if (r > 0 && r < R * (1 - 1e-9)) circleCount = insertUnique(circles, 0, circleCount, r, true);
    }
  }
  // anchorU: 0, the required parameters (ascending, distinct), 1.
  const anchorU = anchorUScratch;
  let required = 0;
  for (let c = 0; c < circleCount; c++) {
    for (let e = 0; e < 2; e++) {
      const u = uOf(e === 0 ? -circles[c]! : circles[c]!, R, ground);
      if (u > 1e-12 && u < 1 - 1e-12) required = insertUnique(anchorU, 1, required, u, false);
    }
  }
  anchorU[0] = 0;
  anchorU[required + 1] = 1;
  const anchorCount = required + 2;
  let middle = -1;
  if (circleCount > 0) {
    const innermost = circles[circleCount - 1]!;
    const bottom = uOf(-innermost, R, ground);
    const top = uOf(innermost, R, ground);
    for (let j = 0; j + 1 < anchorCount && middle < 0; j++) {
      if (anchorU[j] === bottom && anchorU[j + 1] === top) middle = j;
    }
  }
  const zones = anchorCount - 1;
  const strips = Math.max(spanCount, zones + (middle >= 0 ? 1 : 0));
  for (let j = 0; j < zones; j++) zoneLength[j] = anchorU[j + 1]! - anchorU[j]!;
  const zoneStrips = zoneCount;
  allocateByLength(zoneLength, zones, strips, zoneStrips);
  if (middle >= 0 && zoneStrips[middle]! < 2) {
    let widest = middle === 0 ? 1 : 0;
    for (let j = 0; j < zones; j++) {
      if (j !== middle && zoneStrips[j]! > zoneStrips[widest]!) widest = j;
    }
    zoneStrips[widest]!--;
    zoneStrips[middle]!++;
  }
  const anchorK = anchorKScratch;
  anchorK[0] = 0;
  for (let j = 0; j < zones; j++) anchorK[j + 1] = anchorK[j]! + zoneStrips[j]!;
  const edgeZ = new Float64Array(strips + 1);
  for (let k = 0; k <= strips; k++) {
    edgeZ[k] = k === 0 ? -R : k === strips ? R : zOf(warp(k, anchorK, anchorU, anchorCount), R, ground);
  }
  if (controlScratch.length < strips) controlScratch = new Float64Array(strips);
  const controlZ = controlScratch;
  for (let s = 0; s < strips; s++) controlZ[s] = zOf(warp(s + 0.5, anchorK, anchorU, anchorCount), R, ground);
  return { strips, circleCount, circles, edgeZ, controlZ };
}
