/**
 * Rolling-resistance term of Martin et al. 1998 (J. Appl. Biomech. 14, eq. 4):
 * P_RR = V_G cos(arctan G) C_RR m g, G the gradient (rise over run).
 *
 * @throws RangeError when a speed, mass or coefficient is negative, or a value is not finite.
 */
export function martinRollingPowerW(
  groundSpeedMps: number,
  massKg: number,
  crr: number,
  gradient: number,
  gravityMps2: number,
): number {
  if (!(groundSpeedMps >= 0) || !Number.isFinite(groundSpeedMps)) {
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite and >= 0`);
  }
  if (!(massKg >= 0) || !Number.isFinite(massKg))
    throw new RangeError(`massKg=${massKg}: must be finite and >= 0`);
  if (!(crr >= 0) || !Number.isFinite(crr)) throw new RangeError(`crr=${crr}: must be finite and >= 0`);
  if (!Number.isFinite(gradient)) throw new RangeError(`gradient=${gradient}: must be finite`);
  if (!(gravityMps2 > 0) || !Number.isFinite(gravityMps2)) {
    throw new RangeError(`gravityMps2=${gravityMps2}: must be finite and > 0`);
  }
  return groundSpeedMps * Math.cos(Math.atan(gradient)) * crr * massKg * gravityMps2;
}
