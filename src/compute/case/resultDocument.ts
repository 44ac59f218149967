/** The output document of `solve`: one row per point in the file's keys and units, components, notes. */
import { solveWheel } from '../../model/wheel/solveWheel';
import type { ComponentLoads, ComponentName, PointResult, WheelSolution } from '../../model/wheel/types';
import { degToRad, dragAreaToGramsForce, kmhToMps, mphToMps, radToDeg } from '../units';
import { caseToModelInput } from './caseToModelInput';
import { type CaseFile, COMPONENT_NAMES, RESULT_FORMAT, RESULT_VERSION } from './caseTypes';

export interface ComponentRow {
  axial_N: number | null;
  side_N: number | null;
  vertical_N: number | null;
  axle_torque_Nm: number | null;
}

export interface ResultRow {
  yaw_deg: number | null;
  airspeed_mps: number | null;
  ground_speed_mps: number | null;
  air_density_kgpm3: number | null;
  axial_N: number | null;
  side_N: number | null;
  vertical_N: number | null;
  wind_drag_N: number | null;
  wind_lift_N: number | null;
  cp_x_m: number | null;
  cp_z_m: number | null;
  yaw_moment_Nm: number | null;
  roll_moment_Nm: number | null;
  steering_moment_Nm: number | null;
  axle_torque_Nm: number | null;
  power_W: number | null;
  cda_axial_m2: number | null;
  cda_axial_cm2: number | null;
  axial_gf_ref: number | null;
  axial_gf_30mph: number | null;
  components: Record<ComponentName, ComponentRow>;
  uncertainty: { axial_N: number | null; side_N: number | null };
  flags: string[];
}

export interface SurfaceDocument {
  side_slope_per_rad: number | null;
  induced_drag_factor: number | null;
  porous_drag_slope: number | null;
  panels: number | null;
  centre_x_m: number | null;
  centre_z_m: number | null;
  convergence: {
    fine: number | null;
    extrapolated: number | null;
    observed_order: number | null;
    gci_relative: number | null;
  } | null;
}

export interface ResultDocument {
  format: typeof RESULT_FORMAT;
  version: typeof RESULT_VERSION;
  case: CaseFile;
  surface: SurfaceDocument;
  results: ResultRow[];
  reference_speed_mps: number;
  notes: string[];
}

/** The result columns, in the documented order (components and uncertainty listed separately). */
export const RESULT_SCALAR_KEYS = [
  'yaw_deg',
  'airspeed_mps',
  'ground_speed_mps',
  'air_density_kgpm3',
  'axial_N',
  'side_N',
  'vertical_N',
  'wind_drag_N',
  'wind_lift_N',
  'cp_x_m',
  'cp_z_m',
  'yaw_moment_Nm',
  'roll_moment_Nm',
  'steering_moment_Nm',
  'axle_torque_Nm',
  'power_W',
  'cda_axial_m2',
  'cda_axial_cm2',
  'axial_gf_ref',
  'axial_gf_30mph',
] as const satisfies readonly (keyof ResultRow)[];

export const COMPONENT_KEYS = ['axial_N', 'side_N', 'vertical_N', 'axle_torque_Nm'] as const;

export const RESULT_NOTES: readonly string[] = [
  'axial_N is the force along the direction of travel (resisting motion, positive backwards), not wind-axis drag; it can turn negative at yaw',
  "wind_drag_N is along the apparent wind and wind_lift_N across it (horizontal); side_N > 0 pushes the wheel to the rider's left (+y)",
  "yaw_deg > 0 is wind from the rider's right; frame: origin at the hub, x forward, y left, z up",
  'cp_x_m / cp_z_m: centre of pressure of the side force, ahead of / above the hub (null when the side force is about zero)',
  "axial_gf_ref: grams-force of the axial drag area cda_axial_m2 at reference_speed_mps and this point's air density (g0 = 9.80665 m/s^2); axial_gf_30mph the same at 30 mph",
  'power_W = axial_N x ground speed + axle torque x rotation rate, for one wheel',
  'uncertainty: absolute grid-convergence index (Celik et al. 2008) of the lattice share of the force, null when not computed',
  'estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on qualified testing and the competition rules before riding a design',
];

/** A finite number, or null (NaN and infinities never reach JSON). */
export function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

function componentRow(loads: ComponentLoads): ComponentRow {
  return {
    axial_N: finiteOrNull(-loads.fxN),
    side_N: finiteOrNull(loads.fyN),
    vertical_N: finiteOrNull(loads.fzN),
    axle_torque_Nm: finiteOrNull(loads.axleTorqueNm),
  };
}

function resultRow(p: PointResult, referenceSpeedMps: number, yawDeg: number): ResultRow {
  const components = {} as Record<ComponentName, ComponentRow>;
  for (const name of COMPONENT_NAMES) components[name] = componentRow(p.components[name]);
  return {
    yaw_deg: finiteOrNull(yawDeg),
    airspeed_mps: finiteOrNull(p.airspeedMps),
    ground_speed_mps: finiteOrNull(p.groundSpeedMps),
    air_density_kgpm3: finiteOrNull(p.rhoKgPerM3),
    axial_N: finiteOrNull(p.axialN),
    side_N: finiteOrNull(p.sideN),
    vertical_N: finiteOrNull(p.verticalN),
    wind_drag_N: finiteOrNull(p.windDragN),
    wind_lift_N: finiteOrNull(p.windLiftN),
    cp_x_m: finiteOrNull(p.cpXM),
    cp_z_m: finiteOrNull(p.cpZM),
    yaw_moment_Nm: finiteOrNull(p.yawMomentNm),
    roll_moment_Nm: finiteOrNull(p.rollMomentNm),
    steering_moment_Nm: finiteOrNull(p.steeringMomentNm),
    axle_torque_Nm: finiteOrNull(p.axleTorqueNm),
    power_W: finiteOrNull(p.powerW),
    cda_axial_m2: finiteOrNull(p.cdaAxialM2),
    cda_axial_cm2: finiteOrNull(p.cdaAxialM2 * 1e4),
    axial_gf_ref: finiteOrNull(dragAreaToGramsForce(p.cdaAxialM2, referenceSpeedMps, p.rhoKgPerM3)),
    axial_gf_30mph: finiteOrNull(dragAreaToGramsForce(p.cdaAxialM2, mphToMps(30), p.rhoKgPerM3)),
    components,
    uncertainty: { axial_N: finiteOrNull(p.uncertaintyAxialN), side_N: finiteOrNull(p.uncertaintySideN) },
    flags: [...p.flags],
  };
}

/**
 * Yaw of point i of `pointCount` in the file's degrees: the value as the case gave it (points are
 * airspeed-major, yaw fastest), so 7.5 deg does not come back as 7.499999999999999 after deg -> rad ->
 * deg; the model's angle converted back when the points are not the case's grid.
 */
export function pointYawDeg(caseFile: CaseFile, pointCount: number, i: number, yawRad: number): number {
  const yaws = caseFile.conditions.yaw_deg;
  const given = yaws[i % yaws.length];
  const expected = caseFile.conditions.airspeed_mps.length * yaws.length;
  if (pointCount === expected && given !== undefined && Math.abs(degToRad(given) - yawRad) <= 1e-12) {
    return given;
  }
  return radToDeg(yawRad);
}

/** The output document of `solve` for a normalised case and the model's solution. */
export function solutionToDocument(caseFile: CaseFile, solution: WheelSolution): ResultDocument {
  const referenceSpeedMps = kmhToMps(caseFile.conditions.reference_speed_kmh);
  const s = solution.surface;
  const conv = s.convergence;
  return {
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    case: caseFile,
    surface: {
      side_slope_per_rad: finiteOrNull(s.sideSlopePerRad),
      induced_drag_factor: finiteOrNull(s.inducedDragFactor),
      porous_drag_slope: finiteOrNull(s.porousDragSlope),
      panels: finiteOrNull(s.panels),
      centre_x_m: finiteOrNull(s.centreXM),
      centre_z_m: finiteOrNull(s.centreZM),
      convergence: conv
        ? {
            fine: finiteOrNull(conv.fine),
            extrapolated: finiteOrNull(conv.extrapolated),
            observed_order: finiteOrNull(conv.observedOrder),
            gci_relative: finiteOrNull(conv.gciRelative),
          }
        : null,
    },
    results: solution.points.map((p, i) =>
      resultRow(p, referenceSpeedMps, pointYawDeg(caseFile, solution.points.length, i, p.yawRad)),
    ),
    reference_speed_mps: referenceSpeedMps,
    notes: [...RESULT_NOTES],
  };
}

/** Solve one normalised case: model input, solve, output document. */
export function solveCase(caseFile: CaseFile): ResultDocument {
  return solutionToDocument(caseFile, solveWheel(caseToModelInput(caseFile)));
}
