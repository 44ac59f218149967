export { luFactor } from './luFactor';
export { luSolve } from './luSolve';
