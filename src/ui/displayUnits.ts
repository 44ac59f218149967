/**
 * Display units: the page shows SI model results in the units the user chose. Forces in newtons, or in
 * grams-force at the case's reference speed (the force coefficient times the dynamic pressure at the
 * reference speed, the trade's "grams at 50 km/h"; for the axial drag this is exactly the command
 * line's axial_gf_ref). Drag area in m^2 or cm^2. Lengths of wheel parts in mm. Moments N m, power W.
 */

import type { PointResult } from '../compute/study/modelResults';
import { kmhToMps, mphToMps, mpsToKmh, mpsToMph, newtonsToGramsForce } from '../compute/units';
import type { OutputKind } from './outputs';
import type { AreaUnit, ForceUnit, SpeedUnit } from './viewState';

export interface DisplayUnits {
  speed: SpeedUnit;
  force: ForceUnit;
  area: AreaUnit;
  /** Reference speed for grams-force (m/s). */
  referenceSpeedMps: number;
}

export function speedFromMps(mps: number, unit: SpeedUnit): number {
  return unit === 'kmh' ? mpsToKmh(mps) : mpsToMph(mps);
}

export function speedToMps(value: number, unit: SpeedUnit): number {
  return unit === 'kmh' ? kmhToMps(value) : mphToMps(value);
}

export function speedUnitText(unit: SpeedUnit): string {
  return unit === 'kmh' ? 'km/h' : 'mph';
}

/** "13.4 m/s (48.2 km/h)" */
export function speedText(mps: number, unit: SpeedUnit): string {
  return `${fmt(mps, 3)} m/s (${fmt(speedFromMps(mps, unit), 3)} ${speedUnitText(unit)})`;
}

/** Unit text for a kind of output under the chosen display units. */
export function unitText(kind: OutputKind, u: DisplayUnits): string {
  switch (kind) {
    case 'force':
      return u.force === 'N'
        ? 'N'
        : `gf at ${fmt(speedFromMps(u.referenceSpeedMps, u.speed), 3)} ${speedUnitText(u.speed)}`;
    case 'moment':
      return 'N m';
    case 'power':
      return 'W';
    case 'length':
      return 'mm';
    case 'area':
      return u.area === 'm2' ? 'm²' : 'cm²';
  }
}

/** A short unit for table headers and CSV columns. */
export function unitShort(kind: OutputKind, u: DisplayUnits): string {
  if (kind === 'force' && u.force === 'gf') return 'gf@ref';
  return unitText(kind, u);
}

/**
 * Convert an SI model value of `kind` at point p to display units. Forces in gf are scaled from the
 * point's dynamic pressure to the reference speed's (same density).
 */
export function toDisplay(valueSi: number, kind: OutputKind, u: DisplayUnits, p: PointResult): number {
  switch (kind) {
    case 'force': {
      if (u.force === 'N') return valueSi;
      const scale = (u.referenceSpeedMps * u.referenceSpeedMps) / (p.airspeedMps * p.airspeedMps);
      return newtonsToGramsForce(valueSi * scale);
    }
    case 'length':
      return valueSi * 1000;
    case 'area':
      return u.area === 'm2' ? valueSi : valueSi * 1e4;
    default:
      return valueSi;
  }
}

/** Decimal places that suit a kind of output in its display unit. */
export function decimalsFor(kind: OutputKind, u: DisplayUnits): number {
  switch (kind) {
    case 'force':
      return u.force === 'N' ? 3 : 1;
    case 'moment':
      return 4;
    case 'power':
      return 2;
    case 'length':
      return 1;
    case 'area':
      return u.area === 'm2' ? 5 : 2;
  }
}

/** A number with `digits` significant figures, trimmed; em dash for non-finite values. */
export function fmt(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const s = Number(x.toPrecision(digits));
  return String(s);
}

/** Fixed decimals; em dash for non-finite values. */
export function fixed(x: number, decimals: number): string {
  if (!Number.isFinite(x)) return '—';
  const s = x.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}
