/**
 * A study: named axes and the model inputs to solve. The case axes (cover fraction, rim depth, ...)
 * index the inputs, row-major (the last axis varies fastest); the point axes (airspeed, yaw, ...) index
 * each input's operating points, row-major too, so input k's point j is cell (case k, point j) of the
 * result cube. A planner is a small pure function that returns one.
 */
import type { WheelInput } from '../../model/wheel';

/** A value an axis may take: a number in the unit of its axis, or a plan file's text or switch. */
export type AxisValue = number | string | boolean | null;

export interface StudyAxis {
  /** Axis name, used to read the cube (`cube.pick({ coverFraction: 3 })`). */
  name: string;
  /** Unit of the values ('1' for a fraction, 'm', 'm/s', 'deg'; '' for labels). */
  unit: string;
  values: readonly AxisValue[];
}

/** A case the planner could not turn into a model input: its message stands for the result. */
export interface UnplannedCase {
  error: string;
}

export type StudyInput = WheelInput | UnplannedCase;

export interface StudyPlan {
  /** What the study is, for messages. */
  name: string;
  caseAxes: readonly StudyAxis[];
  pointAxes: readonly StudyAxis[];
  /** One per cell of the case axes, row-major. */
  inputs: readonly StudyInput[];
}

export function isUnplanned(input: StudyInput): input is UnplannedCase {
  return (input as UnplannedCase).error !== undefined;
}

/** Product of the axes' lengths (1 for no axes). */
export function axesSize(axes: readonly StudyAxis[]): number {
  let n = 1;
  for (const a of axes) n *= a.values.length;
  return n;
}

/**
 * Check that a plan's inputs fill its axes: one input per case cell, each with one operating point per
 * point cell. Throws a RangeError naming the study, the case and the rule.
 */
export function checkStudyPlan(plan: StudyPlan): void {
  const names = new Set<string>();
  for (const a of [...plan.caseAxes, ...plan.pointAxes]) {
    if (names.has(a.name)) throw new RangeError(`study ${plan.name}: axis "${a.name}" appears twice`);
    names.add(a.name);
  }
  const cases = axesSize(plan.caseAxes);
  if (plan.inputs.length !== cases) {
    throw new RangeError(
      `study ${plan.name}: ${plan.inputs.length} inputs for ${cases} case cells (${plan.caseAxes.map((a) => `${a.name} ${a.values.length}`).join(' x ') || 'one case'})`,
    );
  }
  const points = axesSize(plan.pointAxes);
  plan.inputs.forEach((input, k) => {
    if (!isUnplanned(input) && input.points.length !== points) {
      throw new RangeError(
        `study ${plan.name}: case ${k} has ${input.points.length} operating points, the point axes ${points}`,
      );
    }
  });
}
