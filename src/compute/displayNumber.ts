/**
 * A number as it should read back: rounded to `digits` significant decimal digits (default 12), so a
 * value that comes from a unit conversion of a round input reads back round (30 km/h -> 8.333333333333334
 * m/s -> 30.000000000000004 km/h -> 30). JavaScript prints a number as the shortest decimal that reads
 * back to the same double (ECMA-262, Number::toString), so the result prints as "30".
 *
 * Use it for values shown to people and for inputs echoed back in another unit; a model result written to
 * JSON keeps every bit (its last digits are the model's, not a conversion's). 12 digits keep any value a
 * user types (at most 12 significant digits) while dropping the 1e-16 relative error of one or two
 * multiplications or divisions by an exact unit factor.
 */
export const DISPLAY_DIGITS = 12;

export function displayNumber(x: number, digits = DISPLAY_DIGITS): number {
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 17)) {
    throw new RangeError(`digits must be an integer from 1 to 17, got ${digits}`);
  }
  if (!Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(digits));
}
