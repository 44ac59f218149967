/** Conversions and parsing shared by the page's controls (units, lists of numbers, yaw ranges). */
import type { CaseFile } from '../../compute/caseFile';
import { LIMITS } from '../../compute/caseFile';
import { speedFromMps, speedToMps, speedUnitText } from '../displayUnits';
import type { FieldContext, FieldValue } from './fieldTypes';
/** Round to 12 significant digits (removes unit-conversion noise such as 0.30000000000000004). */
export function clean(x: number): number {
  return Number.isFinite(x) ? Number(x.toPrecision(12)) : x;
}

/** Metres shown as millimetres, and back. */
export const mm = (m: number) => clean(m * 1000);
export const m = (mmValue: number) => clean(Number(mmValue) / 1000);

/** Parse "0, 0.25, 0.5" into numbers; throws Error naming the bad item. */
export function parseNumberList(text: string, what: string): number[] {
  const items = String(text)
    .split(/[,;\s]+/)
    .filter((s) => s !== '');
  return items.map((s) => {
    const x = Number(s);
    if (!Number.isFinite(x)) throw new Error(`${what}: "${s}" is not a number`);
    return x;
  });
}

export function listText(xs: readonly number[]): string {
  return xs.map((x) => String(clean(x))).join(', ');
}

/** Yaw list 0..max in steps (max always included). */
export function yawRange(maxDeg: number, stepDeg: number): number[] {
  if (!(stepDeg > 0)) throw new Error(`yaw step: must be greater than 0 deg, got ${stepDeg}`);
  if (!(maxDeg >= 0)) throw new Error(`yaw range: the largest yaw must be at least 0 deg, got ${maxDeg}`);
  const n = Math.floor(maxDeg / stepDeg + 1e-9);
  if (n + 1 > LIMITS.maxPointsPerCase) throw new Error(`yaw step: too many yaw angles (${n + 1})`);
  const out: number[] = [];
  for (let i = 0; i <= n; i++) out.push(clean(i * stepDeg));
  if (maxDeg - out[out.length - 1]! > 1e-9) out.push(clean(maxDeg));
  return out;
}

/** The step of a yaw list (1 deg for a single yaw). */
export function yawStep(yaws: readonly number[]): number {
  return yaws.length > 1 ? clean(yaws[1]! - yaws[0]!) : 1;
}

export type AirMode = 'pressure' | 'altitude' | 'density';
export function airMode(c: CaseFile): AirMode {
  if (c.conditions.air_density_kgpm3 !== undefined) return 'density';
  if (c.conditions.altitude_m !== undefined) return 'altitude';
  return 'pressure';
}

/** A speed as shown (3 decimals in the chosen unit). */
export const shownSpeed = (mps: number, ctx: FieldContext) =>
  clean(Number(speedFromMps(mps, ctx.view.speedUnit).toFixed(3)));
/** The speed (m/s) a shown value stands for: the current one when the shown value is unchanged. */
export const speedFromShown = (value: FieldValue, currentMps: number, ctx: FieldContext) =>
  Number(value) === shownSpeed(currentMps, ctx)
    ? currentMps
    : clean(speedToMps(Number(value), ctx.view.speedUnit));

/** The speed unit's text. */
export const sp = (ctx: FieldContext) => speedUnitText(ctx.view.speedUnit);
export const num = (v: FieldValue) => Number(v);
