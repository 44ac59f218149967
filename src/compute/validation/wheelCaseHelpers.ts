import type { ResultDocument, ResultRow } from '../caseFile';

/** The result row of a solved document at one yaw angle (deg) and, if the case has several, airspeed. */
export function pointAt(document: ResultDocument, yawDeg: number, airspeedMps?: number): ResultRow {
  const row = document.results.find(
    (r) =>
      r.yaw_deg !== null &&
      Math.abs(r.yaw_deg - yawDeg) < 1e-9 &&
      (airspeedMps === undefined ||
        (r.airspeed_mps !== null && Math.abs(r.airspeed_mps - airspeedMps) < 1e-9)),
  );
  if (!row) throw new Error(`no result at yaw ${yawDeg} deg${airspeedMps ? ` and ${airspeedMps} m/s` : ''}`);
  return row;
}

/** A number the result document must carry (null means the model produced no finite value). */
export function need(value: number | null, what: string): number {
  if (value === null) throw new Error(`the model gave no finite ${what}`);
  return value;
}
