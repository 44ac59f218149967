/**
 * The model's types and tables that the page and the command line use, re-exported here so that they
 * import only src/compute (the layers point ui/cli -> compute -> model; see scripts/checkLayout.mjs).
 */
export type { FlowConditions, PointResult, WheelSolution } from '../model/wheel/types';
export { FLAG_MESSAGES, VALIDITY } from '../model/wheel/validity';
export type { WheelInput } from '../model/wheel/wheelInput';
export { logWindProfileRatio } from '../model/wind/logWindProfileRatio';
