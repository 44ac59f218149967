import { spokeElements } from './spokeElements';
import type { ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/** spokeElements as typed arrays: the first `count` entries hold the elements. */
export interface SpokeElementTable {
  count: number;
  radiusM: Float64Array;
  weightM: Float64Array;
  share: Float64Array;
}

/** Three pieces of 6 Gauss-Legendre nodes at most (spokeElements). */
const MAX_ELEMENTS = 18;
const table: SpokeElementTable = {
  count: 0,
  radiusM: new Float64Array(MAX_ELEMENTS),
  weightM: new Float64Array(MAX_ELEMENTS),
  share: new Float64Array(MAX_ELEMENTS),
};
/** The inputs the table was made from: cover sides, one-sided share, hub, cover inner, cover outer and
 * rim inner radii (NaN: none yet). */
const made = new Float64Array(6).fill(Number.NaN);

/**
 * The spoke elements of a design (spokeElements: the same values), made once per design and kept while
 * the fields they depend on keep their values (compared by value, so callers may pass new objects for
 * the same design): a sweep asks for them at every operating point. The table is module-owned scratch,
 * valid until the next call for another design; read it at once, do not keep it.
 */
export function spokeElementTable(
  wheel: WheelGeometry,
  radii: WheelRadii,
  options: ModelOptions,
): Readonly<SpokeElementTable> {
  if (
    made[0] === wheel.coverSides &&
    made[1] === options.oneSidedCoverSpokeShare &&
    made[2] === radii.hubRadiusM &&
    made[3] === radii.coverInnerRadiusM &&
    made[4] === radii.coverOuterRadiusM &&
    made[5] === radii.rimInnerRadiusM
  ) {
    return table;
  }
  const elements = spokeElements(wheel, radii, options);
  const count = elements.radiusM.length;
  if (count > MAX_ELEMENTS)
    throw new RangeError(`spokeElements gave ${count} elements, at most ${MAX_ELEMENTS}`);
  for (let e = 0; e < count; e++) {
    table.radiusM[e] = elements.radiusM[e]!;
    table.weightM[e] = elements.weightM[e]!;
    table.share[e] = elements.share[e]!;
  }
  table.count = count;
  made[0] = wheel.coverSides;
  made[1] = options.oneSidedCoverSpokeShare;
  made[2] = radii.hubRadiusM;
  made[3] = radii.coverInnerRadiusM;
  made[4] = radii.coverOuterRadiusM;
  made[5] = radii.rimInnerRadiusM;
  return table;
}
