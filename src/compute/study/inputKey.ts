import type { WheelInput } from '../../model/wheel';

/** The exact text of a model input: every float64 in its shortest round-trip form, -0 and non-finite
 * numbers spelt out (JSON would write -0 as 0 and NaN or Infinity as null). */
export function inputKey(input: WheelInput): string {
  return JSON.stringify(input, (_key, value: unknown) =>
    typeof value === 'number' && (Object.is(value, -0) || !Number.isFinite(value))
      ? `#${Object.is(value, -0) ? '-0' : String(value)}`
      : value,
  );
}
