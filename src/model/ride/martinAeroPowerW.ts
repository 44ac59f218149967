/**
 * Aerodynamic term of the cycling power model of Martin, Milliken, Cobb, McFadden & Coggan 1998
 * (J. Appl. Biomech. 14, 276-291, eq. 2): P_AT = 1/2 rho (C_D A + F_W) V_A^2 V_G, with V_A the air
 * velocity tangent to the path (ground speed plus the head-wind component) and F_W the wheels'
 * rotational drag area. Written with V_A |V_A| so that a tail wind faster than the rider pushes.
 *
 * @throws RangeError when rhoKgPerM3, cdaM2 or wheelRotationAreaM2 is negative, or a value is not finite.
 */
export function martinAeroPowerW(
  groundSpeedMps: number,
  airVelocityAlongMps: number,
  rhoKgPerM3: number,
  cdaM2: number,
  wheelRotationAreaM2: number,
): number {
  if (!Number.isFinite(groundSpeedMps))
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite`);
  if (!Number.isFinite(airVelocityAlongMps)) {
    throw new RangeError(`airVelocityAlongMps=${airVelocityAlongMps}: must be finite`);
  }
  if (!(rhoKgPerM3 >= 0) || !Number.isFinite(rhoKgPerM3)) {
    throw new RangeError(`rhoKgPerM3=${rhoKgPerM3}: must be finite and >= 0`);
  }
  if (!(cdaM2 >= 0) || !Number.isFinite(cdaM2))
    throw new RangeError(`cdaM2=${cdaM2}: must be finite and >= 0`);
  if (!(wheelRotationAreaM2 >= 0) || !Number.isFinite(wheelRotationAreaM2)) {
    throw new RangeError(`wheelRotationAreaM2=${wheelRotationAreaM2}: must be finite and >= 0`);
  }
  return (
    0.5 *
    rhoKgPerM3 *
    (cdaM2 + wheelRotationAreaM2) *
    airVelocityAlongMps *
    Math.abs(airVelocityAlongMps) *
    groundSpeedMps
  );
}
