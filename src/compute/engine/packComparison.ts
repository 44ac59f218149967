/**
 * A comparison's per-point results as columns of typed arrays (dataTaskTypes.ts), so that they cross a
 * worker boundary transferred (no per-row objects to copy), and read back row by row on the page.
 */
import { type CompareReport, type ConvertedRow, OUTPUTS, type ResidualRow } from '../compare/index';
import type { ConvertedColumns, PackedComparison, ResidualColumns } from './dataTaskTypes';

// ---------------------------------------------------------------------------------------------
// Packing (worker side)

export function packConverted(rows: readonly ConvertedRow[]): ConvertedColumns {
  const n = rows.length;
  const c: ConvertedColumns = {
    count: n,
    line: new Float64Array(n),
    yaw_deg: new Float64Array(n),
    airspeed_mps: new Float64Array(n),
    air_density_kgpm3: new Float64Array(n),
    values: {},
  };
  for (const out of OUTPUTS) {
    if (rows.some((r) => r[out] !== undefined)) c.values[out] = new Float64Array(n).fill(Number.NaN);
  }
  rows.forEach((r, i) => {
    c.line[i] = r.line;
    c.yaw_deg[i] = r.yaw_deg;
    c.airspeed_mps[i] = r.airspeed_mps;
    c.air_density_kgpm3[i] = r.air_density_kgpm3;
    for (const out of OUTPUTS) {
      const v = r[out];
      if (v !== undefined) c.values[out]![i] = v;
    }
  });
  return c;
}

export function packResiduals(rows: readonly ResidualRow[]): ResidualColumns {
  const n = rows.length;
  const c: ResidualColumns = {
    count: n,
    line: new Float64Array(n),
    yaw_deg: new Float64Array(n),
    airspeed_mps: new Float64Array(n),
    output: new Uint8Array(n),
    data: new Float64Array(n),
    model: new Float64Array(n),
    residual: new Float64Array(n),
    uncertainty: new Float64Array(n),
    within: new Float64Array(n),
  };
  rows.forEach((r, i) => {
    c.line[i] = r.line;
    c.yaw_deg[i] = r.yaw_deg;
    c.airspeed_mps[i] = r.airspeed_mps;
    c.output[i] = OUTPUTS.indexOf(r.output);
    c.data[i] = r.data;
    c.model[i] = r.model;
    c.residual[i] = r.residual;
    c.uncertainty[i] = r.model_uncertainty ?? Number.NaN;
    c.within[i] = r.within_band === null ? Number.NaN : r.within_band ? 1 : 0;
  });
  return c;
}

export function buffersOf(p: PackedComparison): ArrayBuffer[] {
  const arrays: Array<Float64Array | Uint8Array> = [
    p.converted.line,
    p.converted.yaw_deg,
    p.converted.airspeed_mps,
    p.converted.air_density_kgpm3,
    ...Object.values(p.converted.values),
    p.residuals.line,
    p.residuals.yaw_deg,
    p.residuals.airspeed_mps,
    p.residuals.output,
    p.residuals.data,
    p.residuals.model,
    p.residuals.residual,
    p.residuals.uncertainty,
    p.residuals.within,
  ];
  return arrays.map((a) => a.buffer as ArrayBuffer);
}

// ---------------------------------------------------------------------------------------------
// Reading rows back (page side)

export function convertedRowAt(c: ConvertedColumns, i: number): ConvertedRow {
  const row: ConvertedRow = {
    line: c.line[i]!,
    yaw_deg: c.yaw_deg[i]!,
    airspeed_mps: c.airspeed_mps[i]!,
    air_density_kgpm3: c.air_density_kgpm3[i]!,
  };
  for (const out of OUTPUTS) {
    const v = c.values[out]?.[i];
    if (v !== undefined && !Number.isNaN(v)) row[out] = v;
  }
  return row;
}

export function residualRowAt(c: ResidualColumns, i: number): ResidualRow {
  const u = c.uncertainty[i]!;
  const w = c.within[i]!;
  return {
    line: c.line[i]!,
    yaw_deg: c.yaw_deg[i]!,
    airspeed_mps: c.airspeed_mps[i]!,
    output: OUTPUTS[c.output[i]!]!,
    data: c.data[i]!,
    model: c.model[i]!,
    residual: c.residual[i]!,
    model_uncertainty: Number.isNaN(u) ? null : u,
    within_band: Number.isNaN(w) ? null : w === 1,
  };
}

/** The whole report with its per-point arrays as objects again (for inspection and tests). */
export function unpackComparison(p: PackedComparison): CompareReport {
  const converted: ConvertedRow[] = [];
  for (let i = 0; i < p.converted.count; i++) converted.push(convertedRowAt(p.converted, i));
  const residuals: ResidualRow[] = [];
  for (let i = 0; i < p.residuals.count; i++) residuals.push(residualRowAt(p.residuals, i));
  return { ...p.report, converted, residuals };
}
