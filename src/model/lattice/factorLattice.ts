import { luFactor } from '../numeric/luFactor';
import { assembleSystem } from './assembleSystem';
import type { LatticeFactor, RingLattice } from './types';

/**
 * Assembles the porous lattice system (`assembleSystem`) and LU-factorises it once (`luFactor`).
 * The problem is linear in the normal freestream V sin(beta), so one factorisation serves every
 * yaw angle and speed of a geometry (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3:
 * the influence matrix depends on geometry only).
 */
export function factorLattice(lattice: RingLattice, openness: Float64Array): LatticeFactor {
  const n = lattice.panelCount;
  const lu = assembleSystem(lattice, openness);
  const pivots = new Int32Array(n);
  luFactor(lu, n, pivots);
  return { lattice, openness: Float64Array.from(openness), lu, pivots };
}
