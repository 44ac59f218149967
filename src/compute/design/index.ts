/**
 * Design studies: ride objectives over the design space, the optimiser with handling limits, the
 * trade-off front, the study file and its result. The page and the command line import from here.
 */
export { designContext, type LatticeCounts } from './designContext';
export { applyDesign, DESIGN_VARIABLES, type DesignVariable, designVariable } from './designVariables';
export { evaluateDesign } from './evaluateDesign';
export { OBJECTIVES, rideObjective } from './objectives/index';
export { optimiseStudy, type StudyProgress, wheelValues } from './optimiseStudy';
export { paretoFront } from './paretoFront';
export {
  STUDY_NOTES,
  STUDY_RESULT_FORMAT,
  STUDY_RESULT_VERSION,
  type StudyDocument,
  studyCsv,
  studyDocument,
} from './studyDocument';
export {
  parseStudyFile,
  STUDY_DEFAULTS,
  STUDY_FORMAT,
  STUDY_LIMITS,
  STUDY_VERSION,
  validateStudy,
} from './studyFile';
export type { DesignStudy, FigureUncertainty, StudyOutcome, StudyPoint } from './studyTypes';
export type { DesignEvaluation, DesignValues, RideObjective } from './types';
