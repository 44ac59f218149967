import { assemblePoint } from './assemblePoint';
import { checkWheelInput } from './checkWheelInput';
import { type SurfaceCoefficients, surfaceCoefficients } from './surfaceCoefficients';
import { surfaceKey } from './surfaceKey';
import type { WheelSolution } from './types';
import type { WheelInput } from './wheelInput';
import { wheelRadii } from './wheelRadii';

export type { WheelInput } from './wheelInput';

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
  checkWheelInput(input);
  const radii = wheelRadii(wheel);
  // The surface of each rotation ratio met, so the key is built once per ratio, not once per point.
  const byRatio = new Map<number, SurfaceCoefficients>();
  const coefficientsFor = (ratio: number): SurfaceCoefficients => {
    const known = byRatio.get(ratio);
    if (known) return known;
    const key = surfaceKey(wheel, radii, options, ratio);
    let c = cache.get(key);
    if (!c) {
      c = surfaceCoefficients(wheel, radii, options, ratio);
      cache.set(key, c);
    }
    byRatio.set(ratio, c);
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
