import { PLANE_WAKE_WIDTH_CONSTANT } from './planeWakeDeficit';

/**
 * Half-width b (m) of the plane turbulent far wake, b = 0.57 (x Cd L)^(1/2), the distance from the
 * centreline where the deficit vanishes (H. Schlichting, Boundary-Layer Theory, plane wake; from memory;
 * see planeWakeDeficit).
 * @param distanceM x, distance behind the body along the flow (> 0)
 * @param dragLengthM Cd L of the body (> 0)
 * @throws RangeError when an argument breaks its rule.
 */
export function planeWakeHalfWidthM(distanceM: number, dragLengthM: number): number {
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) {
    throw new RangeError(`distanceM=${distanceM}: must be finite and > 0`);
  }
  if (!(dragLengthM > 0) || !Number.isFinite(dragLengthM)) {
    throw new RangeError(`dragLengthM=${dragLengthM}: must be finite and > 0`);
  }
  return PLANE_WAKE_WIDTH_CONSTANT * Math.sqrt(distanceM * dragLengthM);
}
