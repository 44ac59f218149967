import { luSolve } from '../numeric/luSolve';
import { porousDragSlope } from './porousDragSlope';
import { trefftzInducedDrag } from './trefftzInducedDrag';
import type { LatticeFactor, LatticeSolution } from './types';

/**
 * Solves a factorised lattice for a normal forcing and reduces the loads (linear theory, V = 1 m/s,
 * rho = 1 kg/m^3, coefficients on q S with S = lattice.referenceAreaM2):
 * - panel normal force rho V (Gamma_i - Gamma_up) width_i at the bound-vortex midpoint
 *   (Kutta-Joukowski on the bound segment; Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3);
 * - centre of pressure: load-weighted mean of the bound points;
 * - induced drag from the Trefftz plane (`trefftzInducedDrag`);
 * - porous dissipation drag (`porousDragSlope`).
 * `normalVelocityMps` is the freestream's normal velocity at each control point; by default 1 m/s
 * everywhere (V sin(beta) = 1), for which normalSlope is Kp and the drags are per sin^2(beta).
 */
export function solveFactored(factor: LatticeFactor, normalVelocityMps?: Float64Array): LatticeSolution {
  const { lattice, openness, lu, pivots } = factor;
  const n = lattice.panelCount;
  const chordCount = lattice.chordCount;
  if (normalVelocityMps !== undefined && normalVelocityMps.length !== n) {
    throw new RangeError(
      `solveFactored: normalVelocityMps.length=${normalVelocityMps.length} must equal panelCount=${n}`,
    );
  }
  const gamma = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const vn = normalVelocityMps === undefined ? 1 : normalVelocityMps[i]!;
    if (!Number.isFinite(vn)) {
      throw new RangeError(`solveFactored: normalVelocityMps[${i}]=${vn} must be finite`);
    }
    gamma[i] = (openness[i]! - 1) * vn;
  }
  luSolve(lu, n, pivots, gamma);
  const qS = 0.5 * lattice.referenceAreaM2;
  const panelNormalCoefficient = new Float64Array(n);
  let normal = 0;
  let momentX = 0;
  let momentZ = 0;
  for (let i = 0; i < n; i++) {
    const jump = i % chordCount === 0 ? gamma[i]! : gamma[i]! - gamma[i - 1]!;
    const cn = (jump * lattice.spanWidthM[i]!) / qS;
    panelNormalCoefficient[i] = cn;
    normal += cn;
    momentX += cn * lattice.boundX[i]!;
    momentZ += cn * lattice.boundZ[i]!;
  }
  const inducedDragSlope = trefftzInducedDrag(lattice, gamma);
  return {
    gamma,
    panelNormalCoefficient,
    normalSlope: normal,
    inducedDragFactor: normal === 0 ? 0 : inducedDragSlope / (normal * normal),
    inducedDragSlope,
    porousDragSlope: porousDragSlope(lattice, gamma, openness),
    centreX: normal === 0 ? Number.NaN : momentX / normal,
    centreZ: normal === 0 ? Number.NaN : momentZ / normal,
  };
}
