import { type CaseFile, caseToModelInput } from '../caseFile';
import { baselineInput, baselineStudy } from './baselineStudy';
import { coverFamilyStudy } from './coverFamilyStudy';
import { coverSweepStudy } from './coverSweepStudy';
import { currentDesignStudy } from './currentDesignStudy';
import { designMapStudy } from './designMapStudy';
import { coverPlotSpeeds, type DesignSpaceChoice, mapDepths, SWEEP_FRACTIONS } from './designSpace';
import type { StudyPlan } from './studyPlan';

/** Everything the page solves for one state. */
export interface PageStudies {
  /** The current design as its case file says, and (when that has grid convergence) a first pass
   * without it, whose numbers show at once. */
  current: StudyPlan;
  quick: StudyPlan | null;
  family: StudyPlan;
  cover: StudyPlan;
  map: StudyPlan;
  /** The pinned baseline at the conditions of the yaw curves, the cover sweep and the map. */
  baseline: { curve: StudyPlan; cover: StudyPlan; map: StudyPlan } | null;
  /** Notes on choices the plan made (shown with the plots). */
  notes: string[];
}

/** The page's studies for a design, its design-space choices and an optional pinned baseline. */
export function pageStudies(c: CaseFile, choice: DesignSpaceChoice, baseline: CaseFile | null): PageStudies {
  const base = caseToModelInput(c);
  const notes: string[] = [];
  if (base.wheel.coverPlacement === 'explicit') {
    notes.push(
      'The design uses explicit cover radii; the covering-fraction sweeps place covers next to the rim.',
    );
  }
  const main = [c.conditions.airspeed_mps[0]!];
  const speeds = coverPlotSpeeds(c, choice);
  const yaws = [...choice.coverPlotYawsDeg];
  const mapYaw = [choice.mapYawDeg];
  let baselines: PageStudies['baseline'] = null;
  if (baseline) {
    const b = baselineInput(baseline, c);
    baselines = {
      curve: baselineStudy('yaw curves', b, c, main, c.conditions.yaw_deg),
      cover: baselineStudy('cover sweep', b, c, speeds, yaws),
      map: baselineStudy('design map', b, c, main, mapYaw),
    };
  }
  return {
    current: currentDesignStudy(c),
    quick: base.options.gridConvergence ? currentDesignStudy(c, true) : null,
    family: coverFamilyStudy(base, c, choice.familyFractions),
    cover: coverSweepStudy(base, c, SWEEP_FRACTIONS, speeds, yaws),
    map: designMapStudy(base, c, SWEEP_FRACTIONS, mapDepths(c, choice), main, mapYaw),
    baseline: baselines,
    notes,
  };
}
