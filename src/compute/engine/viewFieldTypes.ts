import type { WheelInput, WheelRadii } from '../../model/wheel';

/** Ask for the 3D view's data of one wheel at one operating point: `input.points[0]`. */
export interface ViewFieldRequest {
  input: WheelInput;
}

/**
 * Everything the 3D view draws for one wheel at one operating point, in the model's frame (origin at
 * the hub, x forward, y to the rider's left, z up, ground z = -R; metres, newtons, SI). Polylines are
 * packed: polyline i holds points offsets[i] .. offsets[i + 1] - 1 of the xyz array (3 numbers each).
 * Every typed array's buffer is transferred across the worker boundary.
 */
export interface ViewField {
  yawRad: number;
  airspeedMps: number;
  groundSpeedMps: number;
  rhoKgPerM3: number;
  /** q = 0.5 rho V^2 at the airspeed (Pa). */
  dynamicPressurePa: number;
  /** Velocity of the air relative to the wheel, V (-cos b, sin b, 0) (m/s). */
  freestreamMps: [number, number, number];
  radii: WheelRadii;
  tyreWidthM: number;
  rimWidthM: number;
  /** True when the covered annulus has width (radii.coverInnerRadiusM < coverOuterRadiusM). */
  hasCover: boolean;
  coverSides: 1 | 2;
  spokeCount: number;
  /** Spoke size across the wheel plane (m): round diameter or bladed thickness. */
  spokeThicknessM: number;
  /** Straight radial spokes in the plane y = 0 (as the model has them): x0, z0, x1, z1 per spoke (m). */
  spokeEndsM: Float64Array;
  /** Lattice panels: 4 corners (x, z) each in the plane y = 0, 8 numbers per panel (m). */
  panelCount: number;
  panelCornersM: Float64Array;
  /** Panel openness, 0 solid .. 1 open. */
  panelOpenness: Float64Array;
  /** Panel pressure jump Delta Cp = (p_windward - p_leeward) / q at this yaw (> 0 pushes toward +y). */
  pressureJump: Float64Array;
  pressureJumpMin: number;
  pressureJumpMax: number;
  /** Symmetric colour-scale limit: the scale runs -colourLimit .. +colourLimit; values beyond saturate. */
  colourLimit: number;
  /** Trailing vortex filaments (a convected sketch, see model/flowField/convectWake). */
  wakePointsM: Float64Array;
  wakeOffsets: Uint32Array;
  /** Each filament's circulation (m^2/s), right-handed about the downstream direction. */
  wakeStrengthM2ps: Float64Array;
  /** Streamlines seeded upstream. */
  streamPointsM: Float64Array;
  streamOffsets: Uint32Array;
  /** Total loads of the model at this point (N) and the centre of pressure of the side force (m; NaN
   * when the side force is ~0). axialN > 0 resists motion (acts along -x). */
  sideN: number;
  axialN: number;
  verticalN: number;
  cpXM: number;
  cpZM: number;
  /** Where the view should attach the force arrows: (cpX, 0, cpZ), or the hub when the CP is undefined. */
  forceOriginM: [number, number, number];
  /** Centre of pressure of the lattice's (potential) loading alone (m). */
  latticeCentreXM: number;
  latticeCentreZM: number;
  steeringMomentNm: number;
  headAngleRad: number;
  forkOffsetM: number;
  /** The steering axis from the ground (z = -R) up to 1.4 R above the hub: x0, y0, z0, x1, y1, z1 (m). */
  steeringAxisM: Float64Array;
  /** Ground trail (m): the axis meets the ground this far ahead of the contact point. */
  groundTrailM: number;
  /** Validity flag codes of the point (FLAG_MESSAGES in model/wheel explains them). */
  flags: string[];
  /** Integration steps used (m) for the wake and the streamlines. */
  wakeStepM: number;
  streamStepM: number;
}
