/**
 * The steady speed at which a power curve P(v) reaches a target: the highest root of P(v) = target in
 * (0, maxSpeedMps], found by stepping down from maxSpeedMps until P falls below the target, then
 * bisection (Press et al., Numerical Recipes, 3rd ed., sec. 9.1). P(0) = 0 for a rider at rest, so a
 * positive target always has a root below any speed where P exceeds it. Returns NaN when P(maxSpeedMps)
 * is still below the target (the speed would exceed the stated maximum).
 *
 * @throws RangeError when targetW is not > 0, maxSpeedMps is not > 0, stepMps is not in (0, maxSpeedMps],
 * or P returns a non-finite value.
 */
export function speedForPower(
  powerW: (speedMps: number) => number,
  targetW: number,
  maxSpeedMps: number,
  stepMps: number,
  toleranceMps = 1e-9,
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
  let hi = maxSpeedMps;
  if (f(hi) < 0) return Number.NaN;
  let lo = hi;
  while (lo > 0) {
    lo = Math.max(0, lo - stepMps);
    if (lo === 0 || f(lo) < 0) break;
    hi = lo;
  }
  // f(lo) < 0 <= f(hi) (at lo = 0, P = 0 < target).
  for (let i = 0; i < 200 && hi - lo > toleranceMps; i++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
