/**
 * What the page computes for one state, as lists of model inputs (pure; no workers here):
 *  1. the current design exactly as its case file says (what `coversweep solve` computes);
 *  2. the family: the same wheel at several covering fractions over the case's yaw angles;
 *  3. axial drag vs covering fraction (0..1 in tenths) at the chosen yaws and speeds;
 *  4. the design map: covering fraction (0..1 in tenths) x rim depth at one yaw and the main airspeed;
 *  5. with a pinned baseline, the baseline wheel at the same conditions as 1, 3 and 4.
 * The sweeps 2-5 skip the lattice's grid-convergence refinements (it changes no value, only adds the
 * uncertainty estimate, which the page shows for the current design).
 */
import { type CaseFile, caseToModelInput } from '../compute/caseFile';
import type { FlowConditions, WheelInput } from '../compute/model';
import { degToRad } from '../compute/units';
import type { ViewState } from './viewState';

export const SWEEP_FRACTIONS: readonly number[] = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1];
export const MAP_DEPTH_COUNT = 6;

export interface ComputePlan {
  current: WheelInput;
  family: { fractions: number[]; inputs: WheelInput[] };
  cover: { fractions: readonly number[]; speedsMps: number[]; yawsDeg: number[]; inputs: WheelInput[] };
  map: { fractions: readonly number[]; depthsM: number[]; yawDeg: number; inputs: WheelInput[] };
  baseline: {
    curve: WheelInput;
    cover: WheelInput;
    map: WheelInput;
  } | null;
  /** Notes on choices the plan made (shown with the plots). */
  notes: string[];
}

/** The airspeeds of the "drag vs cover" plot: the case's first airspeed, then the extra ones. */
export function coverPlotSpeeds(c: CaseFile, view: ViewState): number[] {
  const main = c.conditions.airspeed_mps[0]!;
  const out = [main];
  for (const s of view.coverPlotSpeedsMps) if (!out.some((x) => Math.abs(x - s) < 1e-9)) out.push(s);
  return out;
}

/** Rim depths of the design map: from the shallowest the rim model accepts to the chosen deepest that fits. */
export function mapDepths(c: CaseFile, view: ViewState): number[] {
  const w = c.wheel;
  // The rim section's chord (tyre width + rim depth) must exceed its thickness (max of tyre and rim width).
  const minDepth = Math.max(0.01, Math.max(w.tyre_width_m, w.rim_width_m) - w.tyre_width_m + 0.002);
  const fits = w.outer_radius_m - w.tyre_width_m - w.hub_flange_radius_m - 0.02;
  const maxDepth = Math.max(minDepth + 0.005, Math.min(view.mapMaxRimDepthM, fits));
  const out: number[] = [];
  for (let i = 0; i < MAP_DEPTH_COUNT; i++) {
    out.push(Number((minDepth + ((maxDepth - minDepth) * i) / (MAP_DEPTH_COUNT - 1)).toFixed(4)));
  }
  return out;
}

function pointsAt(base: WheelInput, c: CaseFile, speedsMps: readonly number[], yawsDeg: readonly number[]) {
  const template = base.points[0]!;
  const main = c.conditions.airspeed_mps[0]!;
  const given = c.conditions.ground_speed_mps;
  const points: FlowConditions[] = [];
  for (const v of speedsMps) {
    for (const yaw of yawsDeg) {
      points.push({
        airspeedMps: v,
        yawRad: degToRad(yaw),
        // Tunnel convention unless a ground speed is given; then keep its ratio to the airspeed.
        groundSpeedMps: given === null ? v : (given * v) / main,
        rhoKgPerM3: template.rhoKgPerM3,
        muPaS: template.muPaS,
      });
    }
  }
  return points;
}

function variant(
  base: WheelInput,
  wheel: Partial<WheelInput['wheel']>,
  points: FlowConditions[],
): WheelInput {
  return {
    wheel: { ...base.wheel, ...wheel },
    options: { ...base.options, gridConvergence: false },
    steering: { ...base.steering },
    points,
  };
}

export function computePlan(c: CaseFile, view: ViewState, baseline: CaseFile | null): ComputePlan {
  const current = caseToModelInput(c);
  const notes: string[] = [];
  const main = c.conditions.airspeed_mps[0]!;
  const curveYaws = c.conditions.yaw_deg;
  const placement = current.wheel.coverPlacement === 'explicit' ? 'rim' : current.wheel.coverPlacement;
  if (current.wheel.coverPlacement === 'explicit') {
    notes.push(
      'The design uses explicit cover radii; the covering-fraction sweeps place covers next to the rim.',
    );
  }
  const mainPoints = pointsAt(current, c, [main], curveYaws);
  const familyFractions = [...view.familyFractions];
  const family = familyFractions.map((f) =>
    variant(current, { coverFraction: f, coverPlacement: placement }, mainPoints),
  );
  const speedsMps = coverPlotSpeeds(c, view);
  const yawsDeg = [...view.coverPlotYawsDeg];
  const coverPoints = pointsAt(current, c, speedsMps, yawsDeg);
  const cover = SWEEP_FRACTIONS.map((f) =>
    variant(current, { coverFraction: f, coverPlacement: placement }, coverPoints),
  );
  const depthsM = mapDepths(c, view);
  const mapPoints = pointsAt(current, c, [main], [view.mapYawDeg]);
  const map: WheelInput[] = [];
  for (const d of depthsM) {
    for (const f of SWEEP_FRACTIONS) {
      map.push(variant(current, { coverFraction: f, coverPlacement: placement, rimDepthM: d }, mapPoints));
    }
  }
  let base: ComputePlan['baseline'] = null;
  if (baseline) {
    // The baseline wheel (its geometry, steering and model options) at the current design's conditions.
    const b = caseToModelInput({ ...baseline, conditions: c.conditions });
    base = {
      curve: variant(b, {}, pointsAt(b, c, [main], curveYaws)),
      cover: variant(b, {}, pointsAt(b, c, speedsMps, yawsDeg)),
      map: variant(b, {}, pointsAt(b, c, [main], [view.mapYawDeg])),
    };
  }
  return {
    current,
    family: { fractions: familyFractions, inputs: family },
    cover: { fractions: SWEEP_FRACTIONS, speedsMps, yawsDeg, inputs: cover },
    map: { fractions: SWEEP_FRACTIONS, depthsM, yawDeg: view.mapYawDeg, inputs: map },
    baseline: base,
    notes,
  };
}
