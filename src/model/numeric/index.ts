export { illinoisRoot } from './illinoisRoot';
export { luFactor } from './luFactor';
export { luSolve } from './luSolve';
