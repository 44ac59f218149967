/**
 * The case file: CoverSweep's own versioned JSON describing one wheel, the flow conditions (a list of
 * airspeeds x yaw angles), the steering axis and the model's options. Keys are snake_case and carry
 * their units. The parts live in src/compute/case/: the types and limits (caseTypes), the defaults
 * (caseDefaults), the shape and its messages (caseSchema), reading and checking (validateCase), the
 * model's SI input (caseToModelInput) and the output document (resultDocument). Reading never throws
 * on bad input: every problem becomes a message naming the key path, the value and the rule.
 * This module is the one import path for all of it.
 */
export {
  DEFAULT_AIR,
  DEFAULT_REFERENCE_SPEED_KMH,
  DEFAULT_STEERING_DEG,
  DEFAULT_WHEEL,
  defaultCaseModel,
} from './case/caseDefaults';
export { MAX_NAME_CHARS, nameTooLong } from './case/caseSchema';
export { caseAirDensity, caseToModelInput, type ModelInput } from './case/caseToModelInput';
export {
  CASE_FORMAT,
  CASE_VERSION,
  type CaseConditions,
  type CaseCover,
  type CaseFile,
  type CaseModel,
  type CaseSpokes,
  type CaseSteering,
  type CaseWheel,
  COMPONENT_NAMES,
  LIMITS,
  type Parsed,
  RESULT_FORMAT,
  RESULT_VERSION,
} from './case/caseTypes';
export {
  COMPONENT_KEYS,
  type ComponentRow,
  finiteOrNull,
  RESULT_NOTES,
  RESULT_SCALAR_KEYS,
  type ResultDocument,
  type ResultRow,
  type SurfaceDocument,
  solutionToDocument,
  solveCase,
} from './case/resultDocument';
export { parseCaseFile, validateCase } from './case/validateCase';
export { describeValue, keyPathText } from './describeValue';
export { findJsonSyntaxError } from './findJsonSyntaxError';
export { lineColumn } from './lineColumn';
export { type JsonParseResult, parseJsonText } from './parseJsonText';
