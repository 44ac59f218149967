import { factorLattice } from './factorLattice';
import { solveFactored } from './solveFactored';
import type { LatticeSolution, RingLattice } from './types';

/**
 * The lattice with porous panels solved for unit forcing (V = 1 m/s, V sin(beta) = 1 m/s):
 * `factorLattice` then `solveFactored` (vortex-lattice method, Katz & Plotkin, Low-Speed
 * Aerodynamics, 2nd ed., sec. 12.3). Use those two directly to reuse the factorisation.
 */
export function solveLattice(lattice: RingLattice, openness: Float64Array): LatticeSolution {
  return solveFactored(factorLattice(lattice, openness));
}
