import type { RingLattice } from './types';

/**
 * Induced-drag coefficient from the Trefftz plane (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed.,
 * ch. 8, induced drag of the trailing vortex sheet far downstream; Bertin & Cummings, Aerodynamics
 * for Engineers, ch. 7): the wake of strip k carries its trailing ring's circulation Gamma_k, so a
 * trailing vortex of strength Gamma_(k-1) - Gamma_k leaves each strip edge. Far downstream these
 * are 2-D point vortices (plus their images about z = groundZM, of opposite sign); the normal
 * velocity w_k they induce at each strip's control station gives
 *   D_i = -0.5 rho sum_k Gamma_k w_k width_k      (>= 0 for a lifting wing: w is a downwash),
 * returned as D_i / (q S) for rho = 1, V = 1 m/s: with the unit-forcing circulations this is the
 * induced-drag coefficient per sin^2(beta). `gamma` holds the ring circulations (m^2/s).
 */
export function trefftzInducedDrag(lattice: RingLattice, gamma: Float64Array): number {
  const { spanCount, chordCount, edgeZ, groundZM } = lattice;
  if (gamma.length !== lattice.panelCount) {
    throw new RangeError(
      `trefftzInducedDrag: gamma.length=${gamma.length} must equal panelCount=${lattice.panelCount}`,
    );
  }
  const ground = Number.isFinite(groundZM);
  const g2 = 2 * groundZM;
  let drag = 0;
  for (let s = 0; s < spanCount; s++) {
    const zc = lattice.controlZ[s * chordCount]!;
    let w = 0;
    for (let k = 0; k <= spanCount; k++) {
      const below = k > 0 ? gamma[k * chordCount - 1]! : 0;
      const above = k < spanCount ? gamma[(k + 1) * chordCount - 1]! : 0;
      const strength = below - above; // along -x
      if (strength === 0) continue;
      // 2-D vortex along -x at (y, z) = (0, z_k): v_y = strength / (2 pi (z - z_k)).
      w += strength / (2 * Math.PI * (zc - edgeZ[k]!));
      if (ground) w -= strength / (2 * Math.PI * (zc - (g2 - edgeZ[k]!)));
    }
    drag -= gamma[(s + 1) * chordCount - 1]! * w * (edgeZ[s + 1]! - edgeZ[s]!);
  }
  // D / (q S) with q = 0.5 rho V^2, rho = V = 1: (0.5 * drag) / (0.5 * S).
  return drag / lattice.referenceAreaM2;
}
