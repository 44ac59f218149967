/**
 * Likely slips in imported data: a unit mix-up (grams or kilograms-force or pounds-force read as newtons,
 * N mm as N m, cm^2 as m^2, km/h as m/s), a reference-area mismatch of coefficients, wind-axis drag mapped
 * as axial drag (or the reverse; the two differ more as yaw grows), a flipped side-force sign, a side
 * force at zero yaw on a symmetric wheel, and forces not scaling with dynamic pressure between speeds.
 * Each flag has a short `code` and a plain-language `message`.
 *
 * The data are first held against themselves, so a slip is named even when the uncalibrated model is
 * itself off: the side force's sign against yaw (wind from the right pushes any wheel to the left, so
 * side force rises with yaw whatever the wheel), each force's coefficient on the wheel's disc area
 * against a physical envelope (PHYSICAL_ENVELOPE), the ratio between force columns (a speed slip moves
 * every force column alike, a unit slip one column), and the scaling with V^2 between speeds. The model
 * then picks between known unit factors: a factor is blamed on a slip when the data read in the other
 * unit are inside the envelope and within MODEL_SPREAD of the model while, as mapped, they are outside
 * the envelope or beyond MODEL_SPREAD; a factor over MIN_FACTOR within SLIP_TOLERANCE of a known slip's
 * is blamed as before; any other large factor is reported as unexplained. Thresholds: common practice,
 * no source.
 */

import type { PointResult } from '../../model/wheel/index';
import type { CaseFile } from '../caseFile';
import type { ConvertedData } from './convertData';
import { axisFlags, factorFlags, signFlags, speedFlags, symmetryFlags, zeroYawFlags } from './slipChecks';
import type { DetectOptions, SlipFlag } from './slipTypes';

export {
  type DetectOptions,
  MIN_FACTOR,
  MODEL_SPREAD,
  PHYSICAL_ENVELOPE,
  SLIP_TOLERANCE,
  type SlipCode,
  type SlipFlag,
  type SlipLabels,
} from './slipTypes';

/** All the slips found, given the converted data and the model (default parameters) at the same points. */
export function detectSlips(
  conv: ConvertedData,
  model: readonly PointResult[],
  caseFile: CaseFile,
  options: DetectOptions = {},
): SlipFlag[] {
  if (model.length !== conv.points.length) {
    throw new RangeError(
      `model.length=${model.length}: must equal the number of data points ${conv.points.length}`,
    );
  }
  const flags: SlipFlag[] = [];
  const labels = options.labels ?? {};
  signFlags(conv, flags, labels);
  factorFlags(conv, model, caseFile, flags, labels);
  axisFlags(conv, model, flags);
  zeroYawFlags(conv, model, caseFile, flags);
  symmetryFlags(conv, caseFile, flags);
  speedFlags(conv, model, flags);
  const beyond = model.filter(
    (p) => p.flags.includes('yaw_beyond_range') || p.flags.includes('airspeed_beyond_range'),
  );
  if (beyond.length > 0) {
    flags.push({
      code: 'beyond_model_range',
      message: `${beyond.length} of ${model.length} data points lie outside the model's stated range (yaw beyond 30 deg or airspeed outside 2..40 m/s): differences there say little about the data.`,
    });
  }
  return flags;
}
