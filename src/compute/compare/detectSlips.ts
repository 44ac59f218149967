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
import type { ConvertedData, DataPoint } from './convertData';
import { modelValue } from './modelAtData';
import {
  FORCE_UNITS,
  MOMENT_UNITS,
  OUTPUT_LABEL,
  type Output,
  SPEED_UNITS,
  UNIT_TO_SI,
  type Unit,
} from './quantities';

export type SlipCode =
  | 'unit_factor'
  | 'speed_unit'
  | 'area_unit'
  | 'reference_area'
  | 'scale_mismatch'
  | 'side_force_sign'
  | 'drag_axis'
  | 'side_force_at_zero_yaw'
  | 'dynamic_pressure_scaling'
  | 'beyond_model_range'
  | 'yaw_symmetry';

export interface SlipFlag {
  code: SlipCode;
  message: string;
  /** The output concerned, when one. */
  output?: Output;
  /** The factor data / model found, when relevant. */
  factor?: number;
}

/** A factor is blamed on a slip only when |ln r| > ln(MIN_FACTOR) and within SLIP_TOLERANCE of the slip's. */
export const MIN_FACTOR = 1.8;
export const SLIP_TOLERANCE = 1.3;
/**
 * How far the uncalibrated model may be from a wheel it describes (a factor either way) before a
 * difference says more about the data than about the model: common practice, no source (the
 * calibratable parameters move this model's drag by up to about 2x over their plausible ranges).
 */
export const MODEL_SPREAD = 2.2;
/**
 * Physical envelope of a wheel's force coefficients on its disc area pi R^2, with wide margins:
 * - axial (and wind-axis) drag at |yaw| <= 10 deg: 0.004..0.3. A 700C tyre alone (frontal area about
 *   0.017 m^2, Cd about 0.3) gives about 0.013 on the disc; a flat plate face-on gives 1.17 (Hoerner,
 *   Fluid-Dynamic Drag, 1965, ch. 3) and an edge-on wheel far less. The model's wheels give 0.017..0.06.
 * - side force per sin(yaw): 0.3..4 per unit sin(yaw). The exact lift slope of a thin circular wing is
 *   1.79 per radian (Kinner 1937; Jordan 1973), at most about doubled by the ground image; the model's
 *   bare spoked wheel gives about 1.2, its disc about 2.1.
 * Bounds: common practice, no source (the cited figures set their scale).
 */
export const PHYSICAL_ENVELOPE = {
  axialCoefficient: [0.004, 0.3],
  sideSlope: [0.3, 4],
} as const;

/** What to call the map's keys in messages (the page passes its control labels). */
export interface SlipLabels {
  side_force_sign?: string;
  yaw_moment_sign?: string;
  unit?: string;
  reference_area_m2?: string;
}

export interface DetectOptions {
  labels?: SlipLabels;
}
const RAD = Math.PI / 180;

interface Candidate {
  factor: number;
  code: SlipCode;
  text: string;
}

function fmt(x: number, digits = 3): string {
  return Number(x.toPrecision(digits)).toString();
}

function unitName(u: Unit): string {
  const names: Partial<Record<Unit, string>> = {
    N: 'newtons',
    gf: 'grams-force',
    kgf: 'kilograms-force',
    lbf: 'pounds-force',
    m2: 'm^2',
    cm2: 'cm^2',
    mps: 'm/s',
    kmh: 'km/h',
    mph: 'mph',
    Nm: 'N m',
    Nmm: 'N mm',
  };
  return names[u] ?? u;
}

/** Least-squares scale through the origin, data ~ k model, and the correlation of the two. */
function scaleFit(d: number[], m: number[]): { k: number; correlation: number; sse: number } {
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
function pairs(data: readonly DataPoint[], model: readonly PointResult[], out: Output) {
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

function candidatesFor(
  conv: ConvertedData,
  out: Output,
  caseFile: CaseFile,
  labels: SlipLabels,
): Candidate[] {
  const unitKey = labels.unit ?? 'unit';
  const areaKey = labels.reference_area_m2 ?? 'reference_area_m2';
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
      text: `the values look like ${unitName(y)} but the column is mapped as ${unitName(src.unit)} (factor ${fmt(f)}); set its ${unitKey} to "${y}"`,
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
      text: `the drag areas look like ${unitName(other)} but are mapped as ${unitName(src.unit)} (factor ${fmt(f)}); set the ${unitKey} to "${other}"`,
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

function median(values: number[]): number {
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
function ownCoefficient(conv: ConvertedData, out: Output, discM2: number): number {
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
function envelopeMiss(out: Output, coefficient: number, factor: number): number {
  if (!Number.isFinite(coefficient)) return Number.NaN;
  const [lo, hi] = out === 'side_N' ? PHYSICAL_ENVELOPE.sideSlope : PHYSICAL_ENVELOPE.axialCoefficient;
  const c = coefficient / factor;
  return Math.max(0, Math.log(lo / c), Math.log(c / hi));
}

const FORCE_OUTPUTS: readonly Output[] = ['axial_N', 'wind_drag_N', 'side_N'];

/** The side force against yaw, from the data alone: it must rise with yaw whatever the wheel. */
function signFlags(conv: ConvertedData, flags: SlipFlag[], labels: SlipLabels): void {
  if (!conv.outputs.includes('side_N')) return;
  let xy = 0;
  let xx = 0;
  let yy = 0;
  let n = 0;
  for (const p of conv.points) {
    const v = p.values.side_N;
    if (v === undefined || Math.abs(p.yawRad) < 2 * RAD) continue;
    const x = Math.sin(p.yawRad);
    const y = v / (0.5 * p.rhoKgPerM3 * p.airspeedMps * p.airspeedMps);
    xy += x * y;
    xx += x * x;
    yy += y * y;
    n++;
  }
  if (n < 2 || !(xx > 0 && yy > 0)) return;
  const correlation = xy / Math.sqrt(xx * yy);
  if (!(correlation < -0.8)) return;
  const current = conv.sideForceSign ?? 1;
  const key = labels.side_force_sign ?? 'side_force_sign';
  const advice =
    current === 1
      ? `if your balance's lateral axis points to the right, set ${key} to -1`
      : `${key} is -1 now (the data's lateral axis taken to point to the right), and with it the side force falls with yaw: set ${key} to 1`;
  flags.push({
    code: 'side_force_sign',
    output: 'side_N',
    factor: xy / xx,
    message:
      `the measured side force falls as yaw rises (correlation ${fmt(correlation, 2)} with sin(yaw) over ${n} points at |yaw| >= 2 deg), but wind from the rider's right (positive yaw) pushes any wheel to the left (positive side force), so it must rise. ` +
      `${advice}.`,
  });
}

function factorFlags(
  conv: ConvertedData,
  model: readonly PointResult[],
  caseFile: CaseFile,
  flags: SlipFlag[],
  labels: SlipLabels,
): void {
  const R = caseFile.wheel.outer_radius_m;
  const disc = Math.PI * R * R;
  const fits = new Map<Output, { k: number; correlation: number; n: number }>();
  for (const out of conv.outputs) {
    const { d, m } = pairs(conv.points, model, out);
    if (d.length === 0) continue;
    const fit = scaleFit(d, m);
    if (Number.isFinite(fit.k)) fits.set(out, { k: fit.k, correlation: fit.correlation, n: d.length });
  }
  for (const [out, fit] of fits) {
    const moment = out === 'yaw_moment_Nm' || out === 'steering_moment_Nm';
    if (moment && fit.k < 0 && fit.correlation < -0.8) {
      const current = conv.yawMomentSign ?? 1;
      const key = labels.yaw_moment_sign ?? 'yaw_moment_sign';
      flags.push({
        code: 'side_force_sign',
        output: out,
        factor: fit.k,
        message:
          `the measured ${OUTPUT_LABEL[out]} has the opposite sign to the model's at yaw (best fit: data = ${fmt(fit.k)} x model over ${fit.n} points); ` +
          `if its axis is mirrored, set ${key} to ${-current}${current === -1 ? ' (it is -1 now)' : ''}.`,
      });
    }
    const r = Math.abs(fit.k);
    if (!(r > 0)) continue;
    const own = ownCoefficient(conv, out, disc);
    const mappedEnvelope = envelopeMiss(out, own, 1);
    const mappedMiss = Math.abs(Math.log(r));
    const mappedOut = mappedEnvelope > 0 || mappedMiss > Math.log(MODEL_SPREAD);
    if (!mappedOut && mappedMiss < Math.log(MIN_FACTOR)) continue;
    // Between columns: a speed slip scales every force column alike, so it is named only when the
    // other force columns share this column's factor.
    const others = FORCE_OUTPUTS.filter((o) => o !== out && fits.has(o));
    const shared = others.every((o) => Math.abs(Math.log(Math.abs(fits.get(o)!.k) / r)) < Math.log(1.5));
    const matches = candidatesFor(conv, out, caseFile, labels)
      .filter((c) => c.code !== 'speed_unit' || shared)
      .map((c) => ({ c, miss: Math.abs(Math.log(r / c.factor)), envelope: envelopeMiss(out, own, c.factor) }))
      .filter(
        (x) =>
          !(x.envelope > 0) &&
          ((mappedMiss > Math.log(MIN_FACTOR) && x.miss < Math.log(SLIP_TOLERANCE)) ||
            (mappedOut && x.miss < Math.log(MODEL_SPREAD) && x.miss < mappedMiss)),
      )
      .sort((a, b) => a.miss - b.miss);
    const head = `${OUTPUT_LABEL[out]}: the data are ${fmt(r)} times the model over ${fit.n} points`;
    const what =
      out === 'side_N'
        ? "side-force slope on the wheel's disc area"
        : "drag coefficient on the wheel's disc area";
    const [lo, hi] = out === 'side_N' ? PHYSICAL_ENVELOPE.sideSlope : PHYSICAL_ENVELOPE.axialCoefficient;
    const envelopeText =
      mappedEnvelope > 0
        ? `; as mapped, the data's own ${what} is ${fmt(own)}, outside what any wheel makes (${lo}..${hi})`
        : '';
    if (matches.length > 0) {
      const best = matches[0]!;
      const alternatives = matches.slice(1).map((x) => x.c.text);
      const corrected = Number.isFinite(own) ? `; read so, its ${what} is ${fmt(own / best.c.factor)}` : '';
      const rest =
        Math.abs(Math.log(r / best.c.factor)) > Math.log(SLIP_TOLERANCE)
          ? ` and the model is ${fmt(r / best.c.factor)} times off (calibrate once this is set right)`
          : '';
      flags.push({
        code: best.c.code,
        output: out,
        factor: r,
        message: `${head}${envelopeText}; ${best.c.text}${corrected}${rest}${alternatives.length > 0 ? `. Also possible: ${alternatives.join('; ')}` : ''}.`,
      });
    } else {
      flags.push({
        code: 'scale_mismatch',
        output: out,
        factor: r,
        message: `${head}${envelopeText}, and no common unit, area or speed slip explains that factor: check the wheel description, the reference area, a tare, or calibrate the model.`,
      });
    }
  }
}

function axisFlags(conv: ConvertedData, model: readonly PointResult[], flags: SlipFlag[]): void {
  for (const [own, other] of [
    ['axial_N', 'wind_drag_N'],
    ['wind_drag_N', 'axial_N'],
  ] as const) {
    if (!conv.outputs.includes(own) || conv.outputs.includes(other)) continue;
    const d: number[] = [];
    const mOwn: number[] = [];
    const mOther: number[] = [];
    let maxDiff = 0;
    let maxOwn = 0;
    for (let i = 0; i < conv.points.length; i++) {
      const v = conv.points[i]!.values[own];
      if (v === undefined) continue;
      const a = modelValue(model[i]!, own);
      const b = modelValue(model[i]!, other);
      d.push(v);
      mOwn.push(a);
      mOther.push(b);
      maxDiff = Math.max(maxDiff, Math.abs(a - b));
      maxOwn = Math.max(maxOwn, Math.abs(a));
    }
    const yawed = conv.points.filter(
      (p) => p.values[own] !== undefined && Math.abs(p.yawRad) >= 5 * RAD,
    ).length;
    if (yawed < 2 || !(maxDiff > 0.2 * maxOwn)) continue;
    const fOwn = scaleFit(d, mOwn);
    const fOther = scaleFit(d, mOther);
    if (!(fOther.k > 0) || !(fOther.sse < 0.25 * fOwn.sse)) continue;
    const label = own === 'axial_N' ? 'axial drag' : 'wind-axis drag';
    const otherLabel =
      own === 'axial_N'
        ? 'wind-axis drag (along the apparent wind)'
        : 'axial drag (along the direction of travel)';
    const src = conv.sources[own]!;
    flags.push({
      code: 'drag_axis',
      output: own,
      message:
        `column "${src.column}" is mapped as ${label}, but across yaw it follows the model's ${otherLabel} much better ` +
        `(fit residual ${fmt(Math.sqrt(fOther.sse / d.length))} N against ${fmt(Math.sqrt(fOwn.sse / d.length))} N rms). ` +
        'Wind-axis drag = axial drag x cos(yaw) + side force x sin(yaw), so the two part as yaw grows; ' +
        `map the column as ${own === 'axial_N' ? 'drag_force_wind (or drag_area_wind / drag_coefficient_wind)' : 'axial_force (or drag_area / drag_coefficient)'} if that is what it holds.`,
    });
  }
}

function zeroYawFlags(
  conv: ConvertedData,
  model: readonly PointResult[],
  caseFile: CaseFile,
  flags: SlipFlag[],
): void {
  if (!conv.outputs.includes('side_N')) return;
  // Work with side force / dynamic pressure (m^2), so points at different speeds compare.
  const q = (p: DataPoint) => 0.5 * p.rhoKgPerM3 * p.airspeedMps * p.airspeedMps;
  let maxArea = 0;
  let slopeArea = 0;
  for (let i = 0; i < conv.points.length; i++) {
    const p = conv.points[i]!;
    const v = p.values.side_N;
    if (v === undefined) continue;
    maxArea = Math.max(maxArea, Math.abs(v / q(p)));
    if (Math.abs(p.yawRad) >= 2 * RAD)
      slopeArea = Math.max(slopeArea, Math.abs(model[i]!.sideN / q(p) / Math.sin(p.yawRad)));
  }
  const zero = conv.points.filter((p) => p.values.side_N !== undefined && Math.abs(p.yawRad) <= 0.25 * RAD);
  if (zero.length === 0 || !(maxArea > 0)) return;
  const meanArea = zero.reduce((s, p) => s + p.values.side_N! / q(p), 0) / zero.length;
  const meanN = zero.reduce((s, p) => s + p.values.side_N!, 0) / zero.length;
  // Above both 5% of the largest measured (per dynamic pressure) and half a degree's worth of the model's slope.
  const threshold = Math.max(0.05 * maxArea, slopeArea * Math.sin(0.5 * RAD));
  if (!(Math.abs(meanArea) > threshold)) return;
  const oneSided = caseFile.wheel.cover.sides === 1 && caseFile.wheel.cover.fraction > 0;
  const offsetDeg =
    slopeArea > 0 ? Math.asin(Math.max(-1, Math.min(1, meanArea / slopeArea))) / RAD : Number.NaN;
  flags.push({
    code: 'side_force_at_zero_yaw',
    output: 'side_N',
    message:
      `the side force at zero yaw averages ${fmt(meanN)} N (${fmt((100 * Math.abs(meanArea)) / maxArea, 2)}% of the largest measured, at equal dynamic pressure), where a symmetric wheel makes none. ` +
      (Number.isFinite(offsetDeg)
        ? `It is what a yaw offset of about ${fmt(offsetDeg, 2)} deg would give; `
        : '') +
      'check the turntable zero, the balance tare, or the yaw sign convention' +
      (oneSided ? ' (this wheel has a one-sided cover, so a small side force at zero yaw may be real)' : '') +
      '.',
  });
}

function speedFlags(conv: ConvertedData, model: readonly PointResult[], flags: SlipFlag[]): void {
  const groups = new Map<string, number[]>();
  conv.points.forEach((p, i) => {
    const key = (p.yawRad / RAD).toFixed(1);
    const g = groups.get(key);
    if (g) g.push(i);
    else groups.set(key, [i]);
  });
  for (const out of ['axial_N', 'wind_drag_N', 'side_N'] as const) {
    if (!conv.outputs.includes(out)) continue;
    const nData: number[] = [];
    const nModel: number[] = [];
    let vLo = Number.POSITIVE_INFINITY;
    let vHi = 0;
    for (const [key, idx] of groups) {
      if (out === 'side_N' && Math.abs(Number(key)) < 2) continue;
      const with_ = idx.filter((i) => conv.points[i]!.values[out] !== undefined);
      if (with_.length < 2) continue;
      with_.sort((a, b) => conv.points[a]!.airspeedMps - conv.points[b]!.airspeedMps);
      const lo = with_[0]!;
      const hi = with_[with_.length - 1]!;
      const pl = conv.points[lo]!;
      const ph = conv.points[hi]!;
      if (!(ph.airspeedMps > 1.1 * pl.airspeedMps)) continue;
      const dl = pl.values[out]!;
      const dh = ph.values[out]!;
      const ml = modelValue(model[lo]!, out);
      const mh = modelValue(model[hi]!, out);
      if (!(dl * dh > 0 && ml * mh > 0)) continue;
      const lnV = Math.log(ph.airspeedMps / pl.airspeedMps);
      // Exponent of V after removing the density difference (forces scale with rho V^2).
      const lnRho = Math.log(ph.rhoKgPerM3 / pl.rhoKgPerM3);
      nData.push((Math.log(dh / dl) - lnRho) / lnV);
      nModel.push((Math.log(mh / ml) - lnRho) / lnV);
      vLo = Math.min(vLo, pl.airspeedMps);
      vHi = Math.max(vHi, ph.airspeedMps);
    }
    if (nData.length === 0) continue;
    const med = (a: number[]) => [...a].sort((x, y) => x - y)[Math.floor(a.length / 2)]!;
    const nd = med(nData);
    const nm = med(nModel);
    if (Math.abs(nd - nm) <= 0.4) continue;
    flags.push({
      code: 'dynamic_pressure_scaling',
      output: out,
      message:
        `between ${fmt(vLo)} and ${fmt(vHi)} m/s the measured ${OUTPUT_LABEL[out]} grows as V^${fmt(nd, 2)} at equal yaw, the model's as V^${fmt(nm, 2)}: ` +
        'forces should scale with dynamic pressure (about V^2). Check the speed column and its unit, the density of each run, or a load-cell offset (tare).',
    });
  }
}

/**
 * Yaw symmetry, from the data alone: at +b and -b (same airspeed) a symmetric wheel's side force is
 * antisymmetric, S(-b) = -S(b). Writing S = odd + even over each pair, a yaw offset d gives
 * even / odd = tan(d) / tan(b) (S ~ k sin(b + d)); unsigned yaw angles give an even part as large as
 * the odd one (a side force whose sign was lost). Flagged when the even part exceeds a fifth of the odd part over the pairs: common
 * practice, no source.
 */
function symmetryFlags(conv: ConvertedData, caseFile: CaseFile, flags: SlipFlag[]): void {
  if (!conv.outputs.includes('side_N')) return;
  const pts = conv.points.filter((p) => p.values.side_N !== undefined && Math.abs(p.yawRad) >= 2 * RAD);
  let even = 0;
  let odd = 0;
  let pairs = 0;
  const offsets: number[] = [];
  for (const a of pts) {
    if (a.yawRad <= 0) continue;
    const b = pts.find(
      (x) => Math.abs(x.yawRad + a.yawRad) < 0.05 * RAD && Math.abs(x.airspeedMps / a.airspeedMps - 1) < 0.01,
    );
    if (!b) continue;
    // Per dynamic pressure, so a small speed difference within the pair does not count as asymmetry.
    const sa = a.values.side_N! / (a.rhoKgPerM3 * a.airspeedMps * a.airspeedMps);
    const sb = b.values.side_N! / (b.rhoKgPerM3 * b.airspeedMps * b.airspeedMps);
    const e = 0.5 * (sa + sb);
    const o = 0.5 * (sa - sb);
    even += Math.abs(e);
    odd += Math.abs(o);
    pairs++;
    if (o !== 0) offsets.push(Math.atan((e / o) * Math.tan(a.yawRad)) / RAD);
  }
  if (pairs === 0 || !(even > 0.2 * odd)) return;
  const oneSided = caseFile.wheel.cover.sides === 1 && caseFile.wheel.cover.fraction > 0;
  const offset = median(offsets);
  const unsigned = even > 0.8 * odd;
  flags.push({
    code: 'yaw_symmetry',
    output: 'side_N',
    message:
      `over ${pairs} pair(s) of points at +yaw and -yaw the side force is far from antisymmetric (its symmetric part is ${fmt((100 * even) / Math.max(odd, Number.MIN_VALUE), 2)}% of its antisymmetric part), where a symmetric wheel gives S(-yaw) = -S(yaw). ` +
      (unsigned
        ? 'The side force has nearly the same value at +yaw and -yaw: the column may hold magnitudes (its sign lost), or the yaw sign may be lost. '
        : `It is what a yaw offset of about ${fmt(offset, 2)} deg would give. `) +
      'Check the turntable zero, the yaw sign, and the balance tare' +
      (oneSided ? ' (this wheel has a one-sided cover, so some asymmetry may be real)' : '') +
      '.',
  });
}

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
