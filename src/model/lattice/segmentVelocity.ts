/**
 * Velocity induced at point P by a straight vortex segment from A to B of circulation gamma
 * (Biot-Savart law; Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 2.13 eq. 2.72 and
 * sec. 10.4.5 eq. 10.115, program VORTXL):
 *   v = gamma / (4 pi) * (r1 x r2) / |r1 x r2|^2 * r0 . (r1/|r1| - r2/|r2|),
 * r0 = B - A, r1 = P - A, r2 = P - B. The circulation is positive right-handed about A -> B.
 * Points closer to the segment's line than CORE_RELATIVE times its length (and zero-length
 * segments) get zero velocity: the cut-off that keeps the kernel finite on the line.
 * Writes (vx, vy, vz) in m/s into `out` and returns it.
 */

const CORE_RELATIVE = 1e-10;
const FOUR_PI = 4 * Math.PI;

export function segmentVelocity(
  ax: number,
  ay: number,
  az: number,
  bx: number,
  by: number,
  bz: number,
  px: number,
  py: number,
  pz: number,
  gamma: number,
  out: Float64Array,
): Float64Array {
  if (out.length < 3) {
    throw new RangeError(`segmentVelocity: out.length=${out.length} must be at least 3`);
  }
  const r1x = px - ax;
  const r1y = py - ay;
  const r1z = pz - az;
  const r2x = px - bx;
  const r2y = py - by;
  const r2z = pz - bz;
  const r0x = bx - ax;
  const r0y = by - ay;
  const r0z = bz - az;
  const cx = r1y * r2z - r1z * r2y;
  const cy = r1z * r2x - r1x * r2z;
  const cz = r1x * r2y - r1y * r2x;
  const c2 = cx * cx + cy * cy + cz * cz;
  const l2 = r0x * r0x + r0y * r0y + r0z * r0z;
  // |r1 x r2| = h |r0|: the cut-off h < CORE_RELATIVE |r0|.
  if (!(c2 > CORE_RELATIVE * CORE_RELATIVE * l2 * l2)) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    return out;
  }
  const r1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
  const r2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
  const k =
    ((gamma / FOUR_PI) *
      (r0x * (r1x / r1 - r2x / r2) + r0y * (r1y / r1 - r2y / r2) + r0z * (r1z / r1 - r2z / r2))) /
    c2;
  out[0] = k * cx;
  out[1] = k * cy;
  out[2] = k * cz;
  return out;
}
