import type { ReferenceBand } from './types';

/** A number for a table: `digits` significant digits (default 5), no trailing zeros. */
export function formatNumber(x: number, digits = 5): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e6) return String(Number(x.toPrecision(digits)));
  return x.toExponential(digits - 1).replace(/\.?0+e/, 'e');
}

/** Both ends of a band with as many digits as it takes to tell them apart (5 to 12). */
function bandEnds(low: number, high: number): [string, string] {
  for (let digits = 5; digits < 12; digits++) {
    const ends: [string, string] = [formatNumber(low, digits), formatNumber(high, digits)];
    if (ends[0] !== ends[1]) return ends;
  }
  return [formatNumber(low, 12), formatNumber(high, 12)];
}

/** A band in words: "130 .. 250", "> 0", ">= 0.95", "< 1.83", "0 < x < 1". */
export function bandText(band: ReferenceBand): string {
  const { low, high } = band;
  if (low !== null && high !== null) {
    const [lo, hi] = bandEnds(low, high);
    if (!band.lowOpen && !band.highOpen) return `${lo} .. ${hi}`;
    return `${lo} ${band.lowOpen ? '<' : '<='} x ${band.highOpen ? '<' : '<='} ${hi}`;
  }
  if (low !== null) return `${band.lowOpen ? '>' : '>='} ${formatNumber(low)}`;
  if (high !== null) return `${band.highOpen ? '<' : '<='} ${formatNumber(high)}`;
  return 'any';
}

/** A value's text with its unit ("-" for a pure number prints none). */
export function withUnit(text: string, unit: string): string {
  return unit === '-' || unit === '' ? text : `${text} ${unit}`;
}
