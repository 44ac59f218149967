/**
 * The slip checks that weigh the data against the model's known unit factors and the physical envelope
 * (see detectSlips.ts for the method and its thresholds).
 */

import type { PointResult } from '../../model/wheel/index';
import type { CaseFile } from '../caseFile';
import type { ConvertedData, DataPoint } from './convertData';
import { modelValue } from './modelAtData';
import { FORCE_UNITS, MOMENT_UNITS, type Output, SPEED_UNITS, UNIT_TO_SI, type Unit } from './quantities';
import { type Candidate, fmt, PHYSICAL_ENVELOPE, RAD, type SlipLabels, unitName } from './slipTypes';

/** Least-squares scale through the origin, data ~ k model, and the correlation of the two. */
export function scaleFit(d: number[], m: number[]): { k: number; correlation: number; sse: number } {
  let dm = 0;
  let mm = 0;
  let dd = 0;
  for (let i = 0; i < d.length; i++) {
    dm += d[i]! * m[i]!;
    mm += m[i]! * m[i]!;
    dd += d[i]! * d[i]!;
  }
  const k = mm > 0 ? dm / mm : Number.NaN;
  const sse = mm > 0 ? dd - (dm * dm) / mm : dd;
  return { k, correlation: dd > 0 && mm > 0 ? dm / Math.sqrt(dd * mm) : 0, sse: Math.max(0, sse) };
}

/** Points usable for the factor of one output: present in the data, and not near zero in the model. */
export function pairs(data: readonly DataPoint[], model: readonly PointResult[], out: Output) {
  const d: number[] = [];
  const m: number[] = [];
  const idx: number[] = [];
  let maxM = 0;
  for (let i = 0; i < data.length; i++) {
    if (data[i]!.values[out] === undefined) continue;
    maxM = Math.max(maxM, Math.abs(modelValue(model[i]!, out)));
  }
  for (let i = 0; i < data.length; i++) {
    const v = data[i]!.values[out];
    if (v === undefined) continue;
    const mv = modelValue(model[i]!, out);
    const lateral = out !== 'axial_N' && out !== 'wind_drag_N';
    if (lateral && Math.abs(data[i]!.yawRad) < 2 * RAD) continue;
    if (!(Math.abs(mv) > 0.1 * maxM)) continue;
    d.push(v);
    m.push(mv);
    idx.push(i);
  }
  return { d, m, idx };
}

export function candidatesFor(
  conv: ConvertedData,
  out: Output,
  caseFile: CaseFile,
  labels: SlipLabels,
): Candidate[] {
  const unitKey = labels.unit ?? 'unit';
  const areaKey = labels.reference_area_m2 ?? 'reference_area_m2';
  const unitValue = (u: Unit) => labels.unit_values?.[u] ?? u;
  const src = conv.sources[out];
  if (!src) return [];
  const list: Candidate[] = [];
  const R = caseFile.wheel.outer_radius_m;
  const isMoment = src.quantity === 'yaw_moment' || src.quantity === 'steering_moment';
  const isForce = FORCE_UNITS.includes(src.unit) && !isMoment;
  const sameKind = isForce ? FORCE_UNITS : isMoment ? MOMENT_UNITS : [];
  for (const y of sameKind) {
    if (y === src.unit) continue;
    const f = UNIT_TO_SI[src.unit] / UNIT_TO_SI[y];
    list.push({
      factor: f,
      code: 'unit_factor',
      text: `the values look like ${unitName(y)} but the column is mapped as ${unitName(src.unit)} (factor ${fmt(f)}); set its ${unitKey} to "${unitValue(y)}"`,
    });
  }
  if (isForce) {
    // A speed given in the wrong unit changes the model's dynamic pressure, not the measured force.
    const speedUnit = conv.speedUnit;
    for (const t of SPEED_UNITS) {
      if (t === speedUnit) continue;
      const f = (UNIT_TO_SI[t] / UNIT_TO_SI[speedUnit]) ** 2;
      list.push({
        factor: f,
        code: 'speed_unit',
        text: `the forces match the model as if the airspeed were in ${unitName(t)}, not ${unitName(speedUnit)} (factor ${fmt(f)}, the square of the speed ratio); check the speed's unit`,
      });
    }
  }
  if (src.quantity === 'drag_area' || src.quantity === 'drag_area_wind') {
    const other: Unit = src.unit === 'm2' ? 'cm2' : 'm2';
    const f = UNIT_TO_SI[src.unit] / UNIT_TO_SI[other];
    list.push({
      factor: f,
      code: 'area_unit',
      text: `the drag areas look like ${unitName(other)} but are mapped as ${unitName(src.unit)} (factor ${fmt(f)}); set the ${unitKey} to "${unitValue(other)}"`,
    });
  }
  if (src.reference_area_m2 !== undefined) {
    const a = src.reference_area_m2;
    const areas: [number, string][] = [
      [Math.PI * R * R, `the wheel's disc area pi R^2 = ${fmt(Math.PI * R * R, 4)} m^2`],
      [
        2 * R * caseFile.wheel.tyre_width_m,
        `a frontal area, diameter x tyre width = ${fmt(2 * R * caseFile.wheel.tyre_width_m, 4)} m^2`,
      ],
      [4 * Math.PI * R * R, `pi D^2 = ${fmt(4 * Math.PI * R * R, 4)} m^2 (the diameter used as a radius)`],
      [
        (Math.PI * R * R) / 4,
        `pi R^2 / 4 = ${fmt((Math.PI * R * R) / 4, 4)} m^2 (the radius used as a diameter)`,
      ],
      [1, '1 m^2 (the column may hold drag areas in m^2, not coefficients)'],
      [1e-4, '1 cm^2 (the column may hold drag areas in cm^2, not coefficients)'],
    ];
    for (const [area, text] of areas) {
      if (Math.abs(Math.log(area / a)) < Math.log(1.05)) continue;
      list.push({
        factor: a / area,
        code: 'reference_area',
        text: `the coefficients look based on ${text}, not the mapped ${fmt(a, 4)} m^2; set ${areaKey} accordingly`,
      });
    }
  }
  return list;
}

export function median(values: number[]): number {
  if (values.length === 0) return Number.NaN;
  const v = [...values].sort((x, y) => x - y);
  const h = Math.floor(v.length / 2);
  return v.length % 2 === 1 ? v[h]! : 0.5 * (v[h - 1]! + v[h]!);
}

/**
 * The data's own coefficient for `out` on the disc area (median over the usable points): drag at
 * |yaw| <= 10 deg, side force per sin(yaw) at |yaw| >= 4 deg (its size: the sign is checked apart).
 * NaN where the envelope does not apply (moments, too few points, a negative median drag).
 */
export function ownCoefficient(conv: ConvertedData, out: Output, discM2: number): number {
  const c: number[] = [];
  for (const p of conv.points) {
    const v = p.values[out];
    if (v === undefined) continue;
    const q = 0.5 * p.rhoKgPerM3 * p.airspeedMps * p.airspeedMps;
    if ((out === 'axial_N' || out === 'wind_drag_N') && Math.abs(p.yawRad) <= 10 * RAD)
      c.push(v / (q * discM2));
    if (out === 'side_N' && Math.abs(p.yawRad) >= 4 * RAD) c.push(v / (q * discM2 * Math.sin(p.yawRad)));
  }
  if (c.length < 2) return Number.NaN;
  const m = median(c);
  if (out === 'side_N') return Math.abs(m);
  return m > 0 ? m : Number.NaN;
}

/** How far (ln units) a coefficient divided by `factor` lies outside the envelope: 0 inside, NaN unknown. */
export function envelopeMiss(out: Output, coefficient: number, factor: number): number {
  if (!Number.isFinite(coefficient)) return Number.NaN;
  const [lo, hi] = out === 'side_N' ? PHYSICAL_ENVELOPE.sideSlope : PHYSICAL_ENVELOPE.axialCoefficient;
  const c = coefficient / factor;
  return Math.max(0, Math.log(lo / c), Math.log(c / hi));
}

export const FORCE_OUTPUTS: readonly Output[] = ['axial_N', 'wind_drag_N', 'side_N'];
