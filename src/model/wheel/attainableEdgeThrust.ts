/**
 * Largest suction (as -Cp, on the dynamic pressure of the flow normal to the edge) that a round edge
 * holds before its boundary layer separates, from the measured pressure distribution of a circular
 * cylinder in cross-flow (Achenbach 1968, J. Fluid Mech. 34:625; from memory): the subcritical flow
 * (laminar separation, Re < 2e5 on the diameter) reaches a minimum Cp of about -1.2; past the drag
 * crisis (Re > 5e5, turbulent separation further aft) about -2.4. Log-linear between. This is the
 * limiting pressure of the attainable-thrust idea of Carlson, Mack & Barger 1979 (NASA TP-1500), taken
 * here from round-section data instead of their aerofoil correlation, because the tyre is a round
 * section at subcritical Reynolds numbers.
 *
 * @param reynolds V d / nu on the edge's diameter (> 0)
 * @throws RangeError when reynolds is not finite and > 0.
 */
export function roundEdgeSuctionLimit(reynolds: number): number {
  if (!(reynolds > 0) || !Number.isFinite(reynolds)) {
    throw new RangeError(`reynolds=${reynolds}: must be finite and > 0`);
  }
  const SUBCRITICAL = 1.2;
  const SUPERCRITICAL = 2.4;
  if (reynolds <= 2e5) return SUBCRITICAL;
  if (reynolds >= 5e5) return SUPERCRITICAL;
  const t = Math.log(reynolds / 2e5) / Math.log(5e5 / 2e5);
  return SUBCRITICAL + t * (SUPERCRITICAL - SUBCRITICAL);
}

/**
 * Attainable leading-edge thrust (N) of a round edge of radius r along a strip of a circular disc's
 * leading edge between heights z0 and z1, in the spirit of Carlson, Mack & Barger 1979 (NASA TP-1500):
 * the thrust an edge realises is the theoretical suction only while the suction peak it needs stays
 * above a limiting pressure; past that, the edge holds at most that limiting suction over its
 * forward-facing nose. The nose's projection normal to the thrust is r, so the thrust per unit edge
 * length is at most  -Cp_lim q_n r,  with q_n the dynamic pressure of the flow normal to the edge
 * (the edge-normal in-plane part V cos(beta) cos(Lambda) and the through-plane part V sin(beta); the
 * part along the edge does not load it: sweep independence, R. T. Jones 1947, NACA Rep. 863). For the
 * disc's edge x = sqrt(R^2 - z^2), cos^2(Lambda) = 1 - z^2 / R^2 and the thrust along x per unit
 * height equals the thrust per unit edge length, so the bound is
 *   -Cp_lim q r [cos^2(beta) ((z1 - z0) - (z1^3 - z0^3) / (3 R^2)) + sin^2(beta) (z1 - z0)].
 *
 * @param dynamicPressurePa q = 0.5 rho V^2 (Pa, >= 0)
 * @param yawRad beta (rad)
 * @param edgeRadiusM r, the edge's nose radius (m, > 0)
 * @param discRadiusM R (m, > 0), z0 <= z1 within [-R, R]
 * @param suctionLimit -Cp_lim (>= 0), e.g. roundEdgeSuctionLimit
 */
export function attainableEdgeThrust(
  dynamicPressurePa: number,
  yawRad: number,
  edgeRadiusM: number,
  discRadiusM: number,
  z0M: number,
  z1M: number,
  suctionLimit: number,
): number {
  const c = Math.cos(yawRad);
  const s = Math.sin(yawRad);
  return attainableEdgeThrustAt(dynamicPressurePa, c, s, edgeRadiusM, discRadiusM, z0M, z1M, suctionLimit);
}

/** attainableEdgeThrust with cos(beta) and sin(beta) given (a point's strips share them): the same
 * checks and operations, so the same bits. */
export function attainableEdgeThrustAt(
  dynamicPressurePa: number,
  c: number,
  s: number,
  edgeRadiusM: number,
  discRadiusM: number,
  z0M: number,
  z1M: number,
  suctionLimit: number,
): number {
  if (!(dynamicPressurePa >= 0) || !Number.isFinite(dynamicPressurePa)) {
    throw new RangeError(`dynamicPressurePa=${dynamicPressurePa}: must be finite and >= 0`);
  }
  if (!(edgeRadiusM > 0) || !(discRadiusM > 0)) {
    throw new RangeError(`edgeRadiusM=${edgeRadiusM} and discRadiusM=${discRadiusM}: must be > 0`);
  }
  const R = discRadiusM;
  if (!(z0M >= -R * (1 + 1e-12) && z1M <= R * (1 + 1e-12) && z1M >= z0M)) {
    throw new RangeError(`strip [${z0M}, ${z1M}] m: must satisfy -R <= z0 <= z1 <= R (R = ${R})`);
  }
  if (!(suctionLimit >= 0)) throw new RangeError(`suctionLimit=${suctionLimit}: must be >= 0`);
  const h = z1M - z0M;
  const normalPart = h - (z1M * z1M * z1M - z0M * z0M * z0M) / (3 * R * R);
  return suctionLimit * dynamicPressurePa * edgeRadiusM * (c * c * normalPart + s * s * h);
}
