import type { SpokeRow } from './spokeAnnulusLoads';
import type { FlowConditions, WheelGeometry } from './types';

/** The spoke section and the air of one flow point, as spokeAnnulusLoads takes them (wheel with spokes). */
export function spokeRowOf(wheel: WheelGeometry, point: FlowConditions): SpokeRow {
  return setSpokeRow(wheel, point, emptySpokeRow());
}

/** A SpokeRow to fill with setSpokeRow (every field present, so all rows share one shape). */
export function emptySpokeRow(): SpokeRow {
  return {
    round: true,
    thicknessRatio: 1,
    refLengthM: 0,
    spacingPerRadius: 0,
    vInPlaneMps: 0,
    vNormalMps: 0,
    rhoKgPerM3: 0,
    nuM2PerS: 0,
  };
}

/** spokeRowOf written into `row` (no allocation, for the per-point loads); returns `row`. */
export function setSpokeRow(wheel: WheelGeometry, point: FlowConditions, row: SpokeRow): SpokeRow {
  const round = wheel.spokeSection !== 'bladed';
  row.round = round;
  row.thicknessRatio = round ? 1 : wheel.spokeThicknessM / wheel.spokeWidthM;
  row.refLengthM = round ? wheel.spokeDiameterM : wheel.spokeThicknessM;
  row.spacingPerRadius = (2 * Math.PI) / wheel.spokeCount;
  row.vInPlaneMps = point.airspeedMps * Math.cos(point.yawRad);
  row.vNormalMps = point.airspeedMps * Math.sin(point.yawRad);
  row.rhoKgPerM3 = point.rhoKgPerM3;
  row.nuM2PerS = point.muPaS / point.rhoKgPerM3;
  return row;
}
