/**
 * Potential-energy (gravity) term of Martin et al. 1998 (J. Appl. Biomech. 14, eq. 6):
 * P_PE = V_G m g sin(arctan G), G the gradient (rise over run); negative downhill.
 *
 * @throws RangeError when a speed or mass is negative, or a value is not finite.
 */
export function martinGravityPowerW(
  groundSpeedMps: number,
  massKg: number,
  gradient: number,
  gravityMps2: number,
): number {
  if (!(groundSpeedMps >= 0) || !Number.isFinite(groundSpeedMps)) {
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite and >= 0`);
  }
  if (!(massKg >= 0) || !Number.isFinite(massKg))
    throw new RangeError(`massKg=${massKg}: must be finite and >= 0`);
  if (!Number.isFinite(gradient)) throw new RangeError(`gradient=${gradient}: must be finite`);
  if (!(gravityMps2 > 0) || !Number.isFinite(gravityMps2)) {
    throw new RangeError(`gravityMps2=${gravityMps2}: must be finite and > 0`);
  }
  return groundSpeedMps * massKg * gravityMps2 * Math.sin(Math.atan(gradient));
}
