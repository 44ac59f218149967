import { CYLINDER_RE_RANGE } from '../sections';
import { addForceAt, emptyLoads } from './componentLoads';
import { frictionLoads } from './frictionLoads';
import { rimTyreLoads } from './rimTyreLoads';
import { spokeLoads } from './spokeLoads';
import { steeringMoment } from './steeringAxis';
import type { SurfaceCoefficients } from './surfaceCoefficients';
import type {
  ComponentLoads,
  ComponentName,
  FlowConditions,
  ModelOptions,
  PointResult,
  SteeringGeometry,
  WheelGeometry,
} from './types';
import { VALIDITY } from './validity';
import type { WheelRadii } from './wheelRadii';

const COMPONENTS: ComponentName[] = ['surface', 'vortex', 'spokes', 'rim_tyre', 'friction'];

/**
 * Lifting-surface loads at one yaw angle, from the lattice's coefficients by Polhamus' formulation
 * (E. C. Polhamus 1966, NASA TN D-3767):
 *   potential normal force  C_N,p = Kp sin(beta) cos(beta),
 *   potential suction       C_S   = (Kp - Kp^2 Ki - Kd) sin^2(beta)  (Kd: porous dissipation),
 * of which the fraction k = suctionRecovered acts as forward thrust at the leading edge (the rounded
 * tyre) and the rest reappears as vortex normal force (the leading-edge suction analogy), both with
 * the sign of beta for the normal part. Loads act at the lattice's centre of pressure.
 */
function surfaceLoads(
  coeff: SurfaceCoefficients,
  point: FlowConditions,
  options: ModelOptions,
  areaM2: number,
  potential: ComponentLoads,
  vortex: ComponentLoads,
): boolean {
  const q = 0.5 * point.rhoKgPerM3 * point.airspeedMps * point.airspeedMps;
  const s = Math.sin(point.yawRad);
  const c = Math.cos(point.yawRad);
  const negative = coeff.suctionSlope < 0;
  const suction = Math.max(0, coeff.suctionSlope) * s * s;
  const k = options.suctionRecovered;
  const normalP = coeff.normalSlope * s * c * q * areaM2;
  const thrust = k * suction * q * areaM2;
  const normalV = (1 - k) * suction * Math.sign(s) * q * areaM2;
  addForceAt(potential, thrust, normalP, 0, coeff.centreXM, 0, coeff.centreZM);
  addForceAt(vortex, 0, normalV, 0, coeff.centreXM, 0, coeff.centreZM);
  return negative;
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
  const components = {} as Record<ComponentName, ComponentLoads>;
  for (const name of COMPONENTS) components[name] = emptyLoads();
  const flags: string[] = [];
  if (surfaceLoads(coeff, point, options, area, components.surface, components.vortex))
    flags.push('suction_negative');
  const spokeReport = spokeLoads(wheel, radii, point, options, components.spokes);
  rimTyreLoads(wheel, radii, point, options, components.rim_tyre);
  frictionLoads(wheel, radii, point, components.friction);

  let fx = 0;
  let fy = 0;
  let fz = 0;
  let mx = 0;
  let mz = 0;
  let torque = 0;
  for (const name of COMPONENTS) {
    const l = components[name];
    fx += l.fxN;
    fy += l.fyN;
    fz += l.fzN;
    mx += l.mxNm;
    mz += l.mzNm;
    torque += l.axleTorqueNm;
  }
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
  const conv = [coeff.normalSlopeConvergence, coeff.suctionSlopeConvergence];
  if (conv.some((e) => e && (!Number.isFinite(e.gciRelative) || e.gciRelative > VALIDITY.maxGciRelative))) {
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
