/** The model's result types and flag texts, for the page (which imports nothing from src/model itself). */
export { FLAG_MESSAGES, type PointResult, type WheelInput, type WheelSolution } from '../../model/wheel';
