/**
 * A lattice's vortex lines packed for fast velocity evaluation: everything lies in the plane y = 0
 * (the linearised wheel surface and its planar wake), with an optional mirror image about the ground.
 */
export interface PlanarVortexSet {
  /** Finite straight segments from (ax, 0, az) to (bx, 0, bz) with circulation g (m^2/s), right-handed
   * about a -> b: ax, az, bx, bz, g per segment. */
  segments: Float64Array;
  segmentCount: number;
  /** Semi-infinite legs from (ax, 0, az) running to x = -infinity (direction -x): ax, az, g per leg. */
  legs: Float64Array;
  legCount: number;
  /** Ground plane height (m) whose mirror image (opposite circulation) is added; NaN for none. */
  groundZM: number;
}
