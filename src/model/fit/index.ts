export { type LeastSquaresCovariance, leastSquaresCovariance } from './leastSquaresCovariance';
export {
  type LeastSquaresOptions,
  type LeastSquaresProblem,
  type LeastSquaresResult,
  levenbergMarquardt,
} from './levenbergMarquardt';
export { logGamma } from './logGamma';
export { quantileSorted } from './quantileSorted';
export { regularizedIncompleteBeta } from './regularizedIncompleteBeta';
export { studentTCdf } from './studentTCdf';
export { studentTQuantile } from './studentTQuantile';
