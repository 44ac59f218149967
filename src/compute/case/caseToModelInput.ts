/** A normalised case in the model's SI input: wheel geometry, options, steering axis and flow points. */
import { airDensity, standardAtmosphere, sutherlandViscosity } from '../../model/air/index';
import { DEFAULT_MODEL_OPTIONS } from '../../model/wheel/defaults';
import type { FlowConditions, ModelOptions, SteeringGeometry, WheelGeometry } from '../../model/wheel/types';
import { celsiusToKelvin, degToRad } from '../units';
import type { CaseFile } from './caseTypes';

export interface ModelInput {
  wheel: WheelGeometry;
  options: ModelOptions;
  steering: SteeringGeometry;
  points: FlowConditions[];
}

/** Air density of a (normalised) case (kg/m^3). */
export function caseAirDensity(caseFile: CaseFile): number {
  const c = caseFile.conditions;
  if (c.air_density_kgpm3 !== undefined) return c.air_density_kgpm3;
  const temperatureK = celsiusToKelvin(c.temperature_c);
  const pressurePa =
    c.altitude_m !== undefined ? standardAtmosphere(c.altitude_m).pressurePa : (c.pressure_pa ?? 101325);
  return airDensity({ temperatureK, pressurePa, relativeHumidity: c.relative_humidity ?? 0 });
}

/** Model input of a normalised case: SI units, one point per (airspeed, yaw), yaw varying fastest. */
export function caseToModelInput(caseFile: CaseFile): ModelInput {
  const w = caseFile.wheel;
  const explicit = w.cover.placement === 'explicit';
  const wheel: WheelGeometry = {
    outerRadiusM: w.outer_radius_m,
    tyreWidthM: w.tyre_width_m,
    rimDepthM: w.rim_depth_m,
    rimWidthM: w.rim_width_m,
    hubFlangeRadiusM: w.hub_flange_radius_m,
    hubShellDiameterM: w.hub_shell_diameter_m,
    hubShellWidthM: w.hub_shell_width_m,
    spokeCount: w.spokes.count,
    spokeSection: w.spokes.section,
    spokeDiameterM: w.spokes.diameter_m,
    spokeWidthM: w.spokes.width_m,
    spokeThicknessM: w.spokes.thickness_m,
    coverFraction: w.cover.fraction,
    coverPlacement: w.cover.placement,
    coverInnerRadiusM: explicit ? (w.cover.inner_radius_m ?? 0) : 0,
    coverOuterRadiusM: explicit ? (w.cover.outer_radius_m ?? 0) : 0,
    coverSides: w.cover.sides,
  };
  const m = caseFile.model;
  const options: ModelOptions = {
    ...DEFAULT_MODEL_OPTIONS,
    ground: m.ground,
    latticeSpanCount: m.lattice_span,
    latticeChordCount: m.lattice_chord,
    suctionRecovered: m.suction_recovered,
    porosityScale: m.porosity_scale,
    profileDragFactor: m.profile_drag_factor,
    oneSidedCoverSpokeShare: m.one_sided_cover_spoke_share,
    gridConvergence: m.grid_convergence,
    ...(m.fixed_lattice === true ? { fixedLattice: true } : {}),
  };
  const steering: SteeringGeometry = {
    headAngleRad: degToRad(caseFile.steering.head_angle_deg),
    forkOffsetM: caseFile.steering.fork_offset_m,
  };
  const c = caseFile.conditions;
  const rhoKgPerM3 = caseAirDensity(caseFile);
  const muPaS = sutherlandViscosity(celsiusToKelvin(c.temperature_c));
  const points: FlowConditions[] = [];
  for (const airspeedMps of c.airspeed_mps) {
    for (const yawDeg of c.yaw_deg) {
      points.push({
        airspeedMps,
        yawRad: degToRad(yawDeg),
        groundSpeedMps: c.ground_speed_mps ?? airspeedMps,
        rhoKgPerM3,
        muPaS,
      });
    }
  }
  return { wheel, options, steering, points };
}
