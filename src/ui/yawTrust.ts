/**
 * The yaw range the model trusts (its validity flags, through src/compute), as the yaw plots shade it:
 * beyond it results are computed and flagged, never silently extrapolated.
 */
import { FLAG_MESSAGES, VALIDITY } from '../compute/model';

/** Largest |yaw| the model trusts, deg. */
export const TRUSTED_YAW_DEG = Number(((VALIDITY.maxYawRad * 180) / Math.PI).toFixed(6));

/** Why the band is shaded (hover text and the note under a plot). */
export const BEYOND_YAW_WHY = `Shaded: ${FLAG_MESSAGES.yaw_beyond_range ?? `yaw beyond ${TRUSTED_YAW_DEG} deg`}. Points there are computed and flagged in the tables; read them as a trend, not a figure.`;

/** The untrusted x intervals [from, to] within the plotted x range [lo, hi] (none when all is trusted). */
export function beyondYawIntervals(lo: number, hi: number): Array<[number, number]> {
  const t = TRUSTED_YAW_DEG;
  const out: Array<[number, number]> = [];
  if (hi > t) out.push([Math.max(lo, t), hi]);
  if (lo < -t) out.push([lo, Math.min(hi, -t)]);
  return out;
}
