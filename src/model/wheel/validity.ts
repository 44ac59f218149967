/**
 * The model's stated validity range. Results outside it are computed but flagged, never silently
 * extrapolated. Numbers and their reasons are documented in README "Model and validity".
 */
export const VALIDITY = {
  /** Polhamus' suction analogy is trusted for slender low-aspect-ratio plates to about 20-30 deg
   * before vortex breakdown (Polhamus 1966, NASA TN D-3767; from memory). */
  maxYawRad: (30 * Math.PI) / 180,
  /** Airspeeds for which the section and friction laws used hold for wheel-sized parts (m/s). */
  minAirspeedMps: 2,
  maxAirspeedMps: 40,
  /** Ground speed / airspeed ratios met in riding (tunnel = 1; a tail wind raises it). */
  maxRotationRatio: 3,
  /** A lattice whose relative GCI exceeds this is flagged as not converged. */
  maxGciRelative: 0.05,
} as const;

/** Flag codes a point may carry, with their plain-language meaning. */
export const FLAG_MESSAGES: Record<string, string> = {
  yaw_beyond_range: 'yaw angle beyond 30 deg: the high-yaw (vortex) correction is outside its trusted range',
  airspeed_beyond_range: 'airspeed outside 2..40 m/s: section and friction laws extrapolated',
  rotation_ratio_beyond_range: 'ground speed / airspeed outside 0..3: spoke porosity rule extrapolated',
  spoke_reynolds_beyond_range: 'spoke Reynolds number outside the section-drag fit',
  suction_negative: 'potential leading-edge suction came out negative (heavily porous surface): set to zero',
  lattice_not_converged: 'lattice grid-convergence index above 5% or non-monotone convergence',
  rim_reynolds_beyond_range:
    'rim and tyre section Reynolds number outside 1e4..2e5: subcritical section drag data extrapolated',
};
