import { DEFAULT_CHORD_COUNT, DEFAULT_SPAN_COUNT } from '../lattice/defaults';
import type { ModelOptions, SteeringGeometry, WheelGeometry } from './types';

/**
 * Default model parameters. suctionRecovered = 0.5 is an uninformed midpoint between a sharp edge
 * (0: all suction lost to vortex force) and a fully attached rounded tyre (1); calibrate it to data
 * (common practice, no source). porosityScale and profileDragFactor are 1: the rules as derived.
 */
export const DEFAULT_MODEL_OPTIONS: Readonly<ModelOptions> = Object.freeze({
  ground: true,
  latticeSpanCount: DEFAULT_SPAN_COUNT,
  latticeChordCount: DEFAULT_CHORD_COUNT,
  suctionRecovered: 0.5,
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

/** An invented demo wheel (700c-sized, 50 mm rim, 20 round spokes, no cover). */
export const DEMO_WHEEL: Readonly<WheelGeometry> = Object.freeze({
  outerRadiusM: 0.334,
  tyreWidthM: 0.025,
  rimDepthM: 0.05,
  rimWidthM: 0.028,
  hubFlangeRadiusM: 0.028,
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
