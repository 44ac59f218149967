import type { SpokeRow } from './spokeAnnulusLoads';
import type { FlowConditions, WheelGeometry } from './types';

/** The spoke section and the air of one flow point, as spokeAnnulusLoads takes them (wheel with spokes). */
export function spokeRowOf(wheel: WheelGeometry, point: FlowConditions): SpokeRow {
  const round = wheel.spokeSection !== 'bladed';
  return {
    round,
    thicknessRatio: round ? 1 : wheel.spokeThicknessM / wheel.spokeWidthM,
    refLengthM: round ? wheel.spokeDiameterM : wheel.spokeThicknessM,
    spacingPerRadius: (2 * Math.PI) / wheel.spokeCount,
    vInPlaneMps: point.airspeedMps * Math.cos(point.yawRad),
    vNormalMps: point.airspeedMps * Math.sin(point.yawRad),
    rhoKgPerM3: point.rhoKgPerM3,
    nuM2PerS: point.muPaS / point.rhoKgPerM3,
  };
}
