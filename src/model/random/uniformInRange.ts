/**
 * Inverse-transform sampling of the continuous uniform distribution on [lower, upper]:
 * x = lower + u (upper - lower) for u uniform on [0, 1) (e.g. Devroye 1986, Non-Uniform Random
 * Variate Generation, ch. II.2).
 * @throws RangeError when u is outside [0, 1] or the bounds are not finite with lower <= upper.
 */
export function uniformInRange(u: number, lower: number, upper: number): number {
  if (!(u >= 0 && u <= 1)) throw new RangeError(`u=${u}: must be in [0, 1]`);
  if (!Number.isFinite(lower) || !Number.isFinite(upper) || lower > upper) {
    throw new RangeError(`lower=${lower}, upper=${upper}: must be finite with lower <= upper`);
  }
  return lower + u * (upper - lower);
}
