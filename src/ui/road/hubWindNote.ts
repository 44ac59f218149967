/**
 * What a wind figure of the road form becomes at the hub: the ride takes the wind at a station height
 * and reduces it to the hub's height by the logarithmic wind profile (logWindProfileRatio, through
 * src/compute), so "3 m/s" on the form is said to be, e.g., 1.3 m/s where the wheel meets it.
 */
import { logWindProfileRatio } from '../../compute/model';
import type { RoadState } from '../roadState';
import type { RoadContext } from './roadContext';

const fix = (x: number, d: number) => Number(x.toFixed(d)).toString();

/** The note under a wind figure (`speedMps` read from the form), for the form's current inputs. */
export function hubWindNote(speedMps: (r: RoadState) => number, what: string) {
  return (r: RoadState, ctx: RoadContext | null): string => {
    const zRef = r.wind.reference_height_m;
    const z0 = r.wind.roughness_length_m;
    const at = `Taken at the station height, ${fix(zRef, 2)} m`;
    const hub = ctx?.hubHeightM;
    if (hub === undefined) return `${at}; the ride reduces it to the hub's height by the log wind profile.`;
    let ratio: number;
    try {
      ratio = logWindProfileRatio(hub, zRef, z0);
    } catch {
      return `${at}; it cannot be taken to the hub (${fix(hub, 3)} m) until both heights exceed the roughness length.`;
    }
    const v = speedMps(r);
    const figure = Number.isFinite(v)
      ? `: ${what} ${fix(v, 2)} m/s is ${fix(v * ratio, 2)} m/s at the wheel`
      : '';
    return `${at}. At the hub, ${fix(hub, 3)} m up, it is × ${fix(ratio, 2)} (log wind profile, roughness ${fix(z0, 3)} m)${figure}.`;
  };
}
