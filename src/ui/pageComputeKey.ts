/** What a state's results depend on (computeKey) and the pinned baselines' yaw curves it computes. */
import { baselineInput, baselineStudy } from '../compute/study/baselineStudy';
import type { AppState } from './appState';
import { pinnedBaselines, referenceIndex } from './baselines/pinnedBaselines';
import type { OtherBaseline } from './views/pageResults';

/** What a state's results depend on: a change elsewhere (units, tabs, map colours) only redraws. */
export function computeKey(s: AppState): string {
  const v = s.view;
  return JSON.stringify([
    s.case,
    s.baseline,
    s.baselines ?? null,
    v.familyFractions,
    v.coverPlotYawsDeg,
    v.coverPlotSpeedsMps,
    v.mapYawDeg,
    v.mapMaxRimDepthM,
  ]);
}

/** The yaw curves of the pinned baselines other than the reference (whose curve pageStudies plans). */
export function otherBaselineCurves(state: AppState): OtherBaseline[] {
  const c = state.case;
  const ref = referenceIndex(state);
  return pinnedBaselines(state).flatMap((b, index) =>
    index === ref
      ? []
      : [
          {
            index,
            case: b,
            plan: baselineStudy(
              `yaw curves ${index + 1}`,
              baselineInput(b, c),
              c,
              [c.conditions.airspeed_mps[0]!],
              c.conditions.yaw_deg,
            ),
            curve: null,
          },
        ],
  );
}
