/** A control's label split into its name and its unit ("Rim depth, mm" -> "Rim depth", "mm"). */
export function labelParts(label: string): { name: string; unit: string } {
  const k = label.lastIndexOf(', ');
  if (k < 0) return { name: label, unit: '' };
  return { name: label.slice(0, k), unit: label.slice(k + 2) };
}

/** Units written after a number ("200 mm"); a label's "0–1" or "× rule" is not one. */
const NUMBER_UNITS = /^(mm|m|deg|°C|hPa|%|kg\/m³|km\/h|mph|m\/s)$/;

/** A number with its label's unit, as a rule speaks it ("200 mm", "0.25 deg", "1"). */
export function withUnit(x: number, unit: string): string {
  return NUMBER_UNITS.test(unit) ? `${x} ${unit}` : String(x);
}
