/** Wind states for averaging: speed (m/s), direction FROM relative to the heading (rad), weight (sum 1). */
export interface WindStates {
  speedsMps: Float64Array;
  fromRad: Float64Array;
  weights: Float64Array;
}

/**
 * The product quadrature of independent wind-speed and wind-direction distributions: every speed node
 * with every direction node, weight w_i w_j (Fubini: the double average over independent variables is
 * the iterated one; product rules, Davis & Rabinowitz, Methods of Numerical Integration, sec. 5.6).
 * `scale` multiplies every speed (e.g. a height correction).
 *
 * @throws RangeError when node arrays of one kind differ in length or scale is negative or not finite.
 */
export function windStates(
  speeds: { speedsMps: Float64Array; weights: Float64Array },
  directions: { fromRad: Float64Array; weights: Float64Array },
  scale = 1,
): WindStates {
  if (speeds.speedsMps.length !== speeds.weights.length) {
    throw new RangeError(
      `speeds.weights.length=${speeds.weights.length}: must equal speeds.speedsMps.length=${speeds.speedsMps.length}`,
    );
  }
  if (directions.fromRad.length !== directions.weights.length) {
    throw new RangeError(
      `directions.weights.length=${directions.weights.length}: must equal directions.fromRad.length=${directions.fromRad.length}`,
    );
  }
  if (!(scale >= 0) || !Number.isFinite(scale))
    throw new RangeError(`scale=${scale}: must be finite and >= 0`);
  const ns = speeds.speedsMps.length;
  const nd = directions.fromRad.length;
  const speedsMps = new Float64Array(ns * nd);
  const fromRad = new Float64Array(ns * nd);
  const weights = new Float64Array(ns * nd);
  for (let i = 0; i < ns; i++) {
    for (let j = 0; j < nd; j++) {
      const k = i * nd + j;
      speedsMps[k] = speeds.speedsMps[i]! * scale;
      fromRad[k] = directions.fromRad[j]!;
      weights[k] = speeds.weights[i]! * directions.weights[j]!;
    }
  }
  return { speedsMps, fromRad, weights };
}
