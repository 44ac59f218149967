/** Hold measured or simulated data against the model: import, cross-check, calibrate, uncertainty. Browser-safe. */
export {
  type CalibrationOptions,
  type CalibrationResult,
  calibrate,
  calibratedCase,
  type FittedParameter,
} from './calibrate';
export {
  type BandRow,
  bandGrid,
  COMPARE_FORMAT,
  COMPARE_NOTES,
  COMPARE_VERSION,
  type CompareReport,
  type CompareRequest,
  type CompareResult,
  type ConvertedRow,
  convertedRows,
  type ModelAtData,
  modelBand,
  runComparison,
} from './compare';
export {
  type ConvergenceOptions,
  type ConvergenceRow,
  type ConvergenceStudy,
  casePoints,
  convergenceStudy,
} from './convergenceStudy';
export {
  type ConvertedData,
  type ConvertResult,
  convertTable,
  type DataPoint,
  type OutputSource,
} from './convertData';
export {
  CsvReader,
  type CsvResult,
  type CsvTable,
  checkDataSize,
  type Delimiter,
  MAX_DATA_BYTES,
  MAX_DATA_ROWS,
  parseCsvText,
  parseNumberCell,
  readCsvStream,
} from './csv';
export {
  type DetectOptions,
  detectSlips,
  MIN_FACTOR,
  MODEL_SPREAD,
  PHYSICAL_ENVELOPE,
  SLIP_TOLERANCE,
  type SlipCode,
  type SlipFlag,
  type SlipLabels,
} from './detectSlips';
export { type GuessContext, guessMap, type MapGuess, splitHeader } from './guessMap';
export {
  MAP_FORMAT,
  MAP_VERSION,
  type MapColumn,
  type MapFile,
  type MapParsed,
  mapRules,
  parseMapFile,
  validateMap,
} from './mapFile';
export {
  CALIBRATABLE,
  type Calibratable,
  createModelEvaluator,
  type EvaluatorOptions,
  type ModelEvaluator,
  modelUncertainty,
  modelValue,
  PARAMETER_BOUNDS,
  PARAMETER_MEANING,
  type ParameterValues,
} from './modelAtData';
export {
  propagateUncertainty,
  UNCERTAIN_INPUTS,
  type UncertainInput,
  type UncertainRange,
  type UncertaintyBand,
  type UncertaintyOptions,
  type UncertaintyRow,
} from './propagateUncertainty';
export * from './quantities';
export { computeResiduals, type ResidualRow, type ResidualSummary, summariseResiduals } from './residuals';
