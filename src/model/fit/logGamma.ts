/**
 * Natural logarithm of the gamma function for x > 0 by the Lanczos approximation with g = 7 and
 * nine coefficients (C. Lanczos 1964, SIAM J. Numer. Anal. B1, 86-96; coefficient set of
 * P. Godfrey, as tabulated in common numerical libraries, from memory), relative accuracy ~1e-15.
 * For x < 0.5 the reflection formula Gamma(x) Gamma(1 - x) = pi / sin(pi x) is used.
 */
const G = 7;
const COEFFICIENTS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];
const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

/** @throws RangeError when x is not finite and > 0. */
export function logGamma(x: number): number {
  if (!Number.isFinite(x) || x <= 0) throw new RangeError(`x=${x}: must be finite and > 0`);
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const y = x - 1;
  let a = COEFFICIENTS[0]!;
  const t = y + G + 0.5;
  for (let i = 1; i < COEFFICIENTS.length; i++) a += COEFFICIENTS[i]! / (y + i);
  return HALF_LOG_TWO_PI + (y + 0.5) * Math.log(t) - t + Math.log(a);
}
