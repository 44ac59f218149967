import type { PlanarVortexSet } from './types';

const FOUR_PI = 4 * Math.PI;
/** The cut-off of segmentVelocity / semiInfiniteSegmentVelocity: points closer to a line than this
 * fraction of its length (or of their distance from a leg's start) get nothing from it. */
const CORE_RELATIVE_SQ = 1e-20;

/**
 * Velocity (m/s) induced at (x, y, z) by a packed set of vortex lines lying in the plane y = 0 and, with
 * a ground, their mirror images about z = groundZM with opposite circulation (method of images).
 * Biot-Savart for a straight segment (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., eq. 2.72 and
 * 10.115) and its semi-infinite limit, written out for lines with y = 0 so the loop touches no other
 * function: for r1 = P - A = (dx1, y, dz1), r2 = P - B, r0 = B - A,
 *   r1 x r2 = (y (dz2 - dz1), dz1 dx2 - dx1 dz2, y (dx1 - dx2)),
 * and for a leg along -x, e x r1 = (0, dz1, -y). Same cut-offs as segmentVelocity and
 * semiInfiniteSegmentVelocity, so it agrees with latticeVelocity to rounding.
 * Writes (vx, vy, vz) into `out` and returns it.
 */
export function planarVortexVelocity(
  set: PlanarVortexSet,
  x: number,
  y: number,
  z: number,
  out: Float64Array,
): Float64Array {
  if (out.length < 3)
    throw new RangeError(`planarVortexVelocity: out.length=${out.length} must be at least 3`);
  const seg = set.segments;
  const legs = set.legs;
  const ground = Number.isFinite(set.groundZM);
  const images = ground ? 2 : 1;
  const g2 = 2 * set.groundZM;
  let vx = 0;
  let vy = 0;
  let vz = 0;
  const yy = y * y;
  for (let image = 0; image < images; image++) {
    const sign = image === 0 ? 1 : -1;
    for (let i = 0; i < set.segmentCount; i++) {
      const o = 5 * i;
      const ax = seg[o]!;
      const bx = seg[o + 2]!;
      const az = image === 0 ? seg[o + 1]! : g2 - seg[o + 1]!;
      const bz = image === 0 ? seg[o + 3]! : g2 - seg[o + 3]!;
      const dx1 = x - ax;
      const dz1 = z - az;
      const dx2 = x - bx;
      const dz2 = z - bz;
      const cx = y * (dz2 - dz1);
      const cy = dz1 * dx2 - dx1 * dz2;
      const cz = y * (dx1 - dx2);
      const c2 = cx * cx + cy * cy + cz * cz;
      const r0x = bx - ax;
      const r0z = bz - az;
      const l2 = r0x * r0x + r0z * r0z;
      if (!(c2 > CORE_RELATIVE_SQ * l2 * l2)) continue;
      const r1 = Math.sqrt(dx1 * dx1 + yy + dz1 * dz1);
      const r2 = Math.sqrt(dx2 * dx2 + yy + dz2 * dz2);
      const k =
        (((sign * seg[o + 4]!) / FOUR_PI) * (r0x * (dx1 / r1 - dx2 / r2) + r0z * (dz1 / r1 - dz2 / r2))) / c2;
      vx += k * cx;
      vy += k * cy;
      vz += k * cz;
    }
    for (let i = 0; i < set.legCount; i++) {
      const o = 3 * i;
      const az = image === 0 ? legs[o + 1]! : g2 - legs[o + 1]!;
      const dx1 = x - legs[o]!;
      const dz1 = z - az;
      const c2 = dz1 * dz1 + yy;
      const r1Sq = dx1 * dx1 + c2;
      if (!(c2 > CORE_RELATIVE_SQ * r1Sq)) continue;
      const k = (((sign * legs[o + 2]!) / FOUR_PI) * (1 - dx1 / Math.sqrt(r1Sq))) / c2;
      vy += k * dz1;
      vz -= k * y;
    }
  }
  out[0] = vx;
  out[1] = vy;
  out[2] = vz;
  return out;
}
