import { flatPlateTransitionConstant } from './flatPlateTransitionConstant';
import { laminarFlatPlateFriction } from './laminarFlatPlateFriction';
import { prandtlSchlichtingFriction } from './prandtlSchlichtingFriction';

/**
 * Mean skin-friction coefficient of one side of a smooth flat plate with natural transition
 * (Schlichting, Boundary-Layer Theory, ch. 21): Blasius 1.328/sqrt(Re) below the transition Reynolds
 * number, Prandtl-Schlichting 0.455/(log10 Re)^2.58 - A/Re above it, A from flatPlateTransitionConstant
 * (continuous at the transition). transitionReynolds = Infinity keeps the plate laminar.
 */

/**
 * @param reynolds plate Reynolds number U L / nu (> 0)
 * @param transitionReynolds Re at which the boundary layer turns turbulent (>= 1e4, or Infinity), default 5e5
 * @throws RangeError when an argument breaks its rule.
 */
export function flatPlateFriction(reynolds: number, transitionReynolds = 5e5): number {
  if (!Number.isFinite(reynolds) || reynolds <= 0) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  if (Number.isNaN(transitionReynolds) || transitionReynolds < 1e4) {
    throw new RangeError(
      `transitionReynolds=${transitionReynolds}: must be >= 1e4 (or Infinity for laminar)`,
    );
  }
  if (reynolds <= transitionReynolds) return laminarFlatPlateFriction(reynolds);
  return prandtlSchlichtingFriction(reynolds) - flatPlateTransitionConstant(transitionReynolds) / reynolds;
}
