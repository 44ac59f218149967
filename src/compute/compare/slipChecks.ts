/**
 * The slip checks that need the data alone or the model's shape, not its level: side-force sign, axes,
 * zero yaw, speed scaling and yaw symmetry (see detectSlips.ts for the method).
 */

import type { PointResult } from '../../model/wheel/index';
import type { CaseFile } from '../caseFile';
import type { ConvertedData, DataPoint } from './convertData';
import { modelValue } from './modelAtData';
import { OUTPUT_LABEL, type Output } from './quantities';
import {
  candidatesFor,
  envelopeMiss,
  FORCE_OUTPUTS,
  median,
  ownCoefficient,
  pairs,
  scaleFit,
} from './slipFactors';
import {
  fmt,
  MIN_FACTOR,
  MODEL_SPREAD,
  PHYSICAL_ENVELOPE,
  RAD,
  SLIP_TOLERANCE,
  type SlipFlag,
  type SlipLabels,
} from './slipTypes';

/** The side force against yaw, from the data alone: it must rise with yaw whatever the wheel. */
export function signFlags(conv: ConvertedData, flags: SlipFlag[], labels: SlipLabels): void {
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

export function factorFlags(
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

export function axisFlags(conv: ConvertedData, model: readonly PointResult[], flags: SlipFlag[]): void {
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

export function zeroYawFlags(
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

export function speedFlags(conv: ConvertedData, model: readonly PointResult[], flags: SlipFlag[]): void {
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
export function symmetryFlags(conv: ConvertedData, caseFile: CaseFile, flags: SlipFlag[]): void {
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
