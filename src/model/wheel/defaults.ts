import { DEFAULT_CHORD_COUNT, DEFAULT_SPAN_COUNT } from '../lattice/defaults';
import type { ModelOptions, SteeringGeometry, WheelGeometry } from './types';

/**
 * Default model parameters: every scale is 1, the rules as derived (suctionRecovered scales the
 * derived attainable thrust of the tyre's edge, attainableEdgeThrust; porosityScale the screen
 * resistance from solidity; profileDragFactor the section drags). Each is calibratable to data.
 * oneSidedCoverSpokeShare = 0.5: half of the in-plane drag of spokes behind a single cover still
 * counts (common practice, no source).
 */
export const DEFAULT_MODEL_OPTIONS: Readonly<ModelOptions> = Object.freeze({
  ground: true,
  latticeSpanCount: DEFAULT_SPAN_COUNT,
  latticeChordCount: DEFAULT_CHORD_COUNT,
  suctionRecovered: 1,
  porosityScale: 1,
  profileDragFactor: 1,
  oneSidedCoverSpokeShare: 0.5,
  gridConvergence: true,
});

/** A typical road front fork: 73 deg head angle, 45 mm offset (common practice, no source). */
export const DEFAULT_STEERING: Readonly<SteeringGeometry> = Object.freeze({
  headAngleRad: (73 * Math.PI) / 180,
  forkOffsetM: 0.045,
});

/** A road hub shell: 35 mm across, 70 mm exposed between the fork or frame ends (common practice,
 * no source). */
export const DEFAULT_HUB_SHELL = Object.freeze({ diameterM: 0.035, widthM: 0.07 });

/** An invented demo wheel (700c-sized, 50 mm rim, 20 round spokes, no cover). */
export const DEMO_WHEEL: Readonly<WheelGeometry> = Object.freeze({
  outerRadiusM: 0.334,
  tyreWidthM: 0.025,
  rimDepthM: 0.05,
  rimWidthM: 0.028,
  hubFlangeRadiusM: 0.028,
  hubShellDiameterM: DEFAULT_HUB_SHELL.diameterM,
  hubShellWidthM: DEFAULT_HUB_SHELL.widthM,
  spokeCount: 20,
  spokeSection: 'round',
  spokeDiameterM: 0.002,
  spokeWidthM: 0.0022,
  spokeThicknessM: 0.001,
  coverFraction: 0,
  coverPlacement: 'rim',
  coverInnerRadiusM: 0,
  coverOuterRadiusM: 0,
  coverSides: 2,
});
