import type { StudyAxis } from './studyPlan';

/** The axis names every planner uses, so views read any study the same way. */
export const AXIS = {
  coverFraction: 'coverFraction',
  rimDepth: 'rimDepth',
  airspeed: 'airspeed',
  yaw: 'yaw',
  case: 'case',
  wheel: 'wheel',
  dataPoint: 'dataPoint',
} as const;

export const coverFractionAxis = (values: readonly number[]): StudyAxis => ({
  name: AXIS.coverFraction,
  unit: '1',
  values,
});
export const rimDepthAxis = (valuesM: readonly number[]): StudyAxis => ({
  name: AXIS.rimDepth,
  unit: 'm',
  values: valuesM,
});
export const airspeedAxis = (valuesMps: readonly number[]): StudyAxis => ({
  name: AXIS.airspeed,
  unit: 'm/s',
  values: valuesMps,
});
export const yawAxis = (valuesDeg: readonly number[]): StudyAxis => ({
  name: AXIS.yaw,
  unit: 'deg',
  values: valuesDeg,
});

/** An axis's values as numbers (for numeric axes). */
export function axisNumbers(axis: StudyAxis): number[] {
  return axis.values.map((v) => {
    if (typeof v !== 'number') throw new RangeError(`axis ${axis.name}: ${String(v)} is not a number`);
    return v;
  });
}
