import { assemblePoint } from './assemblePoint';
import { type SurfaceCoefficients, surfaceCoefficients } from './surfaceCoefficients';
import { surfaceKey } from './surfaceKey';
import type { FlowConditions, ModelOptions, SteeringGeometry, WheelGeometry, WheelSolution } from './types';
import { wheelRadii } from './wheelRadii';

export interface WheelInput {
  wheel: WheelGeometry;
  options: ModelOptions;
  steering: SteeringGeometry;
  points: FlowConditions[];
}

/**
 * Solve one wheel at a list of operating points. The lattice is linear in V sin(beta), so one
 * factorisation per distinct boundary condition (the spoked region's openness depends on the
 * rotation ratio ground speed / airspeed) serves every yaw angle and speed. `cache` (optional, shared
 * across calls by the caller, who bounds it) keeps surface solutions by surfaceKey, so cases sharing a
 * boundary condition share one factorisation.
 */
export function solveWheel(
  input: WheelInput,
  cache: Map<string, SurfaceCoefficients> = new Map(),
): WheelSolution {
  const { wheel, options, steering, points } = input;
  const radii = wheelRadii(wheel);
  for (const [i, p] of points.entries()) {
    if (!(p.airspeedMps > 0))
      throw new RangeError(`points[${i}].airspeedMps must be > 0, got ${p.airspeedMps}`);
    if (!(p.groundSpeedMps >= 0)) {
      throw new RangeError(`points[${i}].groundSpeedMps must be >= 0, got ${p.groundSpeedMps}`);
    }
    if (!(Math.abs(p.yawRad) <= Math.PI / 2)) {
      throw new RangeError(`points[${i}].yawRad must be within [-pi/2, pi/2], got ${p.yawRad}`);
    }
    if (!(p.rhoKgPerM3 > 0) || !(p.muPaS > 0)) {
      throw new RangeError(
        `points[${i}] needs rhoKgPerM3 > 0 and muPaS > 0, got ${p.rhoKgPerM3}, ${p.muPaS}`,
      );
    }
  }
  const coefficientsFor = (ratio: number): SurfaceCoefficients => {
    const key = surfaceKey(wheel, radii, options, ratio);
    let c = cache.get(key);
    if (!c) {
      c = surfaceCoefficients(wheel, radii, options, ratio);
      cache.set(key, c);
    }
    return c;
  };
  const results = points.map((p) =>
    assemblePoint(wheel, radii, coefficientsFor(p.groundSpeedMps / p.airspeedMps), p, options, steering),
  );
  // The summary describes the tunnel condition (ground speed = airspeed).
  const summary = coefficientsFor(1);
  return {
    surface: {
      sideSlopePerRad: summary.normalSlope,
      inducedDragFactor: summary.inducedDragFactor,
      porousDragSlope: summary.porousDragSlope,
      panels: summary.panels,
      centreXM: summary.centreXM,
      centreZM: summary.centreZM,
      convergence: summary.normalSlopeConvergence,
    },
    points: results,
  };
}
