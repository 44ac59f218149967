import { interpolateTable } from './interpolateTable';

/**
 * Drag coefficient (per unit span, on the cylinder's diameter) of a 2-D circular cylinder with a thin
 * wake splitter plate of length L behind it, at subcritical Reynolds numbers (1e4 .. 5e4 on the diameter).
 *
 * Data: Apelt, West & Szewczyk 1973, J. Fluid Mech. 61:187 (L/D 0 .. 2) and Apelt & West 1975,
 * J. Fluid Mech. 71:145 (L/D 2 .. 7): the plate stabilises the separated shear layers, raises the base
 * pressure and cuts the drag from the plain cylinder's ~1.15 to ~0.6 once L/D >= 2; beyond L/D ~ 5 the
 * vortex street is suppressed and the drag changes little. The table is read from memory of those
 * papers' curves (about +-0.05). Piecewise-linear in L/D, held at the last value beyond L/D = 7.
 *
 * The model uses it for the tyre (round nose) leading its rim (the plate) or a cover; see rimTyreLoads.
 */
const LENGTH_RATIO = [0, 0.5, 1, 1.5, 2, 3, 5, 7];
const DRAG = [1.15, 0.93, 0.77, 0.68, 0.64, 0.62, 0.6, 0.58];

/** Largest plate length ratio L/D with data; the drag is held beyond it. */
export const SPLITTER_PLATE_MAX_RATIO = LENGTH_RATIO[LENGTH_RATIO.length - 1]!;

/**
 * @param plateLengthRatio L / D, plate length over cylinder diameter (>= 0, finite or +Infinity)
 * @throws RangeError when plateLengthRatio is NaN or negative.
 */
export function splitterPlateCylinderDrag(plateLengthRatio: number): number {
  if (!(plateLengthRatio >= 0)) {
    throw new RangeError(`plateLengthRatio=${plateLengthRatio}: must be >= 0`);
  }
  return interpolateTable(LENGTH_RATIO, DRAG, plateLengthRatio);
}
