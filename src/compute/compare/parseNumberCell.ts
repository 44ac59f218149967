/**
 * A cell as a number. Accepts optional spaces, a sign, exponent, and (when `decimalComma`) a comma as
 * the decimal separator. Returns null for an empty cell and NaN for text that is not a number.
 */
export function parseNumberCell(cell: string, decimalComma: boolean): number | null {
  let t = cell.trim();
  if (t === '') return null;
  if (decimalComma && /^[+-]?\d*,\d+([eE][+-]?\d+)?$/.test(t)) t = t.replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return Number.NaN;
  return Number(t);
}
