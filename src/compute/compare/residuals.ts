/** Residuals data - model at every data point and output, with the model's band and a summary. */
import type { PointResult } from '../../model/wheel/index';
import { type ConvertedData, pointYawDeg } from './convertData';
import { modelUncertainty, modelValue } from './modelAtData';
import type { Output } from './quantities';

export interface ResidualRow {
  line: number;
  yaw_deg: number;
  airspeed_mps: number;
  output: Output;
  data: number;
  model: number;
  /** data - model (N or N m). */
  residual: number;
  /** The model's lattice uncertainty (absolute), null when not computed. */
  model_uncertainty: number | null;
  /** Whether the data point lies within model +- uncertainty (null without an uncertainty). */
  within_band: boolean | null;
}

export interface ResidualSummary {
  output: Output;
  points: number;
  /** Mean of data - model. */
  bias: number;
  rms: number;
  /** rms / rms of the data (fraction). */
  relative_rms: number;
}

export function computeResiduals(conv: ConvertedData, model: readonly PointResult[]): ResidualRow[] {
  const rows: ResidualRow[] = [];
  conv.points.forEach((p, i) => {
    for (const out of conv.outputs) {
      const d = p.values[out];
      if (d === undefined) continue;
      const m = modelValue(model[i]!, out);
      const u = modelUncertainty(model[i]!, out);
      const finiteU = Number.isFinite(u) ? u : null;
      rows.push({
        line: p.line,
        yaw_deg: pointYawDeg(p),
        airspeed_mps: p.airspeedMps,
        output: out,
        data: d,
        model: m,
        residual: d - m,
        model_uncertainty: finiteU,
        within_band: finiteU === null ? null : Math.abs(d - m) <= finiteU,
      });
    }
  });
  return rows;
}

export function summariseResiduals(rows: readonly ResidualRow[]): ResidualSummary[] {
  const by = new Map<Output, ResidualRow[]>();
  for (const r of rows) {
    const list = by.get(r.output);
    if (list) list.push(r);
    else by.set(r.output, [r]);
  }
  const out: ResidualSummary[] = [];
  for (const [output, list] of by) {
    const n = list.length;
    const bias = list.reduce((s, r) => s + r.residual, 0) / n;
    const rms = Math.sqrt(list.reduce((s, r) => s + r.residual * r.residual, 0) / n);
    const dataRms = Math.sqrt(list.reduce((s, r) => s + r.data * r.data, 0) / n);
    out.push({ output, points: n, bias, rms, relative_rms: dataRms > 0 ? rms / dataRms : Number.NaN });
  }
  return out;
}
