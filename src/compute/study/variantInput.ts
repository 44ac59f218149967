import type { FlowConditions, WheelInput } from '../../model/wheel';
import type { CaseFile } from '../caseFile';
import { degToRad } from '../units';

/**
 * The operating points of a sweep: every airspeed x yaw angle (airspeed outer), at the case's air.
 * Tunnel convention unless the case gives a ground speed; then its ratio to the case's first airspeed
 * is kept.
 */
export function pointsAt(
  base: WheelInput,
  c: CaseFile,
  speedsMps: readonly number[],
  yawsDeg: readonly number[],
): FlowConditions[] {
  const template = base.points[0]!;
  const main = c.conditions.airspeed_mps[0]!;
  const given = c.conditions.ground_speed_mps;
  const points: FlowConditions[] = [];
  for (const v of speedsMps) {
    for (const yaw of yawsDeg) {
      points.push({
        airspeedMps: v,
        yawRad: degToRad(yaw),
        groundSpeedMps: given === null ? v : (given * v) / main,
        rhoKgPerM3: template.rhoKgPerM3,
        muPaS: template.muPaS,
      });
    }
  }
  return points;
}

/** The base wheel with some geometry changed, at the given points, without the grid-convergence lattices
 * (a sweep's value is the same; only the uncertainty estimate, shown for the current design, is left out). */
export function variantInput(
  base: WheelInput,
  wheel: Partial<WheelInput['wheel']>,
  points: FlowConditions[],
): WheelInput {
  return {
    wheel: { ...base.wheel, ...wheel },
    options: { ...base.options, gridConvergence: false },
    steering: { ...base.steering },
    points,
  };
}
