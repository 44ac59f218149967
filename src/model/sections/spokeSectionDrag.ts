import { bladedSpokeDrag } from './bladedSpokeDrag';
import { cylinderDrag } from './cylinderDrag';

/**
 * The one section drag law of a spoke, on its frontal size (diameter of a round spoke, thickness of a
 * bladed one), used alike for the spokes' loads and for the spoked region's screen resistance:
 * round, the smooth circular cylinder (cylinderDrag, White's fit to the measured curve); bladed, the
 * elliptic-like section (bladedSpokeDrag, Hoerner's elliptic-cylinder data with a viscous floor).
 * @param round true for a round spoke, false for a bladed one
 * @param reynolds Reynolds number on the frontal size (> 0)
 * @param thicknessToWidth bladed section thickness / width, in (0, 1]; ignored (may be 1) for round
 * @throws RangeError when an argument breaks its rule (from the section laws).
 */
export function spokeSectionDrag(round: boolean, reynolds: number, thicknessToWidth: number): number {
  return round ? cylinderDrag(reynolds) : bladedSpokeDrag(reynolds, thicknessToWidth);
}
