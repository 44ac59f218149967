import { buildStripLattice } from './buildStripLattice';
import type { StripLattice } from './types';

/**
 * A flat rectangular wing (used for the 2-D flat-plate check of the lattice, Anderson, Fundamentals of
 * Aerodynamics sec. 4.7) of the given span (z from z0 to z0 + span) and chord
 * (leading edge at x = chord / 2), uniform strips with control points at mid-span, uniform panels.
 */
export function rectangularLattice(
  spanM: number,
  chordM: number,
  spanCount: number,
  chordCount: number,
  z0M: number,
  groundZM: number,
): StripLattice {
  const edgeZ = new Float64Array(spanCount + 1);
  for (let k = 0; k <= spanCount; k++) edgeZ[k] = z0M + (spanM * k) / spanCount;
  const controlZ = new Float64Array(spanCount);
  for (let s = 0; s < spanCount; s++) controlZ[s] = z0M + (spanM * (s + 0.5)) / spanCount;
  const chordFractions = new Float64Array(chordCount + 1);
  for (let m = 0; m <= chordCount; m++) chordFractions[m] = m / chordCount;
  return buildStripLattice({
    edgeZ,
    edgeLeadingX: new Float64Array(spanCount + 1).fill(chordM / 2),
    edgeChordM: new Float64Array(spanCount + 1).fill(chordM),
    controlZ,
    controlLeadingX: new Float64Array(spanCount).fill(chordM / 2),
    controlChordM: new Float64Array(spanCount).fill(chordM),
    chordFractions,
    groundZM,
    referenceAreaM2: spanM * chordM,
  });
}
