import { luFactor } from '../numeric/luFactor';
import { luWorkspace } from '../numeric/luWorkspace';
import { assembleSystem } from './assembleSystem';
import { solveFactored } from './solveFactored';
import type { LatticeSolution, RingLattice } from './types';

// Module-private scratch for the system matrix and its pivots: the factors are used once here and
// never returned, so one buffer per thread serves every solve (grown when a larger lattice comes).
// Where the LU runs in WebAssembly the matrix is assembled straight into the kernel's memory
// (luWorkspace) and factorised and solved there: no n x n copy in or out.
let scratchMatrix = new Float64Array(0);
let scratchPivots = new Int32Array(0);

/**
 * The lattice with porous panels solved for unit forcing (V = 1 m/s, V sin(beta) = 1 m/s): the
 * system of `assembleSystem` LU-factorised (`luFactor`) and solved (`solveFactored`) (vortex-lattice
 * method, Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 12.3). The same operations as
 * `solveFactored(factorLattice(lattice, openness))`, hence the same bits, but the n x n system lives
 * in a reused buffer (the LU kernel's memory where it runs) instead of a fresh one per solve. Use
 * `factorLattice` to keep a factorisation.
 */
export function solveLattice(lattice: RingLattice, openness: Float64Array): LatticeSolution {
  const n = lattice.panelCount;
  if (scratchPivots.length < n) scratchPivots = new Int32Array(n);
  let matrix = luWorkspace(n);
  if (matrix === null) {
    if (scratchMatrix.length < n * n) scratchMatrix = new Float64Array(n * n);
    matrix = scratchMatrix;
  }
  const lu = assembleSystem(lattice, openness, matrix);
  luFactor(lu, n, scratchPivots);
  return solveFactored({ lattice, openness, lu, pivots: scratchPivots });
}
