import {
  COMPONENT_NAMES,
  type ComponentLoads,
  type ComponentName,
  FLAG_MESSAGES,
  type PointResult,
} from '../../model/wheel';
import { COLUMN_COUNT, COLUMN_NAMES, COMPONENT_FIELDS, SCALAR_COLUMNS } from './columns';

/** Flag codes in bit order: a point's flags travel as one number. */
export const FLAG_CODES: readonly string[] = Object.keys(FLAG_MESSAGES);

/** Columns of a packed point row, in order: the study's column table (src/compute/engine/columns.ts). */
export const POINT_COLUMNS: readonly string[] = COLUMN_NAMES;
export const POINT_COLUMN_COUNT = COLUMN_COUNT;

/** Pack points into one Float64Array (row-major, POINT_COLUMNS), so a worker can transfer its buffer. */
export function packPoints(points: readonly PointResult[]): Float64Array {
  const out = new Float64Array(points.length * POINT_COLUMN_COUNT);
  let o = 0;
  for (const p of points) {
    for (const key of SCALAR_COLUMNS) out[o++] = p[key];
    let bits = 0;
    for (const flag of p.flags) {
      const bit = FLAG_CODES.indexOf(flag);
      if (bit < 0) throw new RangeError(`unknown flag code ${flag}`);
      bits |= 1 << bit;
    }
    out[o++] = bits;
    for (const c of COMPONENT_NAMES) for (const f of COMPONENT_FIELDS) out[o++] = p.components[c][f];
  }
  return out;
}

/** Inverse of packPoints: bit-exact (every value is a float64 either way). */
export function unpackPoints(packed: Float64Array, pointCount: number): PointResult[] {
  if (packed.length !== pointCount * POINT_COLUMN_COUNT) {
    throw new RangeError(`packed length ${packed.length} does not match ${pointCount} points`);
  }
  const points: PointResult[] = [];
  let o = 0;
  for (let i = 0; i < pointCount; i++) {
    const p = {} as Record<string, unknown>;
    for (const key of SCALAR_COLUMNS) p[key] = packed[o++];
    const bits = packed[o++]!;
    p.flags = FLAG_CODES.filter((_, bit) => (bits & (1 << bit)) !== 0);
    const components = {} as Record<ComponentName, ComponentLoads>;
    for (const c of COMPONENT_NAMES) {
      const loads = {} as ComponentLoads;
      for (const f of COMPONENT_FIELDS) loads[f] = packed[o++]!;
      components[c] = loads;
    }
    p.components = components;
    points.push(p as unknown as PointResult);
  }
  return points;
}
