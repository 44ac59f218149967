import type { ReferenceBand } from './types';

/** Whether a value lies in a reference band (NaN never does). */
export function inBand(value: number, band: ReferenceBand): boolean {
  if (Number.isNaN(value)) return false;
  if (band.low !== null && (band.lowOpen ? value <= band.low : value < band.low)) return false;
  if (band.high !== null && (band.highOpen ? value >= band.high : value > band.high)) return false;
  return true;
}
