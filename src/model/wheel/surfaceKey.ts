import { spokeScreenKey } from './spokeScreen';
import type { ModelOptions, WheelGeometry } from './types';
import type { WheelRadii } from './wheelRadii';

/**
 * Everything that determines the lifting surface's solution, as a string: lattice geometry (radius,
 * ground, counts), the region radii, the spokes' screen (count, section, porosity scale),
 * the rotation ratio, the lattice kind, and whether coarser lattices are solved for the convergence index. Two cases with
 * equal keys share one factorisation.
 */
export function surfaceKey(
  wheel: WheelGeometry,
  radii: WheelRadii,
  options: ModelOptions,
  rotationRatio: number,
): string {
  return [
    radii.outerRadiusM,
    options.ground ? 1 : 0,
    options.latticeSpanCount,
    options.latticeChordCount,
    options.gridConvergence ? 1 : 0,
    radii.rimInnerRadiusM,
    radii.hubRadiusM,
    radii.coverInnerRadiusM,
    radii.coverOuterRadiusM,
    wheel.spokeCount,
    spokeScreenKey(wheel),
    options.porosityScale,
    rotationRatio.toPrecision(12),
    ...(options.fixedLattice ? ['fixed'] : []),
  ].join('|');
}
