import type { CaseFile } from '../caseFile';

/** Covering fractions of the cover sweep and the design map: 0..1 in tenths. */
export const SWEEP_FRACTIONS: readonly number[] = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1];
export const MAP_DEPTH_COUNT = 6;

/** The design-space choices of the page (its view state has them; any object with them will do). */
export interface DesignSpaceChoice {
  /** Covering fractions drawn as the family on the yaw plots. */
  familyFractions: readonly number[];
  /** Yaw angles (deg) and extra airspeeds (m/s) of the cover sweep. */
  coverPlotYawsDeg: readonly number[];
  coverPlotSpeedsMps: readonly number[];
  /** The design map's yaw angle (deg) and deepest rim (m). */
  mapYawDeg: number;
  mapMaxRimDepthM: number;
}

/** The airspeeds of the cover sweep: the case's first airspeed, then the extra ones. */
export function coverPlotSpeeds(c: CaseFile, choice: DesignSpaceChoice): number[] {
  const main = c.conditions.airspeed_mps[0]!;
  const out = [main];
  for (const s of choice.coverPlotSpeedsMps) if (!out.some((x) => Math.abs(x - s) < 1e-9)) out.push(s);
  return out;
}

/** Rim depths of the design map: from the shallowest the rim model accepts to the chosen deepest that fits. */
export function mapDepths(c: CaseFile, choice: DesignSpaceChoice): number[] {
  const w = c.wheel;
  // The rim section's chord (tyre width + rim depth) must exceed its thickness (max of tyre and rim width).
  const minDepth = Math.max(0.01, Math.max(w.tyre_width_m, w.rim_width_m) - w.tyre_width_m + 0.002);
  const fits = w.outer_radius_m - w.tyre_width_m - w.hub_flange_radius_m - 0.02;
  const maxDepth = Math.max(minDepth + 0.005, Math.min(choice.mapMaxRimDepthM, fits));
  const out: number[] = [];
  for (let i = 0; i < MAP_DEPTH_COUNT; i++) {
    out.push(Number((minDepth + ((maxDepth - minDepth) * i) / (MAP_DEPTH_COUNT - 1)).toFixed(4)));
  }
  return out;
}
