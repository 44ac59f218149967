/**
 * Side-force impulse of a gust and the lateral speed it would give the rider and bike if nothing reacted
 * it: J = dF t (a step increment dF held for t), dv = J / m (impulse-momentum theorem, Newton's second
 * law integrated over time; e.g. Meriam & Kraige, Engineering Mechanics: Dynamics, sec. 3/9).
 *
 * @throws RangeError when durationS or massKg is not > 0, or sideForceIncrementN is not finite.
 */
export function gustImpulse(
  sideForceIncrementN: number,
  durationS: number,
  massKg: number,
): { impulseNs: number; lateralSpeedChangeMps: number } {
  if (!Number.isFinite(sideForceIncrementN)) {
    throw new RangeError(`sideForceIncrementN=${sideForceIncrementN}: must be finite`);
  }
  if (!(durationS > 0) || !Number.isFinite(durationS))
    throw new RangeError(`durationS=${durationS}: must be finite and > 0`);
  if (!(massKg > 0) || !Number.isFinite(massKg))
    throw new RangeError(`massKg=${massKg}: must be finite and > 0`);
  const impulseNs = sideForceIncrementN * durationS;
  return { impulseNs, lateralSpeedChangeMps: impulseNs / massKg };
}
