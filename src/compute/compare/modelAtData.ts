/**
 * The model evaluated at the data's own operating points (each row's yaw, airspeed and density), for
 * a case's wheel, with the calibratable parameters overridable. The lifting surface's coefficients
 * depend only on the porosity scale and the rotation ratio, so they are cached by those: a change of
 * suction recovered or profile-drag factor costs no lattice solve.
 */

import {
  assemblePoint,
  type FlowConditions,
  type ModelOptions,
  type PointResult,
  type SurfaceCoefficients,
  surfaceCoefficients,
  wheelRadii,
} from '../../model/wheel/index';
import type { CaseFile } from '../caseFile';
import { caseToModelInput } from '../caseFile';
import type { DataPoint } from './convertData';
import type { Output } from './quantities';

/** The model parameters a comparison may calibrate or vary (case-file names). */
export const CALIBRATABLE = ['porosity_scale', 'suction_recovered', 'profile_drag_factor'] as const;
export type Calibratable = (typeof CALIBRATABLE)[number];
export type ParameterValues = Partial<Record<Calibratable, number>>;

export const PARAMETER_BOUNDS: Readonly<Record<Calibratable, [number, number]>> = {
  porosity_scale: [1e-3, 1000],
  suction_recovered: [0, 1],
  profile_drag_factor: [1e-3, 100],
};

export const PARAMETER_MEANING: Readonly<Record<Calibratable, string>> = {
  porosity_scale: "multiplies the spoked region's screen resistance derived from spoke solidity",
  suction_recovered:
    'scale on the leading-edge thrust the tyre edge can attain (0..1; 1 = the derived bound)',
  profile_drag_factor: 'multiplies the profile (section) drag of spokes, rim and tyre',
};

export interface EvaluatorOptions {
  /** Lattice counts to use instead of the case's (e.g. coarser for a fit). */
  latticeSpan?: number;
  latticeChord?: number;
  /** Grid-convergence estimate of the lattice share (costs two extra lattices per solve). */
  gridConvergence?: boolean;
}

export interface ModelEvaluator {
  /** Model results at every data point with the given parameter overrides. */
  evaluate(params?: ParameterValues, extra?: { rhoScale?: number; yawOffsetRad?: number }): PointResult[];
  /** The model options used with no overrides. */
  baseOptions: ModelOptions;
}

/** The model's value of an output at one point. */
export function modelValue(p: PointResult, out: Output): number {
  switch (out) {
    case 'axial_N':
      return p.axialN;
    case 'wind_drag_N':
      return p.windDragN;
    case 'side_N':
      return p.sideN;
    case 'yaw_moment_Nm':
      return p.yawMomentNm;
    case 'steering_moment_Nm':
      return p.steeringMomentNm;
  }
}

/** The model's lattice uncertainty of an output at one point (absolute, NaN when not computed). */
export function modelUncertainty(p: PointResult, out: Output): number {
  switch (out) {
    case 'axial_N':
      return p.uncertaintyAxialN;
    case 'wind_drag_N':
      // Wind-axis drag mixes the axial and side forces: D = A cos b + S sin b.
      return Math.hypot(p.uncertaintyAxialN * Math.cos(p.yawRad), p.uncertaintySideN * Math.sin(p.yawRad));
    case 'side_N':
      return p.uncertaintySideN;
    case 'yaw_moment_Nm':
    case 'steering_moment_Nm': {
      const v = modelValue(p, out);
      return Math.abs(p.sideN) > 0 ? Math.abs(v) * (p.uncertaintySideN / Math.abs(p.sideN)) : Number.NaN;
    }
  }
}

export function createModelEvaluator(
  caseFile: CaseFile,
  points: readonly DataPoint[],
  options: EvaluatorOptions = {},
): ModelEvaluator {
  const input = caseToModelInput(caseFile);
  const muPaS = input.points[0]!.muPaS;
  const groundSpeed = caseFile.conditions.ground_speed_mps;
  const base: ModelOptions = {
    ...input.options,
    ...(options.latticeSpan !== undefined ? { latticeSpanCount: options.latticeSpan } : {}),
    ...(options.latticeChord !== undefined ? { latticeChordCount: options.latticeChord } : {}),
    ...(options.gridConvergence !== undefined ? { gridConvergence: options.gridConvergence } : {}),
  };
  const radii = wheelRadii(input.wheel);
  const cache = new Map<string, SurfaceCoefficients>();
  const flows: FlowConditions[] = points.map((p) => ({
    airspeedMps: p.airspeedMps,
    yawRad: p.yawRad,
    groundSpeedMps: groundSpeed ?? p.airspeedMps,
    rhoKgPerM3: p.rhoKgPerM3,
    muPaS,
  }));
  return {
    baseOptions: base,
    evaluate(params = {}, extra = {}) {
      const opts: ModelOptions = {
        ...base,
        porosityScale: params.porosity_scale ?? base.porosityScale,
        suctionRecovered: params.suction_recovered ?? base.suctionRecovered,
        profileDragFactor: params.profile_drag_factor ?? base.profileDragFactor,
      };
      const rhoScale = extra.rhoScale ?? 1;
      const yawOffset = extra.yawOffsetRad ?? 0;
      return flows.map((f) => {
        const ratio = f.groundSpeedMps / f.airspeedMps;
        const key = `${opts.porosityScale}|${ratio.toPrecision(12)}`;
        let coeff = cache.get(key);
        if (!coeff) {
          coeff = surfaceCoefficients(input.wheel, radii, opts, ratio);
          if (cache.size > 64) cache.clear();
          cache.set(key, coeff);
        }
        const flow =
          rhoScale === 1 && yawOffset === 0
            ? f
            : {
                ...f,
                rhoKgPerM3: f.rhoKgPerM3 * rhoScale,
                yawRad: Math.max(-Math.PI / 2, Math.min(Math.PI / 2, f.yawRad + yawOffset)),
              };
        return assemblePoint(input.wheel, radii, coeff, flow, opts, input.steering);
      });
    },
  };
}
