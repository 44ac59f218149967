/**
 * Wheel-bearing friction term of Martin et al. 1998 (J. Appl. Biomech. 14, eq. 5, from the bearing
 * data of Dahn et al. 1991): P_WB = V_G (91 + 8.7 V_G) 1e-3 W, V_G in m/s, for a bicycle's two wheels.
 *
 * @throws RangeError when groundSpeedMps is negative or not finite.
 */
export function martinBearingPowerW(groundSpeedMps: number): number {
  if (!(groundSpeedMps >= 0) || !Number.isFinite(groundSpeedMps)) {
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite and >= 0`);
  }
  return groundSpeedMps * (91 + 8.7 * groundSpeedMps) * 1e-3;
}
