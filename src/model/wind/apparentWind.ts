/**
 * Apparent wind met by a rider: the vector sum of the air's velocity over the ground and the rider's
 * own motion (the wind triangle; e.g. Hoerner, Fluid-Dynamic Drag, ch. 13, or any vehicle-aerodynamics
 * text on yaw from crosswind). Rider frame: x forward, y to the rider's left. The wind blows FROM the
 * direction windFromRad measured from the heading (0 head wind, +pi/2 from the rider's right, pi tail
 * wind), so the air moves relative to the rider with velocity (-(v_g + w cos psi), w sin psi):
 *   airspeed V = sqrt((v_g + w cos psi)^2 + (w sin psi)^2),
 *   yaw beta = atan2(w sin psi, v_g + w cos psi)   (beta > 0 for air from the right; |beta| <= pi).
 */

export interface ApparentWind {
  /** Apparent airspeed (m/s). */
  airspeedMps: number;
  /** Apparent-wind yaw angle (rad) in (-pi, pi], > 0 for air arriving from the rider's right. */
  yawRad: number;
}

/**
 * Apparent airspeed and yaw. Writes into `out` when given (no allocation in loops) and returns it.
 * @throws RangeError when a speed is negative or not finite, or the direction is not finite.
 */
export function apparentWind(
  groundSpeedMps: number,
  windSpeedMps: number,
  windFromRad: number,
  out: ApparentWind = { airspeedMps: 0, yawRad: 0 },
): ApparentWind {
  if (!(groundSpeedMps >= 0) || !Number.isFinite(groundSpeedMps)) {
    throw new RangeError(`groundSpeedMps=${groundSpeedMps}: must be finite and >= 0`);
  }
  if (!(windSpeedMps >= 0) || !Number.isFinite(windSpeedMps)) {
    throw new RangeError(`windSpeedMps=${windSpeedMps}: must be finite and >= 0`);
  }
  if (!Number.isFinite(windFromRad)) throw new RangeError(`windFromRad=${windFromRad}: must be finite`);
  const along = groundSpeedMps + windSpeedMps * Math.cos(windFromRad);
  const across = windSpeedMps * Math.sin(windFromRad);
  out.airspeedMps = Math.hypot(along, across);
  out.yawRad = Math.atan2(across, along);
  return out;
}
