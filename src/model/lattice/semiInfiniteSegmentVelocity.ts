/**
 * Velocity induced at P by a semi-infinite straight vortex starting at A and running to infinity
 * along the unit direction e, with circulation gamma (right-handed about e). It is the limit
 * B -> A + L e, L -> infinity, of the finite-segment Biot-Savart law (Katz & Plotkin,
 * Low-Speed Aerodynamics, 2nd ed., sec. 2.13, eq. 2.68-2.72 with cos(beta2) -> -1):
 *   v = gamma / (4 pi) * (1 + e . r1 / |r1|) * (e x r1) / |e x r1|^2,   r1 = P - A.
 * At a point abreast of A (e . r1 = 0) at distance h this is gamma / (4 pi h).
 * Points within CORE_RELATIVE |r1| of the line get zero velocity. `e` must be a unit vector.
 */

const CORE_RELATIVE = 1e-10;
const FOUR_PI = 4 * Math.PI;

export function semiInfiniteSegmentVelocity(
  ax: number,
  ay: number,
  az: number,
  ex: number,
  ey: number,
  ez: number,
  px: number,
  py: number,
  pz: number,
  gamma: number,
  out: Float64Array,
): Float64Array {
  if (out.length < 3) {
    throw new RangeError(`semiInfiniteSegmentVelocity: out.length=${out.length} must be at least 3`);
  }
  const eNorm = Math.sqrt(ex * ex + ey * ey + ez * ez);
  if (!(Math.abs(eNorm - 1) <= 1e-12)) {
    throw new RangeError(`semiInfiniteSegmentVelocity: |e|=${eNorm} must be 1 (a unit direction)`);
  }
  const r1x = px - ax;
  const r1y = py - ay;
  const r1z = pz - az;
  const cx = ey * r1z - ez * r1y;
  const cy = ez * r1x - ex * r1z;
  const cz = ex * r1y - ey * r1x;
  const c2 = cx * cx + cy * cy + cz * cz;
  const r1Sq = r1x * r1x + r1y * r1y + r1z * r1z;
  if (!(c2 > CORE_RELATIVE * CORE_RELATIVE * r1Sq)) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    return out;
  }
  const r1 = Math.sqrt(r1Sq);
  const k = ((gamma / FOUR_PI) * (1 + (ex * r1x + ey * r1y + ez * r1z) / r1)) / c2;
  out[0] = k * cx;
  out[1] = k * cy;
  out[2] = k * cz;
  return out;
}
