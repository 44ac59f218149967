import type { WheelYawCurve } from './types';

/**
 * Check a yaw curve's shape: equal-length arrays, yaw strictly ascending from 0 to pi/2, finite loads,
 * positive reference airspeed and radius. Returns the curve.
 *
 * @throws RangeError naming the field, the value and the rule.
 */
export function validateWheelYawCurve(curve: WheelYawCurve): WheelYawCurve {
  const n = curve.yawRad.length;
  if (n < 2) throw new RangeError(`curve.yawRad.length=${n}: must be at least 2`);
  if (curve.yawRad[0] !== 0) throw new RangeError(`curve.yawRad[0]=${curve.yawRad[0]}: must be 0`);
  if (!(Math.abs(curve.yawRad[n - 1]! - Math.PI / 2) <= 1e-9)) {
    throw new RangeError(`curve.yawRad[${n - 1}]=${curve.yawRad[n - 1]}: must be pi/2`);
  }
  for (let i = 1; i < n; i++) {
    if (!(curve.yawRad[i]! > curve.yawRad[i - 1]!)) {
      throw new RangeError(`curve.yawRad[${i}]=${curve.yawRad[i]}: must be greater than the previous value`);
    }
  }
  for (const key of ['axialN', 'sideN', 'rollMomentNm', 'steeringMomentNm', 'axleTorqueNm'] as const) {
    const v = curve[key];
    if (v.length !== n)
      throw new RangeError(`curve.${key}.length=${v.length}: must equal curve.yawRad.length=${n}`);
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(v[i]!)) throw new RangeError(`curve.${key}[${i}]=${v[i]}: must be finite`);
    }
  }
  if (!(curve.referenceAirspeedMps > 0) || !Number.isFinite(curve.referenceAirspeedMps)) {
    throw new RangeError(`curve.referenceAirspeedMps=${curve.referenceAirspeedMps}: must be finite and > 0`);
  }
  if (!(curve.outerRadiusM > 0) || !Number.isFinite(curve.outerRadiusM)) {
    throw new RangeError(`curve.outerRadiusM=${curve.outerRadiusM}: must be finite and > 0`);
  }
  return curve;
}
