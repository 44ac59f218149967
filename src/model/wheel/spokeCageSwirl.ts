import { SPOKE_ANGLE_STEPS } from './spokeAnnulusLoads';
import { spokeElementSwirl } from './spokeElementSwirl';
import { spokeElements } from './spokeElements';
import { spokeRowOf } from './spokeRowOf';
import type { FlowConditions, ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** The swirl of the air in a wheel's spoke cage at the radii of the spokes' quadrature elements, each a
 * fraction of omega r (see spokeElementSwirl). */
export interface SpokeCageSwirl {
  radiusM: Float64Array;
  /** Extra swirl the spokes meet beyond their merged wake's (0 where the merged wake holds it). */
  extraSwirl: Float64Array;
  /** Mean swirl of the air flushed through the annulus (Glauert's annulus balance). */
  meanSwirl: Float64Array;
  /** Swirl at the spoke plane in the merged wake of the spokes ahead. */
  planeSwirl: Float64Array;
}

const swirl = new Float64Array(8);

/**
 * The spoke cage's swirl at every spoke element, as the spokes' loads (spokeLoads) solve it: for reports
 * and for checking the balance. A wheel without spokes has none (empty arrays).
 */
export function spokeCageSwirl(
  wheel: WheelGeometry,
  radii: WheelRadii,
  point: FlowConditions,
  options: ModelOptions,
): SpokeCageSwirl {
  const elements = spokeElements(wheel, radii, options);
  const n = wheel.spokeCount > 0 ? elements.radiusM.length : 0;
  const result = {
    radiusM: Float64Array.from(elements.radiusM.slice(0, n)),
    extraSwirl: new Float64Array(n),
    meanSwirl: new Float64Array(n),
    planeSwirl: new Float64Array(n),
  };
  if (n === 0) return result;
  const spokes = spokeRowOf(wheel, point);
  const omega = point.groundSpeedMps / radii.outerRadiusM;
  const perSpoke = (wheel.spokeCount / SPOKE_ANGLE_STEPS) * options.profileDragFactor;
  for (let e = 0; e < n; e++) {
    const r = elements.radiusM[e]!;
    spokeElementSwirl(spokes, r, omega, point.airspeedMps, perSpoke * elements.share[e]!, swirl);
    result.extraSwirl[e] = swirl[0]!;
    result.meanSwirl[e] = swirl[1]!;
    result.planeSwirl[e] = swirl[2]!;
  }
  return result;
}
