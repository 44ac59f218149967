/**
 * The model's vocabulary: one wheel, the air and flow it meets, and what the model returns.
 *
 * Frame (see README "Axes"): origin at the hub centre; x forward (direction of travel), y to the
 * rider's left, z up; ground plane at z = -outerRadiusM. Apparent wind of airspeed V at yaw beta,
 * beta > 0 for wind from the rider's right, so the air moves relative to the wheel with velocity
 * V * (-cos beta, +sin beta, 0). The wheel rolls forward: angular velocity omega along +y
 * (the top of the wheel moves forward), omega = groundSpeed / outerRadius.
 *
 * Everything here is SI: metres, seconds, newtons, radians, kg/m^3, Pa s.
 */

export type SpokeSection = 'round' | 'bladed';
export type CoverPlacement = 'rim' | 'hub' | 'centre' | 'explicit';

export interface WheelGeometry {
  /** Outer radius of the tyre (m). */
  outerRadiusM: number;
  /** Tyre section width (m); the tyre's section height is taken equal to it. */
  tyreWidthM: number;
  /** Rim depth, radially from the tyre's bead seat inward (m). */
  rimDepthM: number;
  /** Rim width, the rim section's thickness across the wheel plane (m). */
  rimWidthM: number;
  /** Radius of the hub flanges where the spokes start (m). The region inside it is treated as solid. */
  hubFlangeRadiusM: number;
  /** Hub shell: the body between the flanges, a short cylinder across the wheel (diameter, m). */
  hubShellDiameterM: number;
  /** Hub shell length across the wheel exposed to the air (m). */
  hubShellWidthM: number;
  spokeCount: number;
  spokeSection: SpokeSection;
  /** Round spoke diameter (m); used when spokeSection is 'round'. */
  spokeDiameterM: number;
  /** Bladed spoke width, its chord in the wheel plane (m); used when spokeSection is 'bladed'. */
  spokeWidthM: number;
  /** Bladed spoke thickness across the wheel plane (m); used when spokeSection is 'bladed'. */
  spokeThicknessM: number;
  /** Covered fraction of the spoked annulus's area, 0..1 (ignored when placement is 'explicit'). */
  coverFraction: number;
  coverPlacement: CoverPlacement;
  /** Covered annulus radii (m), used when placement is 'explicit'. */
  coverInnerRadiusM: number;
  coverOuterRadiusM: number;
  /** Covers on one side (1) or both sides (2) of the wheel. */
  coverSides: 1 | 2;
}

/** Parameters of the reduced-order model itself (calibratable; defaults in defaults.ts). */
export interface ModelOptions {
  /** Mirror-image ground plane at z = -R. */
  ground: boolean;
  /** Lattice strips across the wheel (vertical, z) and panels along each strip (x). */
  latticeSpanCount: number;
  latticeChordCount: number;
  /** Scale (0..1) on the leading-edge thrust the tyre's round edge can attain (attainableEdgeThrust):
   * 1 takes the derived bound as it is; 0 lets no suction act as thrust. Suction the edge cannot carry
   * reappears as vortex (normal) force by the Polhamus analogy. */
  suctionRecovered: number;
  /** Multiplies the spoked region's screen resistance coefficient derived from solidity. */
  porosityScale: number;
  /** Multiplies the profile (section) drag of spokes and rim/tyre. */
  profileDragFactor: number;
  /** Fraction of the in-plane drag of spokes sitting behind a one-sided cover that still counts. */
  oneSidedCoverSpokeShare: number;
  /** Compute the lattice on two coarser refinements for a grid-convergence index. */
  gridConvergence: boolean;
  /** Solve on the fixed lattice (one per radius and counts, regions in the boundary condition only,
   * partialPanelOpenness) instead of the lattice that follows the region edges (default false: less
   * accurate at the default counts for open spoked wheels; see README, lattice convergence). */
  fixedLattice?: boolean;
}

/** One operating point. */
export interface FlowConditions {
  /** Apparent airspeed at the wheel (m/s). */
  airspeedMps: number;
  /** Apparent-wind yaw angle (rad), > 0 for wind from the rider's right. */
  yawRad: number;
  /** Ground speed of the wheel (m/s); sets the rotation rate omega = groundSpeed / R. */
  groundSpeedMps: number;
  rhoKgPerM3: number;
  /** Dynamic viscosity (Pa s). */
  muPaS: number;
}

/** Steering axis for a front wheel: head angle from the horizontal and fork offset (rake). */
export interface SteeringGeometry {
  headAngleRad: number;
  forkOffsetM: number;
}

/** Forces and moments of one model part, in the wheel frame. */
export interface ComponentLoads {
  /** Force along +x (forward). The trade's "drag" is -fxN. */
  fxN: number;
  fyN: number;
  fzN: number;
  /** Moments about the hub centre (N m), right-handed about +x, +y, +z. */
  mxNm: number;
  myNm: number;
  mzNm: number;
  /** Aerodynamic torque resisting the wheel's rotation (N m, > 0 resists). */
  axleTorqueNm: number;
}

/** The model's parts, in the order every output lists them (appended to, never reordered: the
 * packed worker rows, CSV columns and result documents follow this list). */
export const COMPONENT_NAMES = ['surface', 'vortex', 'spokes', 'rim_tyre', 'friction', 'hub'] as const;
export type ComponentName = (typeof COMPONENT_NAMES)[number];

/** Grid-convergence estimate of one output (Celik et al. 2008 procedure). */
export interface ConvergenceEstimate {
  /** Output on the finest lattice (the reported value's lattice part). */
  fine: number;
  /** Richardson-extrapolated value. */
  extrapolated: number;
  /** Observed order of convergence (NaN when the three values do not converge monotonically). */
  observedOrder: number;
  /** Fine-grid convergence index, relative (fraction), with safety factor 1.25. */
  gciRelative: number;
}

/** Everything the model reports at one operating point. Forces in N, moments in N m. */
export interface PointResult {
  yawRad: number;
  airspeedMps: number;
  groundSpeedMps: number;
  rhoKgPerM3: number;
  /** Axial force: the component along -x, i.e. resisting motion (the trade's "drag"). */
  axialN: number;
  sideN: number;
  verticalN: number;
  /** Wind-axis drag (along the apparent wind) and lift (horizontal, perpendicular to it). */
  windDragN: number;
  windLiftN: number;
  /** Centre of pressure of the side force (m, x ahead of the hub, z above it); NaN when side force is ~0. */
  cpXM: number;
  cpZM: number;
  /** Moment about the vertical axis through the hub (+z, right-handed). */
  yawMomentNm: number;
  /** Moment about the x axis through the ground contact point (+x, right-handed). */
  rollMomentNm: number;
  /** Moment about the steering axis (positive turns the wheel to the left, i.e. about +z tilted back). */
  steeringMomentNm: number;
  /** Torque resisting rotation (> 0 resists). */
  axleTorqueNm: number;
  /** Aerodynamic power: axial force x ground speed + axle torque x omega (W). */
  powerW: number;
  /** Axial drag area axialN / q (m^2), q = 0.5 rho V^2 at the airspeed. */
  cdaAxialM2: number;
  components: Record<ComponentName, ComponentLoads>;
  /** Absolute grid-convergence uncertainty of the lattice's share of the outputs (N); NaN if not computed. */
  uncertaintyAxialN: number;
  uncertaintySideN: number;
  /** Validity flags raised at this point (empty when inside the model's stated range). */
  flags: string[];
}

export interface SurfaceSummary {
  /** Side-force slope of the lifting surface per radian at small yaw, on the disc area pi R^2. */
  sideSlopePerRad: number;
  inducedDragFactor: number;
  porousDragSlope: number;
  panels: number;
  /** Centre of pressure of the lattice load (m). */
  centreXM: number;
  centreZM: number;
  convergence: ConvergenceEstimate | null;
}

export interface WheelSolution {
  surface: SurfaceSummary;
  points: PointResult[];
}
