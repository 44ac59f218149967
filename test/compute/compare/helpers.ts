import { type CaseFile, validateCase } from '../../../src/compute/caseFile';
import {
  createModelEvaluator,
  type DataPoint,
  type ParameterValues,
} from '../../../src/compute/compare/index';
import { mulberry32 } from '../../../src/model/random/mulberry32';
import type { PointResult } from '../../../src/model/wheel/index';

/** An invented half-covered wheel on a small lattice (fast tests). */
export function testCase(extra: Record<string, unknown> = {}): CaseFile {
  const c = validateCase({
    name: 'test wheel',
    wheel: { cover: { fraction: 0.5, placement: 'rim', sides: 2 } },
    conditions: { airspeed_mps: [13.9], yaw_deg: [0, 10], air_density_kgpm3: 1.2 },
    model: { lattice_span: 12, lattice_chord: 8, grid_convergence: true, ...extra },
  });
  if (!c.ok) throw new Error(c.errors.join('\n'));
  return c.value;
}

export const YAWS = [-5, 0, 2.5, 5, 7.5, 10, 12.5, 15, 17.5, 20];

export function gridPoints(speedsMps: readonly number[], rho = 1.2, yaws = YAWS): DataPoint[] {
  return speedsMps.flatMap((v) =>
    yaws.map((y) => ({ line: 0, yawRad: (y * Math.PI) / 180, airspeedMps: v, rhoKgPerM3: rho, values: {} })),
  );
}

export function truthAt(
  caseFile: CaseFile,
  points: DataPoint[],
  params: ParameterValues = {},
): PointResult[] {
  return createModelEvaluator(caseFile, points).evaluate(params);
}

/** Gaussian noise by Box-Muller from a seeded generator (Box & Muller 1958). */
export function gaussian(seed: number): (sd: number) => number {
  const rng = mulberry32(seed);
  return (sd) => sd * Math.sqrt(-2 * Math.log(Math.max(rng(), 1e-300))) * Math.cos(2 * Math.PI * rng());
}
