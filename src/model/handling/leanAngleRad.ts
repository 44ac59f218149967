/**
 * Lean angle that balances a steady aerodynamic roll moment with gravity. Moments about the line of the
 * tyre contacts: a side force F whose upright roll moment about the contact is M = F z_cp acts, leaned
 * by phi, with arm z_cp cos(phi); gravity m g acts at the centre of mass, arm h sin(phi). Balance:
 * m g h sin(phi) = |M| cos(phi), so tan(phi) = |M| / (m g h) — the same statics as steady cornering,
 * where the centrifugal force m v^2 / r at the centre of mass gives tan(phi) = v^2 / (g r)
 * (Cossalter, Motorcycle Dynamics, 2nd ed., sec. 4.1, thin tyres; from memory). Rigid rider, thin tyres,
 * steady state (no roll inertia).
 *
 * @throws RangeError when massKg, comHeightM or gravityMps2 is not > 0, or rollMomentNm is not finite.
 */
export function leanAngleRad(
  rollMomentNm: number,
  massKg: number,
  comHeightM: number,
  gravityMps2: number,
): number {
  if (!Number.isFinite(rollMomentNm)) throw new RangeError(`rollMomentNm=${rollMomentNm}: must be finite`);
  if (!(massKg > 0) || !Number.isFinite(massKg))
    throw new RangeError(`massKg=${massKg}: must be finite and > 0`);
  if (!(comHeightM > 0) || !Number.isFinite(comHeightM)) {
    throw new RangeError(`comHeightM=${comHeightM}: must be finite and > 0`);
  }
  if (!(gravityMps2 > 0) || !Number.isFinite(gravityMps2)) {
    throw new RangeError(`gravityMps2=${gravityMps2}: must be finite and > 0`);
  }
  return Math.atan(Math.abs(rollMomentNm) / (massKg * gravityMps2 * comHeightM));
}
