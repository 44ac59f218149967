import { clearLoads } from './componentLoads';
import { SPOKE_ANGLE_STEPS } from './spokeAnnulusLoads';
import { spokeElementSwirl } from './spokeElementSwirl';
import { spokeElementTable } from './spokeElementTable';
import { emptySpokeRow, setSpokeRow } from './spokeRowOf';
import type { ComponentLoads, FlowConditions, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** Sums of one call: x force, z force, torque, smallest and largest Reynolds number. */
const sums = new Float64Array(5);
/** spokeElementSwirl's answer: extra swirl, mean swirl, plane swirl, the element's loads at unit length. */
const element = new Float64Array(8);
/** The spoke row of the current point (filled in place). */
const spokes = emptySpokeRow();

export interface SpokeLoadsReport {
  /** Smallest and largest section Reynolds number met (for validity flags). */
  reynoldsMin: number;
  reynoldsMax: number;
}

/**
 * In-plane aerodynamic loads of the spokes, time-averaged over a revolution: the crossflow drag of
 * each spoke element (independence principle, Hoerner, Fluid-Dynamic Drag ch. 3) at its local relative
 * velocity, integrated along the spoke (Gauss-Legendre) and around the revolution. Spokes are straight,
 * radial and in the wheel plane (dish and lacing angle neglected).
 *
 * For an element at radius r and position angle theta (from +x toward +z) the air's velocity across
 * the spoke in the plane is u_t = V cos(beta) sin(theta) + omega r, and along y is V sin(beta). The
 * spokes at one radius cross the same air one after another at the spacing s = 2 pi r / N, so each
 * element meets the air in the wake of the spoke ahead: spokeRowDrag (Schlichting's plane far wake,
 * the Reynolds number solved to consistency). That one law is also the momentum balance of the thin
 * spoke cage: the spokes' momentum deficit, which slows both the freestream's crossing and the
 * rotation (the swirl the torque puts into the air), is the merged wake of the row, whose centreline
 * deficit equals the spoke-ahead value (see spokeRowDrag). The through-flow V sin(beta) carries the
 * wake off the wheel plane, so at yaw the spokes leave each other's wakes.
 *
 * The swirl of the whole cage: at each radius the annulus torque must leave with the air flushed through
 * the disc (Glauert's annulus balance, the airspeed plus the merged wake's own spreading as through-flow:
 * spokeElementSwirl). The swirl at the spoke plane is at least that mean; where the merged wake's swirl
 * is smaller (its wakes carried off at yaw), the spokes meet the rotation slowed by the extra swirl,
 * omega r (1 - x), solved to consistency with their drag.
 *
 * The section force 0.5 rho Cd L |u| u (shielded) is kept in-plane only: its y part is the through-flow
 * load that the porous lattice already carries (no double counting). Covered spokes make none (two
 * covers) or `oneSidedCoverSpokeShare` of their load (one cover).
 *
 * Returns x and z forces and the axle torque resisting rotation into `out` (moments about the hub of
 * radial in-plane forces are torque only).
 */
export function spokeLoads(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  options: ModelOptions,
  out: ComponentLoads,
): SpokeLoadsReport {
  clearLoads(out);
  const report = { reynoldsMin: Number.POSITIVE_INFINITY, reynoldsMax: 0 };
  if (wheel.spokeCount === 0) return { reynoldsMin: Number.NaN, reynoldsMax: Number.NaN };
  setSpokeRow(wheel, point, spokes);
  const omega = point.groundSpeedMps / radii.outerRadiusM;
  const elements = spokeElementTable(wheel, radii, options);
  const perSpoke = (wheel.spokeCount / SPOKE_ANGLE_STEPS) * options.profileDragFactor;
  // Zeroed entry by entry, not by fill() (a builtin call per point).
  for (let i = 0; i < 5; i++) sums[i] = 0;
  sums[3] = Number.POSITIVE_INFINITY;
  for (let e = 0; e < elements.count; e++) {
    const weight = elements.weightM[e]!;
    // The element's loads with the swirl of the whole cage (spokeElementSwirl): where it exceeds the
    // merged wake's, the spokes meet the rotation slowed by the extra swirl fraction.
    spokeElementSwirl(
      spokes,
      elements.radiusM[e]!,
      omega,
      point.airspeedMps,
      perSpoke * elements.share[e]!,
      element,
    );
    sums[0] += element[3]! * weight;
    sums[1] += element[4]! * weight;
    sums[2] += element[5]! * weight;
    if (element[6]! < sums[3]!) sums[3] = element[6]!;
    if (element[7]! > sums[4]!) sums[4] = element[7]!;
  }
  const fx = sums[0]!;
  const fz = sums[1]!;
  const torque = sums[2]!;
  report.reynoldsMin = sums[3]!;
  report.reynoldsMax = sums[4]!;
  const scale = perSpoke;
  out.fxN = fx * scale;
  out.fzN = fz * scale;
  out.axleTorqueNm = torque * scale;
  out.myNm = -out.axleTorqueNm;
  return report;
}
