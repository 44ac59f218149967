/** What the road panel is told about the page: units, reference speed, design and baseline. */
import type { SpeedUnit } from '../viewState';

export interface RoadContext {
  speedUnit: SpeedUnit;
  /** Reference speed of "grams at" (m/s) and its text. */
  referenceSpeedMps: number;
  designLabel: string;
  baselineLabel: string;
  baselinePinned: boolean;
  /** Hub height above the road (the design's outer radius), m: where the ride takes the wind. */
  hubHeightM?: number;
}
