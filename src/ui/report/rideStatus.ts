/**
 * Whether the road panel's last evaluated ride belongs to the design on the page now: its ride file
 * (design wheel, baseline wheel, rider, weather, course) must equal, key for key, the ride the page's
 * state defines. A ride of another design or other road inputs is not printed as this design's.
 */
import type { Parsed } from '../../compute/caseFile';
import type { RideDocument, RideFile } from '../../compute/ride/index';

export type RideStatus =
  | { kind: 'current'; document: RideDocument }
  | { kind: 'none' | 'stale' | 'invalid'; reason: string };

export function rideStatus(last: RideDocument | null, now: Parsed<RideFile>): RideStatus {
  if (!now.ok) {
    return {
      kind: 'invalid',
      reason: `No ride figures: the "On the road" inputs are not valid (${now.errors.join('; ')}).`,
    };
  }
  if (last === null) {
    return {
      kind: 'none',
      reason:
        'No ride was evaluated for this design: open "On the road" to compute the ride and handling figures, then print again.',
    };
  }
  if (JSON.stringify(last.ride) !== JSON.stringify(now.value)) {
    return {
      kind: 'stale',
      reason:
        'No ride figures: the last ride evaluated on "On the road" was for another design or other road inputs. Open "On the road" to evaluate this one, then print again.',
    };
  }
  return { kind: 'current', document: last };
}
