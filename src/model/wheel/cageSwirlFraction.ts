function swirlInputError(torque: number, radius: number, omega: number, throughflow: number, rho: number) {
  if (!(torque >= 0) || !Number.isFinite(torque)) {
    return new RangeError(`torquePerRadiusNmPerM=${torque}: must be finite and >= 0`);
  }
  const positive: [string, number][] = [
    ['radiusM', radius],
    ['omegaRadPerS', omega],
    ['throughflowMps', throughflow],
  ];
  for (const [name, value] of positive) {
    if (!(value > 0) || !Number.isFinite(value))
      return new RangeError(`${name}=${value}: must be finite and > 0`);
  }
  return new RangeError(`rhoKgPerM3=${rho}: must be finite and > 0`);
}

/**
 * Mean swirl fraction a' = v_theta / (omega r) that the torque of one annulus of a rotating cage (a
 * rotor's blades, a wheel's spokes) puts into the air passing through it, from the annulus
 * angular-momentum balance of blade-element momentum theory (H. Glauert 1935, "Airplane propellers", in
 * W. F. Durand (ed.), Aerodynamic Theory, vol. IV, div. L; as in T. Burton, D. Sharpe, N. Jenkins,
 * E. Bossanyi, Wind Energy Handbook, ch. 3, and J. F. Manwell, J. G. McGowan, A. L. Rogers, Wind Energy
 * Explained, ch. 3; from memory):
 *
 *   dQ/dr = (rho U 2 pi r) (2 a' omega r) r = 4 pi rho U omega r^3 a'
 *
 * The mass flow rho U 2 pi r dr through the annulus leaves it with the far-wake swirl 2 a' omega r, half
 * of which it has at the disc (a' is the disc value, the one the blades meet). U is the speed at which air
 * passes through the disc. For a disc met edgewise or obliquely, Glauert's momentum theory of the rotor in
 * forward flight takes the mass flow through the disc's area at the resultant speed at the disc (H. Glauert
 * 1926, "A general theory of the autogyro", ARC R&M 1111): a rotor that makes no thrust, such as spokes at
 * zero pitch, induces no axial velocity, so U is the airspeed itself.
 *
 * @param torquePerRadiusNmPerM dQ/dr, the annulus torque per unit radius put into the air (N m / m, >= 0)
 * @param radiusM r (> 0)
 * @param omegaRadPerS omega, the cage's rotation rate (> 0)
 * @param throughflowMps U, the speed at which air passes through the disc (> 0)
 * @param rhoKgPerM3 air density (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function cageSwirlFraction(
  torquePerRadiusNmPerM: number,
  radiusM: number,
  omegaRadPerS: number,
  throughflowMps: number,
  rhoKgPerM3: number,
): number {
  // One combined test keeps the hot path small (it runs for every spoke element); the message is built
  // only on failure.
  if (
    !(torquePerRadiusNmPerM >= 0 && torquePerRadiusNmPerM < Number.POSITIVE_INFINITY) ||
    !(radiusM > 0 && radiusM < Number.POSITIVE_INFINITY) ||
    !(omegaRadPerS > 0 && omegaRadPerS < Number.POSITIVE_INFINITY) ||
    !(throughflowMps > 0 && throughflowMps < Number.POSITIVE_INFINITY) ||
    !(rhoKgPerM3 > 0 && rhoKgPerM3 < Number.POSITIVE_INFINITY)
  ) {
    throw swirlInputError(torquePerRadiusNmPerM, radiusM, omegaRadPerS, throughflowMps, rhoKgPerM3);
  }
  return torquePerRadiusNmPerM / (4 * Math.PI * rhoKgPerM3 * throughflowMps * omegaRadPerS * radiusM ** 3);
}
