import { MODEL_PART_CASES } from './modelPartCases';
import { SIDE_FORCE_CASES } from './sideForceCases';
import type { ReferenceCase } from './types';
import { WHOLE_WHEEL_CASES } from './wholeWheelCases';

/** The whole built-in reference set, in the order it prints: whole wheels, side force, model parts. */
export const REFERENCE_CASES: readonly ReferenceCase[] = [
  ...WHOLE_WHEEL_CASES,
  ...SIDE_FORCE_CASES,
  ...MODEL_PART_CASES,
];
