import { logGamma } from './logGamma';

/**
 * Regularized incomplete beta function I_x(a, b) by its continued fraction (Abramowitz & Stegun 1964,
 * 26.5.8), evaluated with the modified Lentz method (Lentz 1976; Press et al., Numerical Recipes,
 * 3rd ed., sec. 6.4), using the symmetry I_x(a, b) = 1 - I_{1-x}(b, a) where the fraction converges
 * fastest (x > (a + 1) / (a + b + 2)).
 */
const MAX_TERMS = 300;
const EPS = 1e-16;
const TINY = 1e-300;

function continuedFraction(x: number, a: number, b: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_TERMS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return h;
}

/** @throws RangeError when x is outside [0, 1] or a, b are not finite and > 0. */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1)) throw new RangeError(`x=${x}: must be in [0, 1]`);
  if (!Number.isFinite(a) || a <= 0) throw new RangeError(`a=${a}: must be finite and > 0`);
  if (!Number.isFinite(b) || b <= 0) throw new RangeError(`b=${b}: must be finite and > 0`);
  if (x === 0) return 0;
  if (x === 1) return 1;
  const logFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  const front = Math.exp(logFront);
  if (x < (a + 1) / (a + b + 2)) return (front * continuedFraction(x, a, b)) / a;
  return 1 - (front * continuedFraction(1 - x, b, a)) / b;
}
