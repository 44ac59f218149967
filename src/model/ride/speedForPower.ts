/**
 * The steady speed at which a power curve P(v) reaches a target: the highest root of P(v) = target in
 * (0, maxSpeedMps], bracketed by stepping down from maxSpeedMps until P falls below the target, then
 * refined by the Illinois variant of regula falsi (Dowell & Jarratt 1971, BIT 11, 168-174; Press et al.,
 * Numerical Recipes, 3rd ed., sec. 9.2) until |P - target| <= relTolerance x target. P(0) = 0 for a rider
 * at rest, so a positive target always has a root below any speed where P exceeds it. Returns NaN when
 * P(maxSpeedMps) is still below the target (the speed would exceed the stated maximum).
 *
 * @throws RangeError when targetW is not > 0, maxSpeedMps is not > 0, stepMps is not in (0, maxSpeedMps],
 * or P returns a non-finite value.
 */
export function speedForPower(
  powerW: (speedMps: number) => number,
  targetW: number,
  maxSpeedMps: number,
  stepMps: number,
  relTolerance = 1e-12,
): number {
  if (!(targetW > 0) || !Number.isFinite(targetW))
    throw new RangeError(`targetW=${targetW}: must be finite and > 0`);
  if (!(maxSpeedMps > 0) || !Number.isFinite(maxSpeedMps)) {
    throw new RangeError(`maxSpeedMps=${maxSpeedMps}: must be finite and > 0`);
  }
  if (!(stepMps > 0 && stepMps <= maxSpeedMps)) {
    throw new RangeError(`stepMps=${stepMps}: must be within (0, maxSpeedMps=${maxSpeedMps}]`);
  }
  const f = (v: number) => {
    const p = powerW(v);
    if (!Number.isFinite(p)) throw new RangeError(`powerW(${v})=${p}: must be finite`);
    return p - targetW;
  };
  let b = maxSpeedMps;
  let fb = f(b);
  if (fb < 0) return Number.NaN;
  let a = b;
  let fa = fb;
  while (true) {
    a = Math.max(0, a - stepMps);
    fa = a === 0 ? -targetW : f(a);
    if (fa < 0) break;
    b = a;
    fb = fa;
  }
  // fa < 0 <= fb on [a, b].
  const tol = relTolerance * targetW;
  if (fb <= tol) return b;
  let side = 0;
  for (let i = 0; i < 200; i++) {
    const c = (fa * b - fb * a) / (fa - fb);
    const fc = f(c);
    if (Math.abs(fc) <= tol || b - a <= 1e-15 * b) return c;
    if (fc < 0) {
      a = c;
      fa = fc;
      if (side === -1) fb /= 2;
      side = -1;
    } else {
      b = c;
      fb = fc;
      if (side === 1) fa /= 2;
      side = 1;
    }
  }
  return 0.5 * (a + b);
}
