import { turbulentFlatPlateFriction } from '../friction';
import { cylinderDrag, streamlineSectionDrag } from '../sections';
import { addForceAt } from './componentLoads';
import type { ComponentLoads, FlowConditions, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

const ANGLE_STEPS = 72;
const sinTheta = new Float64Array(ANGLE_STEPS);
const cosTheta = new Float64Array(ANGLE_STEPS);
for (let k = 0; k < ANGLE_STEPS; k++) {
  const theta = ((k + 0.5) * 2 * Math.PI) / ANGLE_STEPS;
  sinTheta[k] = Math.sin(theta);
  cosTheta[k] = Math.cos(theta);
}

/** Section of the rim and tyre, radially: chord = tyre height (= width) + rim depth. */
export function rimTyreSection(wheel: WheelGeometry): { chordM: number; thicknessM: number } {
  return {
    chordM: wheel.tyreWidthM + wheel.rimDepthM,
    thicknessM: Math.max(wheel.tyreWidthM, wheel.rimWidthM),
  };
}

/**
 * Profile drag of the rim and tyre by strip theory around the circumference. Each element's section
 * (chord radial, thickness across the wheel) meets the radial component of the in-plane airflow,
 * u_r = -V cos(beta) cos(theta) (rotation is tangential and adds none), and makes a drag
 * 0.5 rho Cd c |u_r| u_r along it. Cd is Hoerner's streamline-section formula
 * 2 Cf (1 + 2 t/c + 60 (t/c)^4) (Fluid-Dynamic Drag ch. 6) with the turbulent flat-plate Cf at the
 * chord Reynolds number (the tyre trips the boundary layer: common practice, no source), capped by the
 * circular cylinder's drag on the thickness for stubby sections. The side (y) load on the rim is the
 * lattice's. Forces act at the section's mid-radius; by symmetry the vertical parts cancel.
 */
export function rimTyreLoads(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  options: ModelOptions,
  out: ComponentLoads,
): { reynolds: number } {
  out.fxN = out.fyN = out.fzN = out.mxNm = out.myNm = out.mzNm = out.axleTorqueNm = 0;
  const { chordM, thicknessM } = rimTyreSection(wheel);
  const { rhoKgPerM3: rho, muPaS: mu } = point;
  const vInPlane = point.airspeedMps * Math.cos(point.yawRad);
  const reynolds = (rho * Math.abs(vInPlane) * chordM) / mu;
  if (reynolds === 0) return { reynolds };
  const tOverC = thicknessM / chordM;
  // A section thicker than long (a shallow rim wider than its tyre: t/c > 1) is outside Hoerner's
  // streamline formula; it is a bluff body, and takes the cylinder's drag alone.
  const cdStreamline =
    tOverC <= 1
      ? streamlineSectionDrag(tOverC, turbulentFlatPlateFriction(reynolds))
      : Number.POSITIVE_INFINITY;
  const cdBluff = cylinderDrag((rho * Math.abs(vInPlane) * thicknessM) / mu) * tOverC;
  const cd = Math.min(cdStreamline, cdBluff) * options.profileDragFactor;
  const rMid = radii.outerRadiusM - 0.5 * chordM;
  const arc = (rMid * 2 * Math.PI) / ANGLE_STEPS;
  for (let k = 0; k < ANGLE_STEPS; k++) {
    const ur = -vInPlane * cosTheta[k]!;
    const f = 0.5 * rho * cd * chordM * Math.abs(ur) * ur * arc;
    addForceAt(out, f * cosTheta[k]!, 0, f * sinTheta[k]!, rMid * cosTheta[k]!, 0, rMid * sinTheta[k]!);
  }
  return { reynolds };
}
