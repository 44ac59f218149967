import type { SteeringGeometry } from './types';

/**
 * Moment of a load about the steering axis (N m). The axis has direction a = (-cos h, 0, sin h)
 * (pointing up and back, h the head angle from horizontal) and passes behind the hub at the fork
 * offset d, measured perpendicular to it, through P0 = -d (sin h, 0, cos h). Given the load's moment
 * about the hub M and its resultant's side force F_y: M_axis = a . (M - P0 x F). Positive turns the wheel to the
 * rider's left (about +z tilted back). Rigid-body statics; geometry after Cossalter, Motorcycle
 * Dynamics, ch. 1 (from memory).
 */
export function steeringMoment(steering: SteeringGeometry, mxNm: number, mzNm: number, fyN: number): number {
  const h = steering.headAngleRad;
  const d = steering.forkOffsetM;
  const sinH = Math.sin(h);
  const cosH = Math.cos(h);
  const p0x = -d * sinH;
  const p0z = -d * cosH;
  // P0 x F = (-p0z Fy, p0z Fx - p0x Fz, p0x Fy) as p0y = 0; the axis has no y part, so only Fy counts.
  const mP0x = mxNm + p0z * fyN;
  const mP0z = mzNm - p0x * fyN;
  return -cosH * mP0x + sinH * mP0z;
}

/** Ground trail (m): how far the tyre's contact point lies behind the steering axis's ground point,
 * (R cos h - d) / sin h (Cossalter, Motorcycle Dynamics, ch. 1; from memory). */
export function groundTrailM(outerRadiusM: number, steering: SteeringGeometry): number {
  const h = steering.headAngleRad;
  if (!(h > 0 && h < Math.PI)) throw new RangeError(`headAngleRad must be in (0, pi), got ${h}`);
  return (outerRadiusM * Math.cos(h) - steering.forkOffsetM) / Math.sin(h);
}
