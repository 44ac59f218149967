import type { RingLattice } from './types';

/** Suction per unit span = rho Gamma_1^2 / (4 dx) on the 1/4-3/4 lattice (see edgeSuctionShares). */
const SUCTION_FACTOR = 0.25;

/** Where the lattice's leading-edge suction sits: per strip at the outer (leading) edge, and at inner edges. */
export interface EdgeSuctionShares {
  /** Share of the lattice's leading-edge suction at each strip's leading panel (the wheel's outer edge, the
   * tyre), spanCount values. */
  outerEdgeShare: Float64Array;
  /** Share at inner edges: solid panels that follow a porous panel in their strip (a rim bed or a cover
   * edge behind the open spoked region). outerEdgeShare sums with it to 1 (0 and 0 when nothing loads). */
  innerEdgeShare: number;
  /** The estimates themselves for rho = 1 kg/m^3 (N per unit forcing squared): per strip at the outer edge,
   * and summed over inner edges. */
  outerEdgeSuction: Float64Array;
  innerEdgeSuction: number;
}

/**
 * Splits a solved lattice's leading-edge suction among its edges. The vortex sheet of a thin section
 * behaves near a leading edge as gamma(x) ~ 2 C / sqrt(x) (thin-aerofoil theory; Katz & Plotkin,
 * Low-Speed Aerodynamics, 2nd ed., sec. 5.3), and the edge's suction force per unit span is
 * pi rho C^2 (the same section; Lan 1974, J. Aircraft 11(9):518, computes it from the singularity in
 * just this way). The edge panel's bound circulation is the sheet integrated over the panel,
 * Gamma_1 ~ 4 C sqrt(a dx) over the part a dx of the panel its bound vortex represents, so the suction
 * per unit span is pi rho Gamma_1^2 / (16 a dx). On the 1/4-3/4 lattice a = pi / 4: the estimate
 * rho Gamma_1^2 / (4 dx) then converges to the exact 2-D flat-plate suction pi rho V^2 alpha^2 c as the
 * chordwise panels shrink (measured: 0.94, 0.97, 0.98, 0.99 of it at 4, 8, 16, 32 uniform panels; tested).
 * Gamma_1 is the edge panel's circulation jump and dx its chord. Only the shares are used by the
 * wheel, and they do not depend on the constant.
 *
 * Edges with a singularity: each strip's leading panel (the disc's outer edge, the tyre: always
 * solid at its leading edge) and every solid panel whose upstream neighbour is porous (openness > 0).
 * On a lattice that does not follow the region edges (`solid` given: each panel's solid area share), a
 * solid region's edge can fall inside a partly solid panel; the first wholly solid panel behind a
 * partly solid one then takes the circulation jump over both, on the solid length behind the edge
 * (its chord plus the solid share of the partial panel's), the same estimate with the edge panel
 * measured from the edge. A porous region's own leading edge carries none:
 * the through-flow removes the square-root singularity (Hajian & Jaworski 2017, Proc. R. Soc. A 473:
 * 20170266, porous-edge aerofoil), and so does an open panel following a solid one (a trailing edge).
 * The shares are relative: the total suction comes from the lattice's force balance (Polhamus 1966).
 *
 * @param gamma ring circulations of a solution (any consistent forcing)
 * @param openness panel openness used in that solution (0 solid .. 1 open)
 * @param solid optional solid area share of each panel (0..1); without it a panel is solid when its
 * openness is 0
 */
export function edgeSuctionShares(
  lattice: RingLattice,
  gamma: Float64Array,
  openness: Float64Array,
  solid?: Float64Array,
): EdgeSuctionShares {
  const n = lattice.panelCount;
  if (gamma.length !== n || openness.length !== n || (solid !== undefined && solid.length !== n)) {
    throw new RangeError(
      `edgeSuctionShares: gamma (${gamma.length}), openness (${openness.length}) and solid (${solid?.length}) must have panelCount=${n} entries`,
    );
  }
  const spans = lattice.spanCount;
  const chords = lattice.chordCount;
  const outer = new Float64Array(spans);
  const outerRaw = new Float64Array(spans);
  let inner = 0;
  let total = 0;
  for (let s = 0; s < spans; s++) {
    const first = s * chords;
    for (let c = 0; c < chords; c++) {
      const p = first + c;
      let jump: number;
      let length = lattice.chordLengthM[p]!;
      if (c === 0) {
        jump = gamma[p]!;
      } else if (openness[p]! === 0 && (solid === undefined || solid[p]! === 1) && openness[p - 1]! > 0) {
        const part = solid === undefined ? 0 : solid[p - 1]!;
        if (part > 0 && part < 1) {
          // The edge lies inside the partly solid panel upstream: the jump over it and this panel,
          // on the solid length behind the edge.
          jump = gamma[p]! - (c > 1 ? gamma[p - 2]! : 0);
          length += part * lattice.chordLengthM[p - 1]!;
        } else {
          jump = gamma[p]! - gamma[p - 1]!;
        }
      } else {
        continue;
      }
      const suction = (SUCTION_FACTOR * jump * jump * lattice.spanWidthM[p]!) / length;
      if (c === 0) outer[s] = outerRaw[s] = suction;
      else inner += suction;
      total += suction;
    }
  }
  const innerRaw = inner;
  if (total > 0) {
    for (let s = 0; s < spans; s++) outer[s]! /= total;
    inner /= total;
  }
  return {
    outerEdgeShare: outer,
    innerEdgeShare: inner,
    outerEdgeSuction: outerRaw,
    innerEdgeSuction: innerRaw,
  };
}
