import { planeWakeDeficit, splitterPlateCylinderDrag } from '../sections';
import { clearLoads } from './componentLoads';
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

/** Most yaw angles whose rear-arc shielding is kept for one ring (a sweep has tens). */
const SHIELDING_CACHE_LIMIT = 256;
/** The ring the kept shieldings belong to: its drag length Cd t and force radius (NaN: none yet). */
const shieldingRing = Float64Array.of(Number.NaN, Number.NaN);
/** Kept shieldings by yaw angle, for in-plane flow toward -x (flow from the front, index 0) or +x (1). */
const shieldingByYaw = [new Map<number, Float64Array>(), new Map<number, Float64Array>()];
/** Arrays handed out since the ring changed (reused for the next ring). */
const shieldingPool: Float64Array[] = [];
let shieldingUsed = 0;

/**
 * The factor (1 - deficit)^2 on each revolution position's drag coefficient: on the arc downstream (for
 * flow sign `flowSign` of V cos(beta)) the front arc's plane far wake (planeWakeDeficit) 2 x_f behind it,
 * drifted sideways by 2 x_f |tan(beta)|; 1 upstream. It depends on the ring (drag length, radius) and the
 * yaw angle only, not on the airspeed or the air: kept per ring and yaw, so a sweep's airspeeds share it.
 * The array is owned here: read it, do not keep or change it.
 */
function rearArcShielding(dragLengthM: number, rMid: number, yawRad: number, flowSign: number): Float64Array {
  if (!(dragLengthM === shieldingRing[0] && rMid === shieldingRing[1])) {
    shieldingByYaw[0]!.clear();
    shieldingByYaw[1]!.clear();
    shieldingUsed = 0;
    shieldingRing[0] = dragLengthM;
    shieldingRing[1] = rMid;
  }
  const kept = flowSign === 1 ? shieldingByYaw[0]! : flowSign === -1 ? shieldingByYaw[1]! : undefined;
  const known = kept?.get(yawRad);
  if (known) return known;
  if (kept && kept.size >= SHIELDING_CACHE_LIMIT) {
    shieldingByYaw[0]!.clear();
    shieldingByYaw[1]!.clear();
    shieldingUsed = 0;
  }
  // A flow sign other than +-1 (NaN input) is not kept: a fresh array.
  let factors = kept ? shieldingPool[shieldingUsed] : new Float64Array(ANGLE_STEPS);
  if (!factors) {
    factors = new Float64Array(ANGLE_STEPS);
    shieldingPool.push(factors);
  }
  if (kept) shieldingUsed++;
  const drift = Math.abs(Math.tan(yawRad));
  for (let k = 0; k < ANGLE_STEPS; k++) {
    const c = cosTheta[k]!;
    // The flow runs from the front arc to the rear one (for V cos(beta) > 0; mirrored otherwise).
    if (c * flowSign < 0) {
      const distance = 2 * rMid * Math.abs(c);
      const deficit = planeWakeDeficit(distance, distance * drift, dragLengthM);
      factors[k] = (1 - deficit) * (1 - deficit);
    } else {
      factors[k] = 1;
    }
  }
  kept?.set(yawRad, factors);
  return factors;
}

/** Section Reynolds numbers (on the section's thickness) where the subcritical section data hold:
 * the cylinder-with-plate data were taken at 1e4..5e4 and a round section's subcritical drag is nearly
 * independent of Re up to ~2e5 (Hoerner, Fluid-Dynamic Drag ch. 3; from memory). */
export const RIM_SECTION_RE_RANGE: Readonly<{ min: number; max: number }> = Object.freeze({
  min: 1e4,
  max: 2e5,
});

/** The rim-and-tyre ring's section, seen in the wheel's plane. */
export interface RimTyreSection {
  /** Frontal size across the wheel's plane (m): the larger of the tyre and rim widths. */
  thicknessM: number;
  /** Solid length radially inward of the tyre (m): the rim, and a cover joined to it. */
  plateLengthM: number;
  /** Radius at which the ring's forces act (m): middle of the tyre and rim. */
  forceRadiusM: number;
}

/**
 * The section of the ring: a round tyre whose solid "plate" runs inward over the rim's depth and on
 * over a cover that meets the rim, to the cover's inner edge (so a rim hidden under a full cover does
 * not change the section: the plate is the whole cover). Geometry only.
 */
export function rimTyreSection(wheel: WheelGeometry, radii: WheelRadii): RimTyreSection {
  const thickness = Math.max(wheel.tyreWidthM, wheel.rimWidthM);
  const tol = 1e-9 * radii.outerRadiusM;
  const hasCover = radii.coverOuterRadiusM - radii.coverInnerRadiusM > tol;
  const coverAtRim = hasCover && radii.coverOuterRadiusM >= radii.rimInnerRadiusM - tol;
  const innerSolid = coverAtRim ? radii.coverInnerRadiusM : radii.rimInnerRadiusM;
  return {
    thicknessM: thickness,
    plateLengthM: radii.tyreInnerRadiusM - innerSolid,
    forceRadiusM: 0.5 * (radii.outerRadiusM + radii.rimInnerRadiusM),
  };
}

/**
 * Pressure drag of the rim and tyre as a bluff ring, by the crossflow principle (independence
 * principle; Hoerner, Fluid-Dynamic Drag ch. 3) around the circumference. The element at position
 * angle theta meets the radial component of the in-plane airflow, u_r = -V cos(beta) cos(theta)
 * (rotation is tangential and adds none), and makes a force 0.5 rho Cd t |u_r| u_r along it, with
 * t the section's thickness across the wheel:
 * - front arc (cos theta > 0): the tyre leads its rim: Cd of a circular cylinder with a wake splitter
 *   plate of the section's solid length L (rim, and a cover joined to it), Apelt, West & Szewczyk 1973
 *   and Apelt & West 1975 (splitterPlateCylinderDrag, L/D with D = t);
 * - rear arc: the rim leads and the tyre trails. The same section seen from its other end; the model
 *   takes the same Cd(L/D) (a rounded rim bed, a fore-and-aft symmetric section: a stated
 *   simplification), and the element sits in the wake of the front arc at the same height, 2 x_f
 *   downstream: its dynamic pressure is cut by (1 - deficit)^2 from Schlichting's plane far-wake law
 *   (planeWakeDeficit, drag length Cd t of the front arc) at the wake's sideways drift 2 x_f tan(beta)
 *   at yaw, so the rear arc leaves the wake as the yaw grows.
 * Skin friction of the flanks is not counted here (frictionLoads counts it once). The through-plane
 * (side) load on the ring is the lattice's. Forces act at the section's mid radius; by symmetry the
 * vertical parts cancel. `options.profileDragFactor` scales Cd.
 */
export function rimTyreLoads(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  options: ModelOptions,
  out: ComponentLoads,
): { reynolds: number } {
  clearLoads(out);
  const section = rimTyreSection(wheel, radii);
  const t = section.thicknessM;
  const { rhoKgPerM3: rho, muPaS: mu } = point;
  const vInPlane = point.airspeedMps * Math.cos(point.yawRad);
  const reynolds = (rho * Math.abs(vInPlane) * t) / mu;
  if (reynolds === 0) return { reynolds };
  const cdSection = splitterPlateCylinderDrag(section.plateLengthM / t) * options.profileDragFactor;
  const dragLength = cdSection * t;
  const rMid = section.forceRadiusM;
  const arc = (rMid * 2 * Math.PI) / ANGLE_STEPS;
  const shielding = rearArcShielding(dragLength, rMid, point.yawRad, Math.sign(vInPlane));
  // The sums of addForceAt (force at (rMid cos, 0, rMid sin)), in the same order, kept in locals. The
  // zero terms stay: they keep addForceAt's signed zeros and NaN propagation, so the bits are the same.
  let fx = 0;
  let fy = 0;
  let fz = 0;
  let mx = 0;
  let my = 0;
  let mz = 0;
  for (let k = 0; k < ANGLE_STEPS; k++) {
    const c = cosTheta[k]!;
    const ur = -vInPlane * c;
    // The rear arc's elements stand in the front arc's wake (1 on the front arc: cd unchanged).
    const cd = cdSection * shielding[k]!;
    const f = 0.5 * rho * cd * t * Math.abs(ur) * ur * arc;
    const forceX = f * c;
    const forceZ = f * sinTheta[k]!;
    const x = rMid * c;
    const z = rMid * sinTheta[k]!;
    fx += forceX;
    fy += 0;
    fz += forceZ;
    mx += 0 * forceZ - z * 0;
    my += z * forceX - x * forceZ;
    mz += x * 0 - 0 * forceX;
  }
  out.fxN = fx;
  out.fyN = fy;
  out.fzN = fz;
  out.mxNm = mx;
  out.myNm = my;
  out.mzNm = mz;
  return { reynolds };
}
