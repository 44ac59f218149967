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

const SCALAR_COUNT = SCALAR_COLUMNS.length;
const FIELD_COUNT = COMPONENT_FIELDS.length;
// packPoints writes these fields by name: a list that grows needs its line there.
if (SCALAR_COUNT !== 19 || FIELD_COUNT !== 7) {
  throw new Error(
    `packPoints: ${SCALAR_COUNT} scalars and ${FIELD_COUNT} component fields; update packPoints`,
  );
}

/** Bit of each flag code. */
const FLAG_BIT = new Map(FLAG_CODES.map((code, bit) => [code, bit]));

/**
 * Pack points into one Float64Array (row-major, POINT_COLUMNS), so a worker can transfer its buffer.
 * The fields are read by name, in SCALAR_COLUMNS and COMPONENT_FIELDS order (a read by a computed key
 * per field cost a worker about 2 % of a sweep); unpackPoints reads the lists themselves, so the
 * round-trip test holds the two orders together.
 */
export function packPoints(points: readonly PointResult[]): Float64Array {
  const out = new Float64Array(points.length * POINT_COLUMN_COUNT);
  let o = 0;
  for (const p of points) {
    out[o] = p.yawRad;
    out[o + 1] = p.airspeedMps;
    out[o + 2] = p.groundSpeedMps;
    out[o + 3] = p.rhoKgPerM3;
    out[o + 4] = p.axialN;
    out[o + 5] = p.sideN;
    out[o + 6] = p.verticalN;
    out[o + 7] = p.windDragN;
    out[o + 8] = p.windLiftN;
    out[o + 9] = p.cpXM;
    out[o + 10] = p.cpZM;
    out[o + 11] = p.yawMomentNm;
    out[o + 12] = p.rollMomentNm;
    out[o + 13] = p.steeringMomentNm;
    out[o + 14] = p.axleTorqueNm;
    out[o + 15] = p.powerW;
    out[o + 16] = p.cdaAxialM2;
    out[o + 17] = p.uncertaintyAxialN;
    out[o + 18] = p.uncertaintySideN;
    let bits = 0;
    for (const flag of p.flags) {
      const bit = FLAG_BIT.get(flag);
      if (bit === undefined) throw new RangeError(`unknown flag code ${flag}`);
      bits |= 1 << bit;
    }
    out[o + 19] = bits;
    o += SCALAR_COUNT + 1;
    for (const c of COMPONENT_NAMES) {
      const loads = p.components[c];
      out[o] = loads.fxN;
      out[o + 1] = loads.fyN;
      out[o + 2] = loads.fzN;
      out[o + 3] = loads.mxNm;
      out[o + 4] = loads.myNm;
      out[o + 5] = loads.mzNm;
      out[o + 6] = loads.axleTorqueNm;
      o += FIELD_COUNT;
    }
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
