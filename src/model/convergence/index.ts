export type {
  ConvergenceStatus,
  GridConvergenceInput,
  GridConvergenceResult,
} from './gridConvergenceIndex';
export { gridConvergenceIndex } from './gridConvergenceIndex';
