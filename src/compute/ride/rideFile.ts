/**
 * The ride file: CoverSweep's own versioned JSON asking what a wheel design changes on the road against
 * a baseline wheel: power at constant speed, time at constant power, wind-averaged figures, handling.
 * Keys are snake_case with units. The `design` and `baseline` objects are case files' `wheel` objects,
 * `air` holds a case file's air keys, `steering` and `model` are as in a case file: all of these are
 * validated by the case-file rules (src/compute/caseFile.ts), with their messages' key paths renamed.
 * Parsing never throws: every problem becomes a message naming the key path, the value and the rule.
 * The parts: rideFileTypes (format, defaults, limits, types), rideSchema, validateRide, rideCases;
 * this module is their one import path.
 */
export * from './rideCases';
export * from './rideFileTypes';
export * from './validateRide';
