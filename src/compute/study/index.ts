export { COLUMN_COUNT, COLUMN_NAMES, type ColumnSpec, columnIndex, RESULT_COLUMNS } from '../engine/columns';
export { AXIS, airspeedAxis, axisNumbers, coverFractionAxis, rimDepthAxis, yawAxis } from './axes';
export { baselineInput, baselineStudy } from './baselineStudy';
export { commandLineStudy } from './commandLineStudy';
export { coverFamilyStudy, sweepPlacement } from './coverFamilyStudy';
export { coverSweepStudy } from './coverSweepStudy';
export { currentDesignStudy } from './currentDesignStudy';
export { dataComparisonStudy, modelAtDataHere, modelAtDataOf } from './dataComparisonStudy';
export { designMapStudy } from './designMapStudy';
export {
  coverPlotSpeeds,
  type DesignSpaceChoice,
  MAP_DEPTH_COUNT,
  mapDepths,
  SWEEP_FRACTIONS,
} from './designSpace';
export { inputKey } from './inputKey';
export { FLAG_MESSAGES, type PointResult, type WheelInput, type WheelSolution } from './modelResults';
export { OutcomeCache } from './outcomeCache';
export { type PageStudies, pageStudies } from './pageStudies';
export { type AxisPick, ResultCube } from './resultCube';
export { rideCurvesKey, solveRideJob } from './rideJob';
export { RIDE_WHEELS, type RideStudyPlan, rideCurvesOf, rideStudy, solveRideStudy } from './rideStudy';
export {
  type CaseLanded,
  caseCell,
  type RunStudiesOptions,
  runStudies,
  type StudiesOutcome,
  type StudyResult,
} from './runStudies';
export { solveStudiesHere, studyLanding } from './studyLanding';
export {
  type AxisValue,
  axesSize,
  checkStudyPlan,
  isUnplanned,
  type StudyAxis,
  type StudyInput,
  type StudyPlan,
  type UnplannedCase,
} from './studyPlan';
export { pointsAt, variantInput } from './variantInput';
export { viewFieldRequest } from './viewFieldRequest';
