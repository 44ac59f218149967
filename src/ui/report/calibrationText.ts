/**
 * The calibration status line: "CALIBRATED: model fitted to <data> (<n> points): porosity_scale 1.8 (was
 * 1), ..." while a model fitted to the user's data is in use, otherwise that the model's parameters are
 * the defaults or the user's own, not fitted.
 */
import type { CalibrationMark } from '../appState';

function value(x: number | undefined): string {
  return x === undefined || !Number.isFinite(x) ? 'n/a' : String(Number(x.toPrecision(4)));
}

export function calibrationText(mark: CalibrationMark | null | undefined): {
  calibrated: boolean;
  text: string;
} {
  if (!mark) {
    return {
      calibrated: false,
      text: 'Not calibrated: the model options are those of the design (defaults or typed), not fitted to data.',
    };
  }
  const keys = Object.keys(mark.values) as Array<keyof CalibrationMark['values']>;
  const fitted = keys.map((k) => `${k} ${value(mark.values[k])} (was ${value(mark.original[k])})`).join(', ');
  return {
    calibrated: true,
    text: `CALIBRATED: model fitted to ${mark.data} (${mark.points} point${mark.points === 1 ? '' : 's'}): ${fitted || 'no parameter changed'}.`,
  };
}
