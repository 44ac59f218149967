/**
 * Input uncertainty propagated to the outputs by Monte Carlo (e.g. JCGM 101:2008, "Propagation of
 * distributions using a Monte Carlo method", sec. 7): each uncertain input is drawn uniformly from its
 * range with a seeded generator (mulberry32), the model is evaluated at every data point for each draw,
 * and the outputs' percentiles (Hyndman & Fan type 7) form the band. 64 draws by default: enough for a
 * 95% band to ~+-2.5 percentile points, not for tails. Same seed, same band.
 */

import { quantileSorted } from '../../model/fit/index';
import { mulberry32, uniformInRange } from '../../model/random/index';
import type { CaseFile } from '../caseFile';
import { type DataPoint, pointYawDeg } from './convertData';
import {
  CALIBRATABLE,
  type Calibratable,
  createModelEvaluator,
  modelValue,
  type ParameterValues,
} from './modelAtData';
import { OUTPUTS, type Output } from './quantities';

export const UNCERTAIN_INPUTS = [...CALIBRATABLE, 'air_density_kgpm3', 'yaw_offset_deg'] as const;
export type UncertainInput = (typeof UNCERTAIN_INPUTS)[number];

export interface UncertainRange {
  name: UncertainInput;
  min: number;
  max: number;
}

export interface UncertaintyOptions {
  samples?: number;
  seed?: number;
  /** Band percentiles (default 2.5 and 97.5). */
  lower?: number;
  upper?: number;
  outputs?: readonly Output[];
  /** Lattice (default: the case's, capped at 24 x 24 when the porosity varies). */
  latticeSpan?: number;
  latticeChord?: number;
}

export interface UncertaintyRow {
  yaw_deg: number;
  airspeed_mps: number;
  output: Output;
  nominal: number;
  mean: number;
  sd: number;
  lower: number;
  median: number;
  upper: number;
}

export interface UncertaintyBand {
  method: string;
  samples: number;
  seed: number;
  percentiles: [number, number];
  ranges: UncertainRange[];
  lattice: { span: number; chord: number };
  rows: UncertaintyRow[];
}

const LIMITS: Record<UncertainInput, [number, number]> = {
  porosity_scale: [1e-3, 1000],
  suction_recovered: [0, 1],
  profile_drag_factor: [1e-3, 100],
  air_density_kgpm3: [0.3, 1.6],
  yaw_offset_deg: [-10, 10],
};

export function propagateUncertainty(
  caseFile: CaseFile,
  points: readonly DataPoint[],
  nominalRhoKgPerM3: number,
  ranges: readonly UncertainRange[],
  options: UncertaintyOptions = {},
): UncertaintyBand {
  const samples = options.samples ?? 64;
  const seed = options.seed ?? 1;
  const lowerP = options.lower ?? 2.5;
  const upperP = options.upper ?? 97.5;
  if (!Number.isInteger(samples) || samples < 2 || samples > 10000) {
    throw new RangeError(`samples=${samples}: must be an integer between 2 and 10000`);
  }
  if (!(lowerP >= 0 && lowerP < upperP && upperP <= 100)) {
    throw new RangeError(`percentiles ${lowerP}, ${upperP}: must satisfy 0 <= lower < upper <= 100`);
  }
  if (ranges.length === 0) throw new RangeError('ranges: must give at least one uncertain input, got none');
  const seen = new Set<string>();
  for (const r of ranges) {
    const lim = LIMITS[r.name];
    if (!lim) throw new RangeError(`ranges: "${r.name}" is not one of ${UNCERTAIN_INPUTS.join(', ')}`);
    if (seen.has(r.name)) throw new RangeError(`ranges: "${r.name}" is given twice`);
    seen.add(r.name);
    if (
      !(
        Number.isFinite(r.min) &&
        Number.isFinite(r.max) &&
        r.min <= r.max &&
        r.min >= lim[0] &&
        r.max <= lim[1]
      )
    ) {
      throw new RangeError(
        `ranges.${r.name}: min=${r.min}, max=${r.max} must satisfy ${lim[0]} <= min <= max <= ${lim[1]}`,
      );
    }
  }
  const porous = ranges.some((r) => r.name === 'porosity_scale' && r.max > r.min);
  const span =
    options.latticeSpan ?? (porous ? Math.min(24, caseFile.model.lattice_span) : caseFile.model.lattice_span);
  const chord =
    options.latticeChord ??
    (porous ? Math.min(24, caseFile.model.lattice_chord) : caseFile.model.lattice_chord);
  const evaluator = createModelEvaluator(caseFile, points, {
    latticeSpan: span,
    latticeChord: chord,
    gridConvergence: false,
  });
  const outputs = options.outputs ?? OUTPUTS;
  const nominal = evaluator.evaluate();
  const rng = mulberry32(seed >>> 0);
  const draws = outputs.map(() => points.map(() => new Float64Array(samples)));
  for (let s = 0; s < samples; s++) {
    const params: ParameterValues = {};
    let rhoScale = 1;
    let yawOffsetRad = 0;
    for (const r of ranges) {
      const x = uniformInRange(rng(), r.min, r.max);
      if (r.name === 'air_density_kgpm3') rhoScale = x / nominalRhoKgPerM3;
      else if (r.name === 'yaw_offset_deg') yawOffsetRad = (x * Math.PI) / 180;
      else params[r.name as Calibratable] = x;
    }
    const res = evaluator.evaluate(params, { rhoScale, yawOffsetRad });
    outputs.forEach((out, o) => {
      for (let i = 0; i < points.length; i++) draws[o]![i]![s] = modelValue(res[i]!, out);
    });
  }
  const rows: UncertaintyRow[] = [];
  points.forEach((p, i) => {
    outputs.forEach((out, o) => {
      const v = draws[o]![i]!.sort();
      const mean = v.reduce((a, b) => a + b, 0) / samples;
      const sd = Math.sqrt(v.reduce((a, b) => a + (b - mean) * (b - mean), 0) / (samples - 1));
      rows.push({
        yaw_deg: pointYawDeg(p),
        airspeed_mps: p.airspeedMps,
        output: out,
        nominal: modelValue(nominal[i]!, out),
        mean,
        sd,
        lower: quantileSorted(v, lowerP / 100),
        median: quantileSorted(v, 0.5),
        upper: quantileSorted(v, upperP / 100),
      });
    });
  });
  return {
    method: `Monte Carlo, ${samples} draws, inputs uniform on their ranges, mulberry32 seed ${seed}`,
    samples,
    seed,
    percentiles: [lowerP, upperP],
    ranges: ranges.map((r) => ({ ...r })),
    lattice: { span, chord },
    rows,
  };
}
