import type { PointResult } from '../../model/wheel';
import { type CaseFile, caseToModelInput } from '../caseFile';
import type { DataPoint } from '../compare/index';
import { AXIS } from './axes';
import type { StudyResult } from './runStudies';
import { solveStudiesHere } from './studyLanding';
import type { StudyPlan } from './studyPlan';

/**
 * A comparison's jobs: the case's wheel at the imported data's own operating points (each row's yaw,
 * airspeed and density; the case's ground speed, or airspeed = ground speed), one point axis
 * `dataPoint` naming each point by its line in the data file. The model's values there are what the
 * residuals and the slip checks hold the data against (compare/runComparison).
 */
export function dataComparisonStudy(caseFile: CaseFile, points: readonly DataPoint[]): StudyPlan {
  const input = caseToModelInput(caseFile);
  const muPaS = input.points[0]!.muPaS;
  const groundSpeed = caseFile.conditions.ground_speed_mps;
  return {
    name: 'data comparison',
    caseAxes: [],
    pointAxes: [{ name: AXIS.dataPoint, unit: 'line', values: points.map((p) => p.line) }],
    inputs: [
      {
        ...input,
        points: points.map((p) => ({
          airspeedMps: p.airspeedMps,
          yawRad: p.yawRad,
          groundSpeedMps: groundSpeed ?? p.airspeedMps,
          rhoKgPerM3: p.rhoKgPerM3,
          muPaS,
        })),
      },
    ],
  };
}

/** The model at the data's points from the comparison study's result; the model's message if it failed. */
export function modelAtDataOf(result: StudyResult): PointResult[] {
  const error = result.errors[0];
  if (error) throw new RangeError(error);
  if (!result.cube || result.landed[0] !== 1) throw new RangeError('the model at the data was not solved');
  return result.cube.points();
}

/** The model at the data's points, solved here and now through the comparison study. */
export function modelAtDataHere(caseFile: CaseFile, points: readonly DataPoint[]): PointResult[] {
  if (points.length === 0) return [];
  return modelAtDataOf(solveStudiesHere([dataComparisonStudy(caseFile, points)])[0]!);
}
