import type { WheelLoads, WheelYawCurve } from './types';

/**
 * The wheel's loads at apparent airspeed V and yaw beta from a tabulated yaw curve: piecewise-linear
 * interpolation in |beta|, odd quantities (side force, roll and steering moments) taking the sign of beta,
 * and every load scaled by dynamic pressure, (V / V_ref)^2 (Reynolds-number effects neglected between
 * the table's airspeed and V; dimensional analysis at fixed force coefficients, e.g. Hoerner,
 * Fluid-Dynamic Drag, ch. 1). Beyond |beta| = pi/2 the air arrives from behind, outside the model: the
 * loads are mirrored from pi - |beta| with the axial force reversed (a fore-aft symmetric planform) and
 * `mirrored` is set so callers can flag it.
 *
 * @throws RangeError when airspeedMps is negative or not finite, or yawRad is not finite.
 */
export function wheelYawCurveLoads(
  curve: WheelYawCurve,
  airspeedMps: number,
  yawRad: number,
  out: WheelLoads = {
    axialN: 0,
    sideN: 0,
    rollMomentNm: 0,
    steeringMomentNm: 0,
    axleTorqueNm: 0,
    mirrored: false,
  },
): WheelLoads {
  if (!(airspeedMps >= 0) || !Number.isFinite(airspeedMps)) {
    throw new RangeError(`airspeedMps=${airspeedMps}: must be finite and >= 0`);
  }
  if (!Number.isFinite(yawRad)) throw new RangeError(`yawRad=${yawRad}: must be finite`);
  // Wrap to (-pi, pi].
  let b = yawRad;
  if (b > Math.PI || b <= -Math.PI) b -= 2 * Math.PI * Math.floor((b + Math.PI) / (2 * Math.PI));
  if (b === -Math.PI) b = Math.PI;
  const sign = b < 0 ? -1 : 1;
  let a = Math.abs(b);
  const mirrored = a > Math.PI / 2;
  if (mirrored) a = Math.PI - a;
  const ys = curve.yawRad;
  const n = ys.length;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (ys[mid]! <= a) lo = mid;
    else hi = mid;
  }
  const y0 = ys[lo]!;
  const y1 = ys[hi]!;
  let t = y1 > y0 ? (a - y0) / (y1 - y0) : 0;
  if (t < 0) t = 0;
  else if (t > 1) t = 1;
  const s = (airspeedMps / curve.referenceAirspeedMps) ** 2;
  const lerp = (v: Float64Array) => v[lo]! + t * (v[hi]! - v[lo]!);
  out.axialN = (mirrored ? -s : s) * lerp(curve.axialN);
  out.sideN = sign * s * lerp(curve.sideN);
  out.rollMomentNm = sign * s * lerp(curve.rollMomentNm);
  out.steeringMomentNm = sign * s * lerp(curve.steeringMomentNm);
  out.axleTorqueNm = s * lerp(curve.axleTorqueNm);
  out.mirrored = mirrored;
  return out;
}
