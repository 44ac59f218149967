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
  const faces: Array<[number, number, 1 | 2]> = [[radii.rimInnerRadiusM, radii.outerRadiusM, 2]];
  if (radii.coverOuterRadiusM > radii.coverInnerRadiusM) {
    faces.push([radii.coverInnerRadiusM, radii.coverOuterRadiusM, wheel.coverSides]);
  }
  let drag = 0;
  let torque = 0;
  let reynoldsMax = 0;
  for (const [r0, r1, sides] of faces) {
    const area = Math.PI * (r1 * r1 - r0 * r0);
    const meanChord = area / (2 * r1);
    const re = (rho * Math.abs(vInPlane) * meanChord) / mu;
    if (re > reynoldsMax) reynoldsMax = re;
    if (re > 0) drag += flatPlateFriction(re) * q * area * sides;
    if (omega > 0) {
      torque += rotatingDiscTorque({
        omegaRadPerS: omega,
        innerRadiusM: r0,
        outerRadiusM: r1,
        rhoKgPerM3: rho,
        muPaS: mu,
        sides,
      }).torqueNm;
    }
  }
  out.fxN = -drag * Math.sign(vInPlane);
  out.axleTorqueNm = torque;
  out.myNm = -torque;
  return { reynolds: reynoldsMax };
}
