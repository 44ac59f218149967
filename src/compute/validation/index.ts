export { bandText, formatNumber } from './bandText';
export { evaluateCase } from './evaluateCase';
export { formatValidationTable } from './formatValidationTable';
export { inBand } from './inBand';
export { memoisedSolve } from './memoisedSolve';
export { REFERENCE_CASES } from './referenceCases';
export { runValidation } from './runValidation';
export type * from './types';
export { PAGE_DESIGN_SPACE } from './wholeWheelCases';
