/**
 * Convergence study on demand: the main outputs at three lattice refinements (the finest given, then
 * each count divided by the refinement ratio, twice), with the observed order, the Richardson
 * extrapolation and the fine-grid convergence index of each (Roache 1994; Celik et al. 2008 procedure,
 * src/model/convergence). Representative cell size h = sqrt(pi R^2 / panels).
 */

import { gridConvergenceIndex } from '../../model/convergence/index';
import type { CaseFile } from '../caseFile';
import { type DataPoint, pointYawDeg } from './convertData';
import { createModelEvaluator, modelValue } from './modelAtData';
import { OUTPUTS, type Output } from './quantities';

export interface ConvergenceRow {
  yaw_deg: number;
  airspeed_mps: number;
  output: Output;
  /** Values on the fine, medium and coarse lattices. */
  values: [number, number, number];
  observed_order: number | null;
  extrapolated: number | null;
  /** GCI_fine21 as a fraction, and as an absolute error bar (same unit as the output). */
  gci_relative: number | null;
  gci_absolute: number | null;
  status: string;
}

export interface ConvergenceStudy {
  lattices: { span: number; chord: number; panels: number; h_m: number }[];
  rows: ConvergenceRow[];
}

export interface ConvergenceOptions {
  /** Finest lattice (default: the case's counts). */
  span?: number;
  chord?: number;
  /** Refinement ratio between successive lattices in each direction (default 1.5; at least 1.3 per Celik et al.). */
  ratio?: number;
  outputs?: readonly Output[];
}

const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);

/** The case's own operating points, as data points without values. */
export function casePoints(caseFile: CaseFile, rhoKgPerM3: number): DataPoint[] {
  const pts: DataPoint[] = [];
  for (const v of caseFile.conditions.airspeed_mps) {
    for (const y of caseFile.conditions.yaw_deg) {
      pts.push({ line: 0, yawRad: (y * Math.PI) / 180, airspeedMps: v, rhoKgPerM3, values: {} });
    }
  }
  return pts;
}

export function convergenceStudy(
  caseFile: CaseFile,
  points: readonly DataPoint[],
  options: ConvergenceOptions = {},
): ConvergenceStudy {
  const ratio = options.ratio ?? 1.5;
  if (!(ratio >= 1.1 && ratio <= 4)) throw new RangeError(`ratio=${ratio}: must be between 1.1 and 4`);
  const span = options.span ?? caseFile.model.lattice_span;
  const chord = options.chord ?? caseFile.model.lattice_chord;
  const counts: [number, number][] = [
    [span, chord],
    [Math.max(3, Math.round(span / ratio)), Math.max(2, Math.round(chord / ratio))],
    [Math.max(3, Math.round(span / (ratio * ratio))), Math.max(2, Math.round(chord / (ratio * ratio)))],
  ];
  const R = caseFile.wheel.outer_radius_m;
  const lattices = counts.map(([s, c]) => ({
    span: s,
    chord: c,
    panels: s * c,
    h_m: Math.sqrt((Math.PI * R * R) / (s * c)),
  }));
  if (!(lattices[0]!.h_m < lattices[1]!.h_m && lattices[1]!.h_m < lattices[2]!.h_m)) {
    throw new RangeError(
      `span=${span}, chord=${chord}, ratio=${ratio}: the three lattices must differ (refine further)`,
    );
  }
  const results = counts.map(([s, c]) =>
    createModelEvaluator(caseFile, points, {
      latticeSpan: s,
      latticeChord: c,
      gridConvergence: false,
    }).evaluate(),
  );
  const outputs = options.outputs ?? OUTPUTS;
  const rows: ConvergenceRow[] = [];
  points.forEach((p, i) => {
    for (const out of outputs) {
      const v: [number, number, number] = [
        modelValue(results[0]![i]!, out),
        modelValue(results[1]![i]!, out),
        modelValue(results[2]![i]!, out),
      ];
      const g = gridConvergenceIndex({
        h1: lattices[0]!.h_m,
        h2: lattices[1]!.h_m,
        h3: lattices[2]!.h_m,
        phi1: v[0],
        phi2: v[1],
        phi3: v[2],
      });
      rows.push({
        yaw_deg: pointYawDeg(p),
        airspeed_mps: p.airspeedMps,
        output: out,
        values: v,
        observed_order: finiteOrNull(g.observedOrder),
        extrapolated: finiteOrNull(g.extrapolated),
        gci_relative: finiteOrNull(g.gciRelative),
        gci_absolute: finiteOrNull(g.gciRelative * Math.abs(v[0])),
        status: g.status,
      });
    }
  });
  return { lattices, rows };
}
