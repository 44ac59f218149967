import type { RingLattice } from './types';

/**
 * Drag from the through-flow dissipation in porous panels, per sin^2(beta), on S = referenceAreaM2
 * (linear theory, V = 1 m/s, rho = 1 kg/m^3): the sum over panels with 0 < o < 1 of pressure jump x
 * through-flow x area / (q S), with the pressure jump rho V gamma_i (gamma_i the panel's sheet strength,
 * its circulation jump over its chord) and the through-flow o / (1 - o) gamma_i of the solved porous
 * condition (assembleSystem). o = 1 panels carry gamma = 0 and dissipate nothing.
 */
export function porousDragSlope(lattice: RingLattice, gamma: Float64Array, openness: Float64Array): number {
  const n = lattice.panelCount;
  if (gamma.length !== n || openness.length !== n) {
    throw new RangeError(
      `porousDragSlope: gamma (${gamma.length}) and openness (${openness.length}) must have panelCount=${n} entries`,
    );
  }
  const qS = 0.5 * lattice.referenceAreaM2;
  const chordCount = lattice.chordCount;
  let dissipation = 0;
  for (let i = 0; i < n; i++) {
    const o = openness[i]!;
    if (o > 0 && o < 1) {
      const jump = i % chordCount === 0 ? gamma[i]! : gamma[i]! - gamma[i - 1]!;
      const sheet = jump / lattice.chordLengthM[i]!;
      dissipation += ((o / (1 - o)) * sheet * sheet * lattice.areaM2[i]!) / qS;
    }
  }
  return dissipation;
}
