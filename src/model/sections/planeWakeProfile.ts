/**
 * Shape of the plane turbulent far wake, u1(y) / u1(0) = (1 - |eta|^(3/2))^2 for |eta| = |y| / b < 1 and 0
 * beyond (H. Schlichting, Boundary-Layer Theory, plane wake, from Prandtl's mixing-length solution; from
 * memory). Its integral over eta in [-1, 1] is 0.9.
 * @param eta lateral distance from the centreline over the half-width b (finite)
 * @throws RangeError when eta is not finite.
 */
export function planeWakeProfile(eta: number): number {
  if (!Number.isFinite(eta)) throw new RangeError(`eta=${eta}: must be finite`);
  const a = Math.abs(eta);
  if (a >= 1) return 0;
  const f = 1 - a * Math.sqrt(a);
  return f * f;
}
