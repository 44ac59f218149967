/**
 * What the page has solved for one state: its studies (src/compute/study/pageStudies) and their results,
 * each a named-axis cube. Views read points by axis name through the helpers here; a case that has not
 * landed yet, or failed, reads as null.
 */
import type { CaseFile } from '../../compute/caseFile';
import { axisNumbers } from '../../compute/study/axes';
import type { PointResult } from '../../compute/study/modelResults';
import type { PageStudies } from '../../compute/study/pageStudies';
import type { AxisPick, ResultCube } from '../../compute/study/resultCube';
import { caseCell, type StudyResult } from '../../compute/study/runStudies';
import type { StudyPlan } from '../../compute/study/studyPlan';

export interface OtherBaseline {
  /** Place in pinnedBaselines (its colour and number). */
  index: number;
  case: CaseFile;
  plan: StudyPlan;
  curve: StudyResult | null;
}

export interface PageResults {
  studies: PageStudies;
  /** The current design: axes airspeed x yaw. */
  current: ResultCube | null;
  family: StudyResult | null;
  cover: StudyResult | null;
  map: StudyResult | null;
  baseline: { curve: StudyResult | null; cover: StudyResult | null; map: StudyResult | null } | null;
  /** The other pinned baselines' yaw curves (not the reference), by their place among the pinned. */
  otherBaselines?: OtherBaseline[];
  rhoKgPerM3: number;
}

/** The points of one solved case over its point axes (row-major), or null if it has not been solved. */
export function casePoints(r: StudyResult | null, at: AxisPick = {}): PointResult[] | null {
  if (!r?.cube) return null;
  const k = caseCell(r.plan, at);
  if (r.landed[k] !== 1 || r.errors[k] !== null) return null;
  return r.cube.pick(at).points();
}

/** The current design's points at its first (main) airspeed, over its yaw angles. */
export function mainPoints(r: PageResults): PointResult[] {
  return r.current ? r.current.pick({ airspeed: 0 }).points() : [];
}

/** Every point of the current design: airspeeds x yaw angles, airspeed outer. */
export function allPoints(r: PageResults): PointResult[] {
  return r.current ? r.current.points() : [];
}

/** A study's numeric axis values, by axis name. */
export function axisOf(plan: StudyPlan, name: string): number[] {
  const a = [...plan.caseAxes, ...plan.pointAxes].find((x) => x.name === name);
  if (!a) throw new RangeError(`axis "${name}" is not an axis of the study ${plan.name}`);
  return axisNumbers(a);
}

/** One solved point, every axis picked by name (case axes and point axes), or null if not solved. */
export function pointAt(r: StudyResult | null, at: AxisPick): PointResult | null {
  if (!r?.cube) return null;
  const caseAt: Record<string, number> = {};
  for (const a of r.plan.caseAxes) caseAt[a.name] = at[a.name]!;
  const k = caseCell(r.plan, caseAt);
  if (r.landed[k] !== 1 || r.errors[k] !== null) return null;
  return r.cube.pick(at).points()[0] ?? null;
}
