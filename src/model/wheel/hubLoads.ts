import { finiteCylinderDrag } from '../sections';
import { clearLoads } from './componentLoads';
import type { ComponentLoads, FlowConditions, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** True when covers on both faces reach the hub flanges, enclosing the hub shell. */
export function hubEnclosed(wheel: WheelGeometry, radii: WheelRadii): boolean {
  const tol = 1e-9 * radii.outerRadiusM;
  return (
    wheel.coverSides === 2 &&
    radii.coverOuterRadiusM - radii.coverInnerRadiusM > tol &&
    radii.coverInnerRadiusM <= radii.hubRadiusM + tol
  );
}

/**
 * Drag of the hub shell: a short circular cylinder, its axis across the wheel (along y), in the
 * in-plane airflow V cos(beta): D = 0.5 rho (V cos beta)^2 Cd(L/D) d L, with the drag of a finite
 * cylinder with two free ends (finiteCylinderDrag: Wieselsberger's data in White, Fluid Mechanics
 * Table 7.2 / Hoerner, Fluid-Dynamic Drag ch. 3). The flow along the axle (V sin beta) meets only the
 * shell's ends and is neglected; the shell's spin adds no crossflow drag. Acts at the hub centre (no
 * moment). None when both covers reach the hub (the shell is enclosed). `profileDragFactor` scales Cd.
 */
export function hubLoads(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  options: ModelOptions,
  out: ComponentLoads,
): { reynolds: number } {
  clearLoads(out);
  const d = wheel.hubShellDiameterM;
  const length = wheel.hubShellWidthM;
  const vInPlane = point.airspeedMps * Math.cos(point.yawRad);
  const reynolds = (point.rhoKgPerM3 * Math.abs(vInPlane) * d) / point.muPaS;
  if (hubEnclosed(wheel, radii) || vInPlane === 0) return { reynolds };
  const cd = finiteCylinderDrag(length / d) * options.profileDragFactor;
  out.fxN = -0.5 * point.rhoKgPerM3 * cd * d * length * Math.abs(vInPlane) * vInPlane;
  return { reynolds };
}
