/**
 * Plain-text tables for `--format table`: columns padded to their widest cell (numbers right-aligned,
 * text left-aligned), numbers shown to a few significant digits through displayNumber (so a converted
 * round input reads back round), null and non-finite values as "-". The JSON documents stay the default
 * and keep every digit.
 */
import { displayNumber } from '../compute/displayNumber';
import { CliInputError } from './io';

export type OutputFormat = 'json' | 'table';

/** The --format option's value: json (the default) or table. */
export function outputFormat(text: string | undefined): OutputFormat {
  if (text === undefined || text === 'json') return 'json';
  if (text === 'table') return 'table';
  throw new CliInputError(`--format ${text}: must be json or table`);
}

/** A number to `digits` significant digits ("-" for null, NaN or an infinity), without trailing zeros. */
export function num(x: number | null | undefined, digits = 4): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return '-';
  return String(displayNumber(x, digits));
}

/** A number with a fixed count of decimals ("-" when missing). */
export function fixed(x: number | null | undefined, decimals: number): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return '-';
  const t = x.toFixed(decimals);
  return /^-0\.?0*$/.test(t) ? t.slice(1) : t;
}

const NUMERIC = /^[-+]?(\d|\.\d)|^-$/;

/** Render rows under a header (and an optional units row) as aligned columns, two spaces apart. */
export function table(
  header: readonly string[],
  rows: readonly (readonly string[])[],
  units?: readonly string[],
): string {
  const all = units ? [header, units, ...rows] : [header, ...rows];
  const widths = header.map((_, j) => Math.max(...all.map((r) => (r[j] ?? '').length)));
  const right = header.map((_, j) => rows.length > 0 && rows.every((r) => NUMERIC.test(r[j] ?? '')));
  const line = (r: readonly string[]) =>
    r
      .map((c, j) => (right[j] ? c.padStart(widths[j]!) : c.padEnd(widths[j]!)))
      .join('  ')
      .trimEnd();
  return `${all.map(line).join('\n')}\n`;
}

/** Paragraphs as an indented list, wrapped at about `width` characters. */
export function bullets(items: readonly string[], width = 100): string {
  let out = '';
  for (const item of items) {
    let lineText = '  -';
    for (const word of item.split(/\s+/)) {
      if (lineText.length + word.length + 1 > width && lineText.trim() !== '-') {
        out += `${lineText}\n`;
        lineText = '   ';
      }
      lineText += ` ${word}`;
    }
    out += `${lineText}\n`;
  }
  return out;
}
