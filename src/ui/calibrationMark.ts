/** The mark of a calibrated model in the page state: what was fitted, to which data, and what it replaced. */
import { z } from 'zod';
import type { Parsed } from '../compute/caseFile';
import { CALIBRATABLE, type Calibratable } from '../compute/compare/index';

/** The design's model options were replaced by values fitted to a data file ("Use calibrated model"). */
export interface CalibrationMark {
  /** The data file's name and its number of data points. */
  data: string;
  points: number;
  /** Fitted values now in the design's model options, and the values they replaced. */
  values: Partial<Record<Calibratable, number>>;
  original: Partial<Record<Calibratable, number>>;
}

const paramRecord = z.partialRecord(
  z.enum(CALIBRATABLE),
  z.number().refine(Number.isFinite, { error: 'must be a finite number' }),
);
const calibrationSchema = z.strictObject({
  data: z.string().max(300),
  points: z.number().int().min(0),
  values: paramRecord,
  original: paramRecord,
});

export function validateCalibration(raw: unknown, label: string): Parsed<CalibrationMark> {
  const r = calibrationSchema.safeParse(raw);
  if (r.success) return { ok: true, value: r.data as CalibrationMark };
  return {
    ok: false,
    errors: r.error.issues.map(
      (i) => `${label}: calibration${i.path.map((k) => `.${String(k)}`).join('')}: ${i.message}`,
    ),
  };
}
