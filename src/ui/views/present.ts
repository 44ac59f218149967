/**
 * How a view shows a number: the state's display units, the difference mode against a pinned baseline,
 * axis labels and condition texts. Pure functions of the state; every view uses them alike.
 */

import type { PointResult } from '../../compute/study/modelResults';
import { kmhToMps } from '../../compute/units';
import type { AppState } from '../appState';
import { type DisplayUnits, fmt, speedFromMps, speedUnitText, toDisplay, unitText } from '../displayUnits';
import type { OutputSpec } from '../outputs';
import type { DifferenceMode } from '../viewState';
import { casePoints, type PageResults } from './pageResults';

export interface Present {
  state: AppState;
  units: DisplayUnits;
  /** The difference mode in force: 'none' unless a baseline is pinned and solved. */
  mode: DifferenceMode;
  /** The reference baseline's yaw curve (the scale of the percent floor), when solved. */
  referenceCurve: PointResult[] | null;
}

/**
 * A percent difference is left empty where the reference's value is smaller in magnitude than this
 * fraction of the largest magnitude on its yaw curve: near a zero crossing of the reference (axial drag
 * turns negative at yaw for covered wheels) the ratio grows without bound and reads as nonsense
 * (thousands of percent). Common practice, no source: 5 % keeps every point whose reference is a
 * clear, non-vanishing share of its own range.
 */
export const PERCENT_FLOOR_FRACTION = 0.05;

/** Below this |reference| (SI) a percent difference of `spec` is left empty (see PERCENT_FLOOR_FRACTION). */
export function percentFloor(ctx: Present, spec: OutputSpec, b: PointResult): number {
  let largest = Math.abs(spec.get(b));
  for (const p of ctx.referenceCurve ?? []) {
    const v = Math.abs(spec.get(p));
    if (Number.isFinite(v) && v > largest) largest = v;
  }
  return PERCENT_FLOOR_FRACTION * largest;
}

export function presentOf(state: AppState, results: PageResults | null): Present {
  const v = state.view;
  return {
    state,
    units: {
      speed: v.speedUnit,
      force: v.forceUnit,
      area: v.areaUnit,
      referenceSpeedMps: kmhToMps(state.case.conditions.reference_speed_kmh),
    },
    mode: state.baseline && results?.baseline ? v.difference : 'none',
    referenceCurve: results?.baseline ? casePoints(results.baseline.curve) : null,
  };
}

export function display(ctx: Present, spec: OutputSpec, p: PointResult): number {
  return toDisplay(spec.get(p), spec.kind, ctx.units, p);
}

/** A value, or its difference from the baseline point under the difference mode. */
export function compared(
  ctx: Present,
  spec: OutputSpec,
  p: PointResult,
  b: PointResult | undefined,
  mode: DifferenceMode,
): number {
  if (mode === 'none' || !b) return display(ctx, spec, p);
  if (mode === 'force') return display(ctx, spec, p) - display(ctx, spec, b);
  if (mode === 'power') return p.powerW - b.powerW;
  const base = spec.get(b);
  if (!(Math.abs(base) >= percentFloor(ctx, spec, b)) || base === 0) return Number.NaN;
  return (100 * (spec.get(p) - base)) / Math.abs(base);
}

export function comparedLabel(ctx: Present, spec: OutputSpec, mode: DifferenceMode): string {
  const unit = unitText(spec.kind, ctx.units);
  const name = spec.short ?? spec.label;
  if (mode === 'force') return `${name} − reference, ${unit}`;
  if (mode === 'power') return 'Power − reference, W';
  if (mode === 'percent') return `${name} vs reference, %`;
  return `${spec.label}, ${unit}`;
}

export function conditionsText(ctx: Present, speedMps: number, rho: number, short = false): string {
  const u = ctx.state.view.speedUnit;
  if (short) return `${fmt(speedFromMps(speedMps, u), 3)} ${speedUnitText(u)}, ρ ${rho.toFixed(3)} kg/m³`;
  return `at ${fmt(speedFromMps(speedMps, u), 3)} ${speedUnitText(u)} (${fmt(speedMps, 3)} m/s), ρ ${rho.toFixed(3)} kg/m³`;
}

export function nullIfNaN(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

export function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (!el) throw new Error(`page element #${id} is missing`);
  return el as T;
}

export function setFigTitle(figureId: string, text: string): void {
  const el = byId(figureId).querySelector('.fig-title');
  if (el) el.textContent = text;
}

export function plotDiv(figureId: string): HTMLElement {
  return byId(figureId).querySelector<HTMLElement>('.plot')!;
}
