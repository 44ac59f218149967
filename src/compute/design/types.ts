/**
 * Types of the design study: the design variables a study may free, the ride objectives computed for
 * each design, and one evaluated design.
 */

import type { WindStates } from '../../model/wind/windStates';
import type { RideCurve, RideDocument, RideFile } from '../ride/index';

/** A wheel as the ride file holds it (a case file's `wheel` object). */
export type DesignWheel = RideFile['design'];

/** Values of the freed design variables, by variable id (numbers, or a discrete variable's choice). */
export type DesignValues = Record<string, number | string>;

/** Everything a ride objective reads about one design on the ride. */
export interface DesignRide {
  ride: RideFile;
  /** The ride evaluated with this design against the ride's baseline. */
  doc: RideDocument;
  /** The design's yaw curve at the ride's curve speed. */
  curve: RideCurve;
  context: DesignContext;
}

/**
 * What does not change between designs of one study: the ride, the baseline's curve, the speed the
 * curves are solved at, the air, and the wind states and gust directions the objectives average over.
 */
export interface DesignContext {
  ride: RideFile;
  baseline: RideCurve;
  referenceSpeedMps: number;
  referenceSpeedCapped: boolean;
  rhoKgPerM3: number;
  /** The ride's wind states at hub height, every leg of a course weighted by its length. */
  hubStates: WindStates;
  /** Relative wind directions (FROM, rad) scanned for the worst gust. */
  gustDirectionsRad: number[];
}

/**
 * One ride objective: a number to be made small (every objective is minimised), with its unit. An
 * objective that does not apply to a ride (the steering moment of a rear wheel) says so in `applies`.
 */
export interface RideObjective {
  /** Stable id, used in study files, result columns and the page (snake_case, unit suffix). */
  id: string;
  label: string;
  unit: string;
  /** 'performance': time, power, drag; 'handling': a figure a limit can be put on. */
  kind: 'performance' | 'handling';
  description: string;
  /** Null when it applies to the ride, else the reason it does not. */
  applies(ride: RideFile): string | null;
  compute(d: DesignRide): number;
}

/** One evaluated design. */
export interface DesignEvaluation {
  /** Values of every study variable (free and fixed). */
  values: DesignValues;
  wheel: DesignWheel;
  /** Every applicable objective's value, by objective id (NaN when the ride gives none). */
  objectives: Record<string, number>;
  /** The ride's flags for this design (model validity, capped speeds, ...). */
  flags: string[];
}
