/** The case file's defaults: the model's demo wheel, ISA sea-level air and steering axis, in the file's keys. */
import { DEFAULT_MODEL_OPTIONS, DEFAULT_STEERING, DEMO_WHEEL } from '../../model/wheel/defaults';
import { radToDeg } from '../units';
import type { CaseModel, CaseSteering, CaseWheel } from './caseTypes';

/** The invented default wheel (the model's demo wheel): 700c-like, 50 mm rim, 20 round spokes, no cover. */
export const DEFAULT_WHEEL: CaseWheel = {
  outer_radius_m: DEMO_WHEEL.outerRadiusM,
  tyre_width_m: DEMO_WHEEL.tyreWidthM,
  rim_depth_m: DEMO_WHEEL.rimDepthM,
  rim_width_m: DEMO_WHEEL.rimWidthM,
  hub_flange_radius_m: DEMO_WHEEL.hubFlangeRadiusM,
  hub_shell_diameter_m: DEMO_WHEEL.hubShellDiameterM,
  hub_shell_width_m: DEMO_WHEEL.hubShellWidthM,
  spokes: {
    count: DEMO_WHEEL.spokeCount,
    section: DEMO_WHEEL.spokeSection,
    diameter_m: DEMO_WHEEL.spokeDiameterM,
    width_m: DEMO_WHEEL.spokeWidthM,
    thickness_m: DEMO_WHEEL.spokeThicknessM,
  },
  cover: {
    fraction: DEMO_WHEEL.coverFraction,
    placement: DEMO_WHEEL.coverPlacement,
    sides: DEMO_WHEEL.coverSides,
  },
};

/** Default air: ISA sea level (15 C, 101325 Pa, dry), reference speed 50 km/h. */
export const DEFAULT_AIR = { temperature_c: 15, pressure_pa: 101325, relative_humidity: 0 } as const;
export const DEFAULT_REFERENCE_SPEED_KMH = 50;
/** The model's default steering axis in the file's units (73 deg, 45 mm). */
export const DEFAULT_STEERING_DEG: CaseSteering = {
  head_angle_deg: Number(radToDeg(DEFAULT_STEERING.headAngleRad).toPrecision(12)),
  fork_offset_m: DEFAULT_STEERING.forkOffsetM,
};

/** The model's own defaults, in the case file's keys. */
export function defaultCaseModel(): CaseModel {
  const o = DEFAULT_MODEL_OPTIONS;
  return {
    ground: o.ground,
    lattice_span: o.latticeSpanCount,
    lattice_chord: o.latticeChordCount,
    suction_recovered: o.suctionRecovered,
    porosity_scale: o.porosityScale,
    profile_drag_factor: o.profileDragFactor,
    one_sided_cover_spoke_share: o.oneSidedCoverSpokeShare,
    grid_convergence: o.gridConvergence,
  };
}
