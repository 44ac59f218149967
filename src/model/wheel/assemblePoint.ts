import { CYLINDER_RE_RANGE, plateReattachment } from '../sections';
import { attainableEdgeThrustAt, roundEdgeSuctionLimit } from './attainableEdgeThrust';
import { addForceAt, emptyLoads } from './componentLoads';
import { frictionLoads } from './frictionLoads';
import { hubLoads } from './hubLoads';
import { RIM_SECTION_RE_RANGE, rimTyreLoads, rimTyreSection } from './rimTyreLoads';
import { spokeLoads } from './spokeLoads';
import { steeringMoment } from './steeringAxis';
import type { SurfaceCoefficients } from './surfaceCoefficients';
import type {
  ComponentLoads,
  ComponentName,
  ConvergenceEstimate,
  FlowConditions,
  ModelOptions,
  PointResult,
  SteeringGeometry,
  WheelGeometry,
} from './types';
import { VALIDITY } from './validity';
import type { WheelRadii } from './wheelRadii';

/**
 * Lifting-surface loads at one yaw angle, from the lattice's coefficients by Polhamus' formulation
 * (E. C. Polhamus 1966, NASA TN D-3767; 1971, J. Aircraft 8(4):193):
 *   potential normal force  C_N,p = Kp sin(beta) cos(beta), at the lattice's centre of pressure;
 *   potential suction       C_S   = (Kp - Kp^2 Ki - Kd) sin^2(beta)  (Kd: porous dissipation),
 * split among the edges where it sits (edgeSuctionShares):
 * - at the tyre's edge (each lattice strip's leading edge) only the share of the section whose flow
 *   reattaches behind the tyre carries suction at all (plateReattachment of the solid length behind
 *   the tyre: a shallow rim is a bluff section whose shear layers roll up past its end, like a
 *   cylinder with a short splitter plate, and carries none; a deep rim or a cover carries all). Of that,
 *   the thrust the round edge can attain, bounded strip by strip by attainableEdgeThrust and scaled by
 *   `suctionRecovered`, acts forward; the rest, suction the edge cannot hold, separates at the nose and
 *   reattaches on the plate behind it, the premise of the leading-edge suction analogy, and reappears
 *   as vortex normal force at the edge with the sign of beta (Polhamus 1971). The bluff share makes
 *   neither: without reattachment there is no vortex force of the analogy (its load is the ring's
 *   crossflow drag, rimTyreLoads);
 * - at inner edges (a solid rim bed or cover edge behind the porous spoked region) the lattice's
 *   suction is an artefact of the linear porous condition next to the edge: a porous edge carries no
 *   suction singularity (Hajian & Jaworski 2017, Proc. R. Soc. A 473:20170266), so it makes neither
 *   thrust nor vortex force there.
 */
function surfaceLoads(
  coeff: SurfaceCoefficients,
  point: FlowConditions,
  options: ModelOptions,
  areaM2: number,
  edgeRadiusM: number,
  discRadiusM: number,
  attachedFraction: number,
  potential: ComponentLoads,
  vortex: ComponentLoads,
): boolean {
  const q = 0.5 * point.rhoKgPerM3 * point.airspeedMps * point.airspeedMps;
  const s = Math.sin(point.yawRad);
  const c = Math.cos(point.yawRad);
  const negative = coeff.suctionSlope < 0;
  const suction = Math.max(0, coeff.suctionSlope) * s * s * q * areaM2;
  const normalP = coeff.normalSlope * s * c * q * areaM2;
  addForceAt(potential, 0, normalP, 0, coeff.centreXM, 0, coeff.centreZM);
  if (suction === 0) return negative;
  const reynolds = (point.rhoKgPerM3 * point.airspeedMps * 2 * edgeRadiusM) / point.muPaS;
  const limit = roundEdgeSuctionLimit(reynolds) * options.suctionRecovered;
  const sign = Math.sign(s);
  const zEdges = coeff.stripEdgeZM;
  for (let strip = 0; strip < coeff.tyreEdgeShare.length; strip++) {
    const theory = coeff.tyreEdgeShare[strip]! * suction * attachedFraction;
    if (theory === 0) continue;
    const bound = attainableEdgeThrustAt(
      q,
      c,
      s,
      edgeRadiusM,
      discRadiusM,
      zEdges[strip]!,
      zEdges[strip + 1]!,
      limit,
    );
    const thrust = Math.min(theory, bound);
    const x = coeff.edgeXM[strip]!;
    const z = coeff.edgeZM[strip]!;
    addForceAt(potential, thrust, 0, 0, x, 0, z);
    addForceAt(vortex, 0, (theory - thrust) * sign, 0, x, 0, z);
  }
  return negative;
}

/** The components' sums: x, y and z force, x and z moment, axle torque. */
const totals = new Float64Array(6);

function addTotals(l: ComponentLoads): void {
  totals[0] += l.fxN;
  totals[1] += l.fyN;
  totals[2] += l.fzN;
  totals[3] += l.mxNm;
  totals[4] += l.mzNm;
  totals[5] += l.axleTorqueNm;
}

/** A convergence estimate beyond the trusted lattice uncertainty (none given: not flagged). */
function notConverged(e: ConvergenceEstimate | null | undefined): boolean {
  return !!e && (!Number.isFinite(e.gciRelative) || e.gciRelative > VALIDITY.maxGciRelative);
}

/**
 * Assemble every output at one operating point in the axes of the README: components summed,
 * axial (along -x) and wind-axis forces, centre of pressure, moments about the hub, the ground contact
 * and the steering axis, axle torque and power.
 */
export function assemblePoint(
  wheel: WheelGeometry,
  radii: WheelRadii,
  coeff: SurfaceCoefficients,
  point: FlowConditions,
  options: ModelOptions,
  steering: SteeringGeometry,
): PointResult {
  const R = radii.outerRadiusM;
  const area = Math.PI * R * R;
  // One literal in COMPONENT_NAMES' order: every result's components share one shape.
  const components: Record<ComponentName, ComponentLoads> = {
    surface: emptyLoads(),
    vortex: emptyLoads(),
    spokes: emptyLoads(),
    rim_tyre: emptyLoads(),
    friction: emptyLoads(),
    hub: emptyLoads(),
  };
  const flags: string[] = [];
  const tyreRadius = 0.5 * wheel.tyreWidthM;
  const section = rimTyreSection(wheel, radii);
  const attached = plateReattachment(section.plateLengthM / section.thicknessM);
  if (
    surfaceLoads(coeff, point, options, area, tyreRadius, R, attached, components.surface, components.vortex)
  )
    flags.push('suction_negative');
  const spokeReport = spokeLoads(wheel, radii, point, options, components.spokes);
  const rim = rimTyreLoads(wheel, radii, point, options, components.rim_tyre);
  frictionLoads(wheel, radii, point, components.friction);
  hubLoads(wheel, radii, point, options, components.hub);

  // Summed in COMPONENT_NAMES' order.
  // Zeroed entry by entry, not by fill() (a builtin call per point).
  for (let i = 0; i < 6; i++) totals[i] = 0;
  addTotals(components.surface);
  addTotals(components.vortex);
  addTotals(components.spokes);
  addTotals(components.rim_tyre);
  addTotals(components.friction);
  addTotals(components.hub);
  const fx = totals[0]!;
  const fy = totals[1]!;
  const fz = totals[2]!;
  const mx = totals[3]!;
  const mz = totals[4]!;
  const torque = totals[5]!;
  const beta = point.yawRad;
  const cb = Math.cos(beta);
  const sb = Math.sin(beta);
  const q = 0.5 * point.rhoKgPerM3 * point.airspeedMps * point.airspeedMps;
  // Air moves along u = (-cos b, sin b, 0); lift is horizontal and perpendicular: l = (sin b, cos b, 0).
  const windDrag = -fx * cb + fy * sb;
  const windLift = fx * sb + fy * cb;
  // Centre of pressure of the side force from the total moment about the hub: M_z = x F_y, M_x = -z F_y.
  const sideTiny = Math.abs(fy) <= 1e-9 * Math.max(q * area, 1e-30);
  const cpX = sideTiny ? Number.NaN : mz / fy;
  const cpZ = sideTiny ? Number.NaN : -mx / fy;
  // Roll moment about the x axis through the contact point (0, 0, -R): M_x - (P x F)_x, P x F = (R F_y, -R F_x, 0).
  const rollMoment = mx - R * fy;
  const steeringMomentNm = steeringMoment(steering, mx, mz, fy);
  const omega = point.groundSpeedMps / R;
  const axial = -fx;

  if (Math.abs(beta) > VALIDITY.maxYawRad) flags.push('yaw_beyond_range');
  if (point.airspeedMps < VALIDITY.minAirspeedMps || point.airspeedMps > VALIDITY.maxAirspeedMps) {
    flags.push('airspeed_beyond_range');
  }
  const ratio = point.groundSpeedMps / point.airspeedMps;
  if (!(ratio >= 0 && ratio <= VALIDITY.maxRotationRatio)) flags.push('rotation_ratio_beyond_range');
  if (
    wheel.spokeSection === 'round' &&
    (spokeReport.reynoldsMin < CYLINDER_RE_RANGE.min || spokeReport.reynoldsMax > CYLINDER_RE_RANGE.max)
  ) {
    flags.push('spoke_reynolds_beyond_range');
  }
  if (
    rim.reynolds > 0 &&
    (rim.reynolds < RIM_SECTION_RE_RANGE.min || rim.reynolds > RIM_SECTION_RE_RANGE.max)
  ) {
    flags.push('rim_reynolds_beyond_range');
  }
  if (notConverged(coeff.normalSlopeConvergence) || notConverged(coeff.suctionSlopeConvergence)) {
    flags.push('lattice_not_converged');
  }
  const gciN = coeff.normalSlopeConvergence?.gciRelative ?? Number.NaN;
  const gciS = coeff.suctionSlopeConvergence?.gciRelative ?? Number.NaN;
  return {
    yawRad: beta,
    airspeedMps: point.airspeedMps,
    groundSpeedMps: point.groundSpeedMps,
    rhoKgPerM3: point.rhoKgPerM3,
    axialN: axial,
    sideN: fy,
    verticalN: fz,
    windDragN: windDrag,
    windLiftN: windLift,
    cpXM: cpX,
    cpZM: cpZ,
    yawMomentNm: mz,
    rollMomentNm: rollMoment,
    steeringMomentNm,
    axleTorqueNm: torque,
    powerW: axial * point.groundSpeedMps + torque * omega,
    cdaAxialM2: axial / q,
    components,
    uncertaintyAxialN: Math.abs(components.surface.fxN) * gciS,
    uncertaintySideN: Math.abs(components.surface.fyN) * gciN + Math.abs(components.vortex.fyN) * gciS,
    flags,
  };
}
