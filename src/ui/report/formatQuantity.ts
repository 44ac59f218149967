/**
 * One number of the report with its unit: fixed decimals, "-0.000" read as "0.000", and a non-finite
 * value (a quantity the model leaves undefined, e.g. the centre of pressure without side force) as
 * "n/a" so the report never prints a made-up figure. Common practice, no source.
 */
export function formatQuantity(value: number, decimals: number, unit: string): string {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 12) {
    throw new RangeError(`formatQuantity: decimals must be an integer 0..12, got ${decimals}`);
  }
  if (!Number.isFinite(value)) return 'n/a';
  let text = value.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (unit === '') return text;
  // SI brochure 5.4.3: a space before every unit symbol except the plane-angle degree, minute and second.
  return unit === '°' ? `${text}°` : `${text} ${unit}`;
}
