/**
 * Normal (+y) velocity at a point P = (px, 0, pz) of the plane y = 0 induced by a unit-circulation
 * vortex segment A -> B lying in the same plane. It is the y component of the Biot-Savart segment
 * law (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., eq. 10.115), which for coplanar points
 * reduces to  v_y = r0 . (r1/|r1| - r2/|r2|) / (4 pi (r1z r2x - r1x r2z)),
 * the other components vanishing. Same cut-off as `segmentVelocity`. No checks: hot loop kernel.
 */

const CORE_RELATIVE = 1e-10;
const FOUR_PI = 4 * Math.PI;

export function planarSegmentNormalVelocity(
  ax: number,
  az: number,
  bx: number,
  bz: number,
  px: number,
  pz: number,
): number {
  const r1x = px - ax;
  const r1z = pz - az;
  const r2x = px - bx;
  const r2z = pz - bz;
  const r0x = bx - ax;
  const r0z = bz - az;
  const c = r1z * r2x - r1x * r2z;
  const l2 = r0x * r0x + r0z * r0z;
  if (!(c * c > CORE_RELATIVE * CORE_RELATIVE * l2 * l2)) return 0;
  const r1 = Math.sqrt(r1x * r1x + r1z * r1z);
  const r2 = Math.sqrt(r2x * r2x + r2z * r2z);
  return (r0x * (r1x / r1 - r2x / r2) + r0z * (r1z / r1 - r2z / r2)) / (FOUR_PI * c);
}
