/**
 * Calibrate a few documented model parameters to imported data by bounded least squares
 * (Levenberg-Marquardt, src/model/fit) with forward-difference Jacobians, and report the fitted values
 * with 95% confidence intervals from the asymptotic covariance s^2 (J^T J)^-1 and Student's t with
 * m - p degrees of freedom (Bates & Watts 1988, sec. 2.3), and the residuals before and after.
 *
 * Residuals are data - model in newtons; moments are divided by the wheel's outer radius to weigh like
 * forces. The fit may use a coarser lattice than the case (the lattice is re-solved whenever the
 * porosity scale changes); that is reported, and the residuals after the fit are re-evaluated on the
 * case's own lattice.
 */

import { leastSquaresCovariance, levenbergMarquardt, studentTQuantile } from '../../model/fit/index';
import { type CaseFile, MAX_NAME_CHARS } from '../caseFile';
import type { ConvertedData } from './convertData';
import {
  CALIBRATABLE,
  type Calibratable,
  createModelEvaluator,
  modelValue,
  PARAMETER_BOUNDS,
  PARAMETER_MEANING,
  type ParameterValues,
} from './modelAtData';
import type { Output } from './quantities';
import { computeResiduals, type ResidualRow, type ResidualSummary, summariseResiduals } from './residuals';

export interface CalibrationOptions {
  /** Parameters to fit (default: all three). */
  parameters?: readonly Calibratable[];
  /** Lattice for the fit (default: the case's counts, capped at 24 x 24 for speed). */
  latticeSpan?: number;
  latticeChord?: number;
  /** Confidence level of the intervals (default 0.95). */
  confidence?: number;
  maxIterations?: number;
}

export interface FittedParameter {
  name: Calibratable;
  meaning: string;
  initial: number;
  value: number;
  standard_error: number | null;
  /** Confidence interval, clipped to the parameter's bounds; null when the data do not determine it. */
  interval: [number, number] | null;
  at_bound: boolean;
}

export interface CalibrationResult {
  label: string;
  parameters: FittedParameter[];
  confidence: number;
  degrees_of_freedom: number;
  residual_sd: number;
  converged: boolean;
  reason: string;
  iterations: number;
  model_evaluations: number;
  lattice: { span: number; chord: number; note: string };
  fitted_to: { data: string; points: number; outputs: Output[] };
  residuals_before: ResidualSummary[];
  residuals_after: ResidualSummary[];
  residuals: ResidualRow[];
  warnings: string[];
}

const FIT_LATTICE_CAP = 24;

export function calibrate(
  caseFile: CaseFile,
  conv: ConvertedData,
  dataLabel: string,
  options: CalibrationOptions = {},
): CalibrationResult {
  const names = [...(options.parameters ?? CALIBRATABLE)];
  if (names.length === 0)
    throw new RangeError('parameters: must name at least one parameter to fit, got none');
  for (const n of names) {
    if (!CALIBRATABLE.includes(n))
      throw new RangeError(`parameters: "${n}" is not one of ${CALIBRATABLE.join(', ')}`);
  }
  const confidence = options.confidence ?? 0.95;
  if (!(confidence > 0 && confidence < 1))
    throw new RangeError(`confidence=${confidence}: must be in (0, 1)`);
  const span = options.latticeSpan ?? Math.min(caseFile.model.lattice_span, FIT_LATTICE_CAP);
  const chord = options.latticeChord ?? Math.min(caseFile.model.lattice_chord, FIT_LATTICE_CAP);
  const fitEval = createModelEvaluator(caseFile, conv.points, {
    latticeSpan: span,
    latticeChord: chord,
    gridConvergence: false,
  });
  const R = caseFile.wheel.outer_radius_m;
  const terms: { point: number; out: Output; data: number; weight: number }[] = [];
  conv.points.forEach((p, i) => {
    for (const out of conv.outputs) {
      const d = p.values[out];
      if (d === undefined) continue;
      terms.push({
        point: i,
        out,
        data: d,
        weight: out === 'yaw_moment_Nm' || out === 'steering_moment_Nm' ? 1 / R : 1,
      });
    }
  });
  const warnings: string[] = [];
  if (terms.length <= names.length) {
    throw new RangeError(
      `data: ${terms.length} measured values cannot determine ${names.length} parameters (need more values than parameters)`,
    );
  }
  const initial = names.map((n) => caseFile.model[n]);
  const toValues = (x: Float64Array): ParameterValues => {
    const v: ParameterValues = {};
    names.forEach((n, j) => {
      v[n] = x[j]!;
    });
    return v;
  };
  const fit = levenbergMarquardt(
    {
      residualCount: terms.length,
      residuals: (x, out) => {
        const model = fitEval.evaluate(toValues(x));
        for (let k = 0; k < terms.length; k++) {
          const t = terms[k]!;
          out[k] = (t.data - modelValue(model[t.point]!, t.out)) * t.weight;
        }
      },
      initial,
      lower: names.map((n) => PARAMETER_BOUNDS[n][0]),
      upper: names.map((n) => PARAMETER_BOUNDS[n][1]),
    },
    {
      maxIterations: options.maxIterations ?? 50,
      differenceStep: 1e-6,
      parameterTolerance: 1e-7,
      costTolerance: 1e-10,
    },
  );
  const cov = leastSquaresCovariance(fit.jacobian, terms.length, names.length, fit.sumOfSquares, fit.atBound);
  const t = cov.dof > 0 ? studentTQuantile(0.5 + confidence / 2, cov.dof) : Number.NaN;
  if (!cov.determined) {
    warnings.push(
      'the data do not determine every fitted parameter separately (their effects are indistinguishable at these points): fit fewer parameters or add points at other yaw angles',
    );
  }
  if (cov.dof <= 0) warnings.push('no degrees of freedom left: intervals cannot be given');
  const parameters: FittedParameter[] = names.map((name, j) => {
    const value = fit.params[j]!;
    const se = cov.standardErrors[j]!;
    const [lo, hi] = PARAMETER_BOUNDS[name];
    const ok = Number.isFinite(se) && Number.isFinite(t);
    if (fit.atBound[j])
      warnings.push(`${name} ended on its bound ${value}: the data push it beyond the allowed range`);
    return {
      name,
      meaning: PARAMETER_MEANING[name],
      initial: initial[j]!,
      value,
      standard_error: Number.isFinite(se) ? se : null,
      interval: ok ? [Math.max(lo, value - t * se), Math.min(hi, value + t * se)] : null,
      at_bound: fit.atBound[j]!,
    };
  });
  // Residuals before and after on the case's own lattice.
  const full = createModelEvaluator(caseFile, conv.points);
  const before = computeResiduals(conv, full.evaluate());
  const after = computeResiduals(conv, full.evaluate(toValues(fit.params)));
  const sameLattice = span === caseFile.model.lattice_span && chord === caseFile.model.lattice_chord;
  return {
    label: `calibrated to ${dataLabel} (${conv.points.length} points: ${conv.outputs.join(', ')})`,
    parameters,
    confidence,
    degrees_of_freedom: cov.dof,
    residual_sd: Math.sqrt(cov.residualVariance),
    converged: fit.converged,
    reason: fit.reason,
    iterations: fit.iterations,
    model_evaluations: fit.evaluations,
    lattice: {
      span,
      chord,
      note: sameLattice
        ? "fitted on the case's own lattice"
        : `fitted on a coarser ${span} x ${chord} lattice for speed (the case uses ${caseFile.model.lattice_span} x ${caseFile.model.lattice_chord}); residuals after the fit are on the case's lattice`,
    },
    fitted_to: { data: dataLabel, points: conv.points.length, outputs: [...conv.outputs] },
    residuals_before: summariseResiduals(before),
    residuals_after: summariseResiduals(after),
    residuals: after,
    warnings,
  };
}

/**
 * The case with the calibrated parameters in place, named so that every sweep made with it says it is
 * calibrated and to what data.
 */
export function calibratedCase(caseFile: CaseFile, result: CalibrationResult): CaseFile {
  const model = { ...caseFile.model };
  for (const p of result.parameters) model[p.name] = p.value;
  const base = caseFile.name ?? 'case';
  // Within the case file's name limit: the mark is kept whole, the base name cut if need be.
  const mark = ` [CALIBRATED: ${result.label}]`.slice(0, MAX_NAME_CHARS);
  return { ...caseFile, name: `${base.slice(0, MAX_NAME_CHARS - mark.length)}${mark}`, model };
}
