import { laminarFlatPlateFriction } from './laminarFlatPlateFriction';
import { prandtlSchlichtingFriction } from './prandtlSchlichtingFriction';

/**
 * Constant A of the laminar-turbulent flat-plate law C_f = 0.455/(log10 Re)^2.58 - A/Re (Prandtl;
 * Schlichting, Boundary-Layer Theory, ch. 21): the turbulent deficit of the laminar leading part.
 * A = Re_t (C_f,turb(Re_t) - C_f,lam(Re_t)), which makes the mixed law continuous at Re_t.
 * Schlichting tabulates A = 1050, 1700, 3300, 8700 for Re_t = 3e5, 5e5, 1e6, 3e6; this continuity choice
 * gives 970, 1614, 3143, 8709 (the tabulated ones were evaluated with a different turbulent law, so
 * they leave a jump of up to 9 % at Re_t).
 */

/**
 * @throws RangeError when transitionReynolds is not finite or below 1e4.
 */
export function flatPlateTransitionConstant(transitionReynolds: number): number {
  if (!Number.isFinite(transitionReynolds) || transitionReynolds < 1e4) {
    throw new RangeError(`transitionReynolds=${transitionReynolds}: must be finite and >= 1e4`);
  }
  return (
    transitionReynolds *
    (prandtlSchlichtingFriction(transitionReynolds) - laminarFlatPlateFriction(transitionReynolds))
  );
}
