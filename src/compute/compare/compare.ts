/**
 * One comparison: data table + map + case -> converted data, flags, residuals against the model's band,
 * and on request a calibration, a convergence study and an input-uncertainty band. Browser-safe.
 */
import type { PointResult } from '../../model/wheel/index';
import { type CaseFile, caseAirDensity } from '../caseFile';
import { type CalibrationOptions, type CalibrationResult, calibrate } from './calibrate';
import { type ConvergenceOptions, type ConvergenceStudy, convergenceStudy } from './convergenceStudy';
import { type ConvertedData, convertTable, type DataPoint, pointYawDeg } from './convertData';
import type { CsvTable } from './csv';
import { detectSlips, type SlipFlag, type SlipLabels } from './detectSlips';
import type { MapFile } from './mapFile';
import { createModelEvaluator, modelUncertainty, modelValue, type ParameterValues } from './modelAtData';
import {
  propagateUncertainty,
  type UncertainRange,
  type UncertaintyBand,
  type UncertaintyOptions,
} from './propagateUncertainty';
import { OUTPUTS, type Output } from './quantities';
import { computeResiduals, type ResidualRow, type ResidualSummary, summariseResiduals } from './residuals';

export const COMPARE_FORMAT = 'coversweep-compare';
export const COMPARE_VERSION = 1;

export interface CompareRequest {
  caseFile: CaseFile;
  table: CsvTable;
  map: MapFile;
  /** A name for the data (file name), carried into calibration labels. */
  dataLabel: string;
  calibrate?: CalibrationOptions | false;
  convergence?: ConvergenceOptions | false;
  uncertainty?: { ranges: UncertainRange[]; options?: UncertaintyOptions } | false;
  /** What to call the map's keys in slip messages (default: the map file's keys). */
  slipLabels?: SlipLabels;
}

export interface ConvertedRow {
  line: number;
  yaw_deg: number;
  airspeed_mps: number;
  air_density_kgpm3: number;
  axial_N?: number;
  wind_drag_N?: number;
  side_N?: number;
  yaw_moment_Nm?: number;
  steering_moment_Nm?: number;
}

export interface BandRow {
  yaw_deg: number;
  airspeed_mps: number;
  air_density_kgpm3: number;
  output: Output;
  model: number;
  /** Lattice uncertainty (absolute), null when not computed. */
  uncertainty: number | null;
}

export interface CompareReport {
  format: typeof COMPARE_FORMAT;
  version: typeof COMPARE_VERSION;
  case_name: string | null;
  data: string;
  map: MapFile;
  conversion: { airspeed: string; density: string; sources: ConvertedData['sources'] };
  converted: ConvertedRow[];
  flags: SlipFlag[];
  residuals: ResidualRow[];
  residual_summary: ResidualSummary[];
  /** The model's curve and uncertainty over the data's yaw range, per airspeed, for the overlay. */
  band: BandRow[];
  calibration?: CalibrationResult;
  convergence?: ConvergenceStudy;
  uncertainty?: UncertaintyBand;
  notes: string[];
}

export type CompareResult = { ok: true; value: CompareReport } | { ok: false; errors: string[] };

export const COMPARE_NOTES: readonly string[] = [
  "all values converted to SI and the tool's axes: yaw > 0 is wind from the rider's right; axial_N is along the direction of travel (not wind-axis drag); side_N > 0 pushes the wheel to the rider's left",
  "residual = data - model; the model band is the model's value +- its lattice uncertainty (grid-convergence index)",
  'the original data file is not modified',
  'estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on qualified testing before riding a design',
];

export function convertedRows(conv: ConvertedData): ConvertedRow[] {
  return conv.points.map((p) => ({
    line: p.line,
    yaw_deg: pointYawDeg(p),
    airspeed_mps: p.airspeedMps,
    air_density_kgpm3: p.rhoKgPerM3,
    ...p.values,
  }));
}

/**
 * The model's curve with its band at `yawDeg` for each (airspeed, density) pair: for the overlay.
 */
export function modelBand(
  caseFile: CaseFile,
  conditions: readonly { airspeedMps: number; rhoKgPerM3: number }[],
  yawDeg: readonly number[],
  outputs: readonly Output[] = OUTPUTS,
  params: ParameterValues = {},
): BandRow[] {
  const pts: DataPoint[] = [];
  for (const c of conditions) {
    for (const y of yawDeg)
      pts.push({
        line: 0,
        yawRad: (y * Math.PI) / 180,
        yawDeg: y,
        airspeedMps: c.airspeedMps,
        rhoKgPerM3: c.rhoKgPerM3,
        values: {},
      });
  }
  const res = createModelEvaluator(caseFile, pts).evaluate(params);
  const rows: BandRow[] = [];
  pts.forEach((p, i) => {
    for (const out of outputs) {
      const u = modelUncertainty(res[i]!, out);
      rows.push({
        yaw_deg: pointYawDeg(p),
        airspeed_mps: p.airspeedMps,
        air_density_kgpm3: p.rhoKgPerM3,
        output: out,
        model: modelValue(res[i]!, out),
        uncertainty: Number.isFinite(u) ? u : null,
      });
    }
  });
  return rows;
}

/** Distinct (airspeed, density) pairs of the data and a 1-degree yaw grid over its yaw range. */
export function bandGrid(conv: ConvertedData): {
  conditions: { airspeedMps: number; rhoKgPerM3: number }[];
  yawDeg: number[];
} {
  const key = (p: DataPoint) => `${p.airspeedMps.toPrecision(6)}|${p.rhoKgPerM3.toPrecision(6)}`;
  const seen = new Map<string, { airspeedMps: number; rhoKgPerM3: number }>();
  let lo = 0;
  let hi = 0;
  for (const p of conv.points) {
    if (!seen.has(key(p))) seen.set(key(p), { airspeedMps: p.airspeedMps, rhoKgPerM3: p.rhoKgPerM3 });
    const d = pointYawDeg(p);
    lo = Math.min(lo, Math.floor(d));
    hi = Math.max(hi, Math.ceil(d));
  }
  const yawDeg: number[] = [];
  for (let y = lo; y <= hi; y++) yawDeg.push(y);
  return { conditions: [...seen.values()].slice(0, 12), yawDeg };
}

/** The model at the data's points (the page and the command line pass the comparison study's solve,
 * compute/study/dataComparisonStudy; the same bits as this default). */
export type ModelAtData = (caseFile: CaseFile, points: readonly DataPoint[]) => PointResult[];

const evaluatorAtData: ModelAtData = (caseFile, points) => createModelEvaluator(caseFile, points).evaluate();

export function runComparison(req: CompareRequest, modelAt: ModelAtData = evaluatorAtData): CompareResult {
  const rho = caseAirDensity(req.caseFile);
  const converted = convertTable(req.table, req.map, rho);
  if (!converted.ok) return converted;
  const conv = converted.value;
  const model = modelAt(req.caseFile, conv.points);
  const residuals = computeResiduals(conv, model);
  const grid = bandGrid(conv);
  const report: CompareReport = {
    format: COMPARE_FORMAT,
    version: COMPARE_VERSION,
    case_name: req.caseFile.name ?? null,
    data: req.dataLabel,
    map: req.map,
    conversion: { airspeed: conv.airspeedSource, density: conv.densitySource, sources: conv.sources },
    converted: convertedRows(conv),
    flags: detectSlips(conv, model, req.caseFile, req.slipLabels ? { labels: req.slipLabels } : {}),
    residuals,
    residual_summary: summariseResiduals(residuals),
    band: modelBand(req.caseFile, grid.conditions, grid.yawDeg, conv.outputs),
    notes: [...COMPARE_NOTES],
  };
  if (req.calibrate) report.calibration = calibrate(req.caseFile, conv, req.dataLabel, req.calibrate);
  if (req.convergence) report.convergence = convergenceStudy(req.caseFile, conv.points, req.convergence);
  if (req.uncertainty) {
    report.uncertainty = propagateUncertainty(
      req.caseFile,
      conv.points,
      rho,
      req.uncertainty.ranges,
      req.uncertainty.options,
    );
  }
  return { ok: true, value: report };
}
