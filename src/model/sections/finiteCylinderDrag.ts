import { interpolateTable } from './interpolateTable';

/**
 * Drag coefficient (on the frontal area length x diameter) of a circular cylinder of finite length with
 * two free ends, in cross-flow at subcritical Reynolds numbers (about 1e4 .. 2e5).
 *
 * Data: Wieselsberger's measurements as tabulated by F. M. White, Fluid Mechanics, Table 7.2 and by
 * Hoerner, Fluid-Dynamic Drag, ch. 3 (from memory): L/D 1: 0.64, 2: 0.68, 3: 0.72, 5: 0.74, 10: 0.82,
 * 20: 0.91, 40: 0.98, infinite: 1.20. Flow around the free ends relieves the base suction, so short
 * cylinders drag much less than the 2-D value. Piecewise-linear in L/D below 40; above 40 linear in
 * D/L towards the 2-D value 1.20 at D/L = 0; below L/D = 1 held at 0.64 (a disc-like drum, outside the
 * table: the hub shells the model meets have L/D >= 1).
 */
const LENGTH_RATIO = [1, 2, 3, 5, 10, 20, 40];
const DRAG = [0.64, 0.68, 0.72, 0.74, 0.82, 0.91, 0.98];
const TWO_D_DRAG = 1.2;

/**
 * @param lengthRatio L / D, cylinder length over its diameter (> 0, finite or +Infinity)
 * @throws RangeError when lengthRatio is NaN or not > 0.
 */
export function finiteCylinderDrag(lengthRatio: number): number {
  if (!(lengthRatio > 0)) throw new RangeError(`lengthRatio=${lengthRatio}: must be > 0`);
  if (lengthRatio <= LENGTH_RATIO[0]!) return DRAG[0]!;
  const last = LENGTH_RATIO.length - 1;
  if (lengthRatio >= LENGTH_RATIO[last]!) {
    // Linear in D/L between L/D = 40 (0.98) and the 2-D limit D/L = 0 (1.20).
    const s = LENGTH_RATIO[last]! / lengthRatio; // 1 at L/D = 40, 0 at infinity
    return TWO_D_DRAG + s * (DRAG[last]! - TWO_D_DRAG);
  }
  return interpolateTable(LENGTH_RATIO, DRAG, lengthRatio);
}
