/**
 * Kinetic-energy term of Martin et al. 1998 (J. Appl. Biomech. 14, eq. 7): the mean power to change
 * speed from V_i to V_f over t_f - t_i, with the wheels' rotational inertia as an added mass I / r^2:
 * P_KE = 1/2 (m + I / r^2) (V_f^2 - V_i^2) / (t_f - t_i). (Martin et al. used I = 0.14 kg m^2 for both
 * wheels and r = 0.311 m.)
 *
 * @throws RangeError when the mass, inertia or speeds are negative, the radius or interval is not > 0, or a value is not finite.
 */
export function martinKineticPowerW(
  massKg: number,
  wheelInertiaKgM2: number,
  wheelRadiusM: number,
  initialSpeedMps: number,
  finalSpeedMps: number,
  intervalS: number,
): number {
  if (!(massKg >= 0) || !Number.isFinite(massKg))
    throw new RangeError(`massKg=${massKg}: must be finite and >= 0`);
  if (!(wheelInertiaKgM2 >= 0) || !Number.isFinite(wheelInertiaKgM2)) {
    throw new RangeError(`wheelInertiaKgM2=${wheelInertiaKgM2}: must be finite and >= 0`);
  }
  if (!(wheelRadiusM > 0) || !Number.isFinite(wheelRadiusM)) {
    throw new RangeError(`wheelRadiusM=${wheelRadiusM}: must be finite and > 0`);
  }
  if (!(initialSpeedMps >= 0) || !Number.isFinite(initialSpeedMps)) {
    throw new RangeError(`initialSpeedMps=${initialSpeedMps}: must be finite and >= 0`);
  }
  if (!(finalSpeedMps >= 0) || !Number.isFinite(finalSpeedMps)) {
    throw new RangeError(`finalSpeedMps=${finalSpeedMps}: must be finite and >= 0`);
  }
  if (!(intervalS > 0) || !Number.isFinite(intervalS))
    throw new RangeError(`intervalS=${intervalS}: must be finite and > 0`);
  const effectiveMass = massKg + wheelInertiaKgM2 / (wheelRadiusM * wheelRadiusM);
  return (
    (0.5 * effectiveMass * (finalSpeedMps * finalSpeedMps - initialSpeedMps * initialSpeedMps)) / intervalS
  );
}
