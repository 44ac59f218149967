import { spokeRowDrag } from '../sections';
import { clearLoads } from './componentLoads';
import type { ComponentLoads, FlowConditions, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** Revolution positions averaged (midpoint rule, spectrally accurate for a periodic integrand). */
const ANGLE_STEPS = 36;
/** Gauss-Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun, Table 25.4, n = 6). */
const GL_X = [
  -0.932469514203152, -0.661209386466265, -0.238619186083197, 0.238619186083197, 0.661209386466265,
  0.932469514203152,
];
const GL_W = [
  0.17132449237917, 0.360761573048139, 0.467913934572691, 0.467913934572691, 0.360761573048139,
  0.17132449237917,
];

const sinTheta = new Float64Array(ANGLE_STEPS);
const cosTheta = new Float64Array(ANGLE_STEPS);
/** Scratch for spokeRowDrag: drag coefficient, wake drag ratio, Reynolds number. */
const row = new Float64Array(3);
for (let k = 0; k < ANGLE_STEPS; k++) {
  const theta = ((k + 0.5) * 2 * Math.PI) / ANGLE_STEPS;
  sinTheta[k] = Math.sin(theta);
  cosTheta[k] = Math.cos(theta);
}

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
  const round = wheel.spokeSection !== 'bladed';
  const refLength = round ? wheel.spokeDiameterM : wheel.spokeThicknessM;
  const thicknessRatio = round ? 1 : wheel.spokeThicknessM / wheel.spokeWidthM;
  const { rhoKgPerM3: rho, muPaS: mu } = point;
  const nu = mu / rho;
  const vInPlane = point.airspeedMps * Math.cos(point.yawRad);
  const vNormal = point.airspeedMps * Math.sin(point.yawRad);
  const omega = point.groundSpeedMps / radii.outerRadiusM;
  const coverShare = wheel.coverSides === 2 ? 0 : options.oneSidedCoverSpokeShare;
  const spacingPerRadius = (2 * Math.PI) / wheel.spokeCount;

  // Spoke pieces: inside, over and outside the covered annulus.
  const edges = [radii.hubRadiusM, radii.coverInnerRadiusM, radii.coverOuterRadiusM, radii.rimInnerRadiusM];
  let fx = 0;
  let fz = 0;
  let torque = 0;
  for (let piece = 0; piece < 3; piece++) {
    const r0 = edges[piece]!;
    const r1 = edges[piece + 1]!;
    const weight = piece === 1 ? coverShare : 1;
    if (!(r1 > r0) || weight === 0) continue;
    const half = 0.5 * (r1 - r0);
    const mid = 0.5 * (r1 + r0);
    for (let g = 0; g < GL_X.length; g++) {
      const r = mid + half * GL_X[g]!;
      const dr = half * GL_W[g]! * weight;
      const spin = omega * r;
      const spacing = spacingPerRadius * r;
      for (let k = 0; k < ANGLE_STEPS; k++) {
        const ut = vInPlane * sinTheta[k]! + spin;
        const speed = Math.sqrt(ut * ut + vNormal * vNormal);
        if (speed === 0) continue;
        spokeRowDrag(round, thicknessRatio, refLength, spacing, ut, vNormal, nu, row);
        const re = row[2]!;
        // A spoke wholly stalled in the wake ahead (drag ratio 0) carries no load and uses no section law.
        if (row[1]! > 0 && re < report.reynoldsMin) report.reynoldsMin = re;
        if (re > report.reynoldsMax) report.reynoldsMax = re;
        const ft = 0.5 * rho * row[0]! * row[1]! * refLength * speed * ut * dr;
        fx -= sinTheta[k]! * ft;
        fz += cosTheta[k]! * ft;
        torque += r * ft;
      }
    }
  }
  const scale = (wheel.spokeCount / ANGLE_STEPS) * options.profileDragFactor;
  out.fxN = fx * scale;
  out.fzN = fz * scale;
  out.axleTorqueNm = torque * scale;
  out.myNm = -out.axleTorqueNm;
  return report;
}
