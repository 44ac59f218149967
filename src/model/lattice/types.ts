/**
 * Data shapes of the lifting-surface lattice (vortex rings on the wheel's disc, in the x-z plane).
 *
 * Layout: `spanCount` strips stacked in z (spanwise, cosine-spaced), each cut into `chordCount`
 * panels in x (chordwise). Panel index p = strip * chordCount + c, c = 0 at the leading edge
 * (largest x: the air comes from +x). Flow is linearised about the plane y = 0; the freestream's
 * normal component is V sin(beta) along +y.
 *
 * Ring orientation: a positive circulation has its bound (leading) segment pointing along +z, so by
 * Kutta-Joukowski it carries a normal force along +y for air moving along -x.
 */
export interface RingLattice {
  spanCount: number;
  chordCount: number;
  panelCount: number;
  /** Reference area of the coefficients (m^2): pi R^2 for the disc. */
  referenceAreaM2: number;
  /** Height of the ground plane mirrored in the lattice (m); NaN when there is no ground. */
  groundZM: number;
  /** Strip edges in z (m), spanCount + 1 values, increasing. */
  edgeZ: Float64Array;
  /**
   * x of the vortex-ring corners (m) of each strip, row-major spanCount x (chordCount + 1): corner
   * (s, m) of strip s lies on its lower edge line (z = edgeZ[s]) or upper edge line (edgeZ[s + 1]) at
   * chordwise vortex line m (m = 0: the leading panel's quarter chord; m = chordCount: a quarter
   * panel behind the trailing edge, where the wake legs start). Strips may place their corners
   * independently (a wheel lattice aligns each strip's panels with the region edges it crosses).
   */
  nodeLowerX: Float64Array;
  nodeUpperX: Float64Array;
  /** Control point of each panel (m). */
  controlX: Float64Array;
  controlZ: Float64Array;
  /** Point where each panel's bound vortex sits (its quarter chord), where its load acts (m). */
  boundX: Float64Array;
  boundZ: Float64Array;
  /** Panel centroid (m), used to sample covers and spoke solidity at the panel. */
  centroidX: Float64Array;
  centroidZ: Float64Array;
  /** Panel's geometric area (m^2), its spanwise width (m) and its chordwise length (m, area / width). */
  areaM2: Float64Array;
  spanWidthM: Float64Array;
  chordLengthM: Float64Array;
  /**
   * Influence matrix, row-major panelCount x panelCount: the normal (+y) velocity at control
   * point i induced by a unit circulation (1 m^2/s) on vortex ring j, including ring j's wake
   * (trailing-edge rings) and, when `ground`, the mirror image of both. Units 1/m.
   */
  influence: Float64Array;
}

/** A strip lattice whose adjacent strips share their corners on each edge line. */
export interface StripLattice extends RingLattice {
  /**
   * x of the vortex-ring corners (m), row-major (spanCount + 1) x (chordCount + 1): corner (k, m)
   * lies on strip edge k at chordwise vortex line m (m = 0: the leading panel's quarter chord;
   * m = chordCount: a quarter panel behind the trailing edge, where the wake legs start).
   */
  nodeX: Float64Array;
}

/** The wheel's disc of radius R (hub at the origin), optionally standing on the ground z = -R. */
export interface DiscLattice extends StripLattice {
  radiusM: number;
  ground: boolean;
}

/**
 * The lattice solved for a unit forcing (V sin(beta) = 1 m/s, V = 1 m/s) with given panel
 * openness. Everything the wheel assembly needs scales from these with V, sin(beta), cos(beta).
 */
export interface LatticeSolution {
  /** Ring circulations for unit forcing (m^2/s per m/s of normal freestream). */
  gamma: Float64Array;
  /** Load per panel for unit forcing: normal-force coefficient contribution (force / (q S)). */
  panelNormalCoefficient: Float64Array;
  /** Potential normal-force slope Kp: C_N per radian at small yaw, on S = pi R^2. */
  normalSlope: number;
  /** Induced-drag factor Ki = C_Di / C_N^2 from the Trefftz plane (with the ground image); 0 when C_N = 0. */
  inducedDragFactor: number;
  /** Induced-drag coefficient per sin^2(beta) on S (= Ki Kp^2). */
  inducedDragSlope: number;
  /** Drag from through-flow dissipation in porous panels, per sin^2(beta), on S. */
  porousDragSlope: number;
  /** Centre of pressure of the normal force (m, hub frame); NaN when the normal force is 0. */
  centreX: number;
  centreZ: number;
}

/** An assembled and LU-factorised lattice system, reusable for any forcing (every yaw and speed). */
export interface LatticeFactor {
  lattice: RingLattice;
  /** Panel openness (0 solid .. 1 fully open), a private copy. */
  openness: Float64Array;
  /** LU factors of the system matrix (row-major, in place) and the row interchanges. */
  lu: Float64Array;
  pivots: Int32Array;
}
