/**
 * Mean over one period of |a + b sin(theta)|, in closed form:
 *   |a| >= |b|: |a|;   otherwise (2/pi) (sqrt(b^2 - a^2) + a asin(a/b)).
 * Elementary calculus: split the period where a + b sin(theta) changes sign.
 * Used for the mean crossflow speed a rotating spoke meets around a revolution.
 */
export function meanAbsSinusoid(a: number, b: number): number {
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    throw new RangeError(`meanAbsSinusoid needs finite a and b, got a=${a}, b=${b}`);
  }
  const absA = Math.abs(a);
  const absB = Math.abs(b);
  if (absA >= absB) return absA;
  return (2 / Math.PI) * (Math.sqrt(absB * absB - absA * absA) + absA * Math.asin(absA / absB));
}
