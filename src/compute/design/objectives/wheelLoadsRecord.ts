import type { WheelLoads } from '../../../model/ride/types';

/** A zeroed loads record for wheelYawCurveLoads to fill (one per module, reused: no allocation in loops). */
export function wheelLoadsRecord(): WheelLoads {
  return { axialN: 0, sideN: 0, rollMomentNm: 0, steeringMomentNm: 0, axleTorqueNm: 0, mirrored: false };
}
