import type { FlowConditions, ModelOptions, SteeringGeometry, WheelGeometry } from './types';

/** One wheel and the operating points to solve it at (the input of solveWheel). */
export interface WheelInput {
  wheel: WheelGeometry;
  options: ModelOptions;
  steering: SteeringGeometry;
  points: FlowConditions[];
}
