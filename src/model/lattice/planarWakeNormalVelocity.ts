/**
 * Normal (+y) velocity at P = (px, 0, pz) induced by a unit-circulation semi-infinite vortex that
 * starts at A = (ax, 0, az) and runs to x -> -infinity in the plane y = 0 (a planar wake leg).
 * The y component of the semi-infinite Biot-Savart law (Katz & Plotkin, Low-Speed Aerodynamics,
 * 2nd ed., sec. 2.13) with e = (-1, 0, 0):  v_y = (1 - r1x / |r1|) / (4 pi r1z),  r1 = P - A.
 * Same cut-off as `semiInfiniteSegmentVelocity`. No checks: hot loop kernel.
 */

const CORE_RELATIVE = 1e-10;
const FOUR_PI = 4 * Math.PI;

export function planarWakeNormalVelocity(ax: number, az: number, px: number, pz: number): number {
  const r1x = px - ax;
  const r1z = pz - az;
  const r1Sq = r1x * r1x + r1z * r1z;
  if (!(r1z * r1z > CORE_RELATIVE * CORE_RELATIVE * r1Sq)) return 0;
  return (1 - r1x / Math.sqrt(r1Sq)) / (FOUR_PI * r1z);
}
