import { flatPlateFriction, rotatingDiscTorque } from '../friction';
import { clearLoads } from './componentLoads';
import type { ComponentLoads, FlowConditions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/**
 * Skin friction on the wheel's solid faces: the rim and tyre flanks (annulus from the rim's inner edge
 * to the tyre, both sides) and the covers (their annulus, on `coverSides` faces). Two superposed parts
 * (common practice, no source):
 * - translation: each face as a flat plate in the in-plane airflow V cos(beta), mean Cf of the mixed
 *   laminar/turbulent law (Schlichting, Boundary-Layer Theory) at the Reynolds number of the face's mean
 *   chord (area / outer diameter); the drag acts along -x;
 * - rotation: the rotating-disc moment (von Karman laminar and turbulent laws, Schlichting) of the
 *   annulus spinning at omega = groundSpeed / R, giving the axle torque.
 */
export function frictionLoads(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  out: ComponentLoads,
): { reynolds: number } {
  clearLoads(out);
  const { rhoKgPerM3: rho, muPaS: mu } = point;
  const vInPlane = point.airspeedMps * Math.cos(point.yawRad);
  const q = 0.5 * rho * vInPlane * vInPlane;
  const omega = point.groundSpeedMps / radii.outerRadiusM;
  // Zeroed entry by entry, not by fill() (a builtin call per point).
  sums[0] = 0;
  sums[1] = 0;
  sums[2] = 0;
  addFace(0, radii.rimInnerRadiusM, radii.outerRadiusM, 2, rho, mu, vInPlane, q, omega);
  if (radii.coverOuterRadiusM > radii.coverInnerRadiusM) {
    addFace(
      1,
      radii.coverInnerRadiusM,
      radii.coverOuterRadiusM,
      wheel.coverSides,
      rho,
      mu,
      vInPlane,
      q,
      omega,
    );
  }
  out.fxN = -sums[0]! * Math.sign(vInPlane);
  out.axleTorqueNm = sums[1]!;
  out.myNm = -sums[1]!;
  return { reynolds: sums[2]! };
}

/** The faces' sums: drag, torque, largest Reynolds number. */
const sums = new Float64Array(3);
/** Per face (flanks 0, covers 1): the rotating-disc inputs last met (omega, inner, outer radius, rho, mu,
 * sides) and the torque they gave; the torque does not change with the yaw angle or the airspeed, so the
 * points of one ground speed share it. NaN: none yet. */
const discInputs = [new Float64Array(6).fill(Number.NaN), new Float64Array(6).fill(Number.NaN)];
const discTorque = new Float64Array(2);

/** Add one face (annulus r0..r1 on `sides` faces) into sums, in frictionLoads' order. */
function addFace(
  face: 0 | 1,
  r0: number,
  r1: number,
  sides: 1 | 2,
  rho: number,
  mu: number,
  vInPlane: number,
  q: number,
  omega: number,
): void {
  const area = Math.PI * (r1 * r1 - r0 * r0);
  const meanChord = area / (2 * r1);
  const re = (rho * Math.abs(vInPlane) * meanChord) / mu;
  if (re > sums[2]!) sums[2] = re;
  if (re > 0) sums[0] += flatPlateFriction(re) * q * area * sides;
  if (omega > 0) sums[1] += faceTorque(face, omega, r0, r1, rho, mu, sides);
}

/** rotatingDiscTorque's torque, kept per face while its inputs keep their values. */
function faceTorque(
  face: 0 | 1,
  omega: number,
  r0: number,
  r1: number,
  rho: number,
  mu: number,
  sides: 1 | 2,
) {
  const made = discInputs[face]!;
  if (
    made[0] === omega &&
    made[1] === r0 &&
    made[2] === r1 &&
    made[3] === rho &&
    made[4] === mu &&
    made[5] === sides
  ) {
    return discTorque[face]!;
  }
  const torque = rotatingDiscTorque({
    omegaRadPerS: omega,
    innerRadiusM: r0,
    outerRadiusM: r1,
    rhoKgPerM3: rho,
    muPaS: mu,
    sides,
  }).torqueNm;
  made[0] = omega;
  made[1] = r0;
  made[2] = r1;
  made[3] = rho;
  made[4] = mu;
  made[5] = sides;
  discTorque[face] = torque;
  return torque;
}
