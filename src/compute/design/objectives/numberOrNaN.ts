/** A ride document's number, or NaN where the document has null (not computable on this ride). */
export function numberOrNaN(value: number | null | undefined): number {
  return value ?? Number.NaN;
}

/** Every ride: the objective applies. */
export const ALWAYS = (): null => null;
