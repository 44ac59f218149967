import { describe, expect, it } from 'vitest';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { edgeSuctionShares } from '../../../src/model/lattice/edgeSuctionShares';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

describe('edgeSuctionShares', () => {
  it('converges to the 2-D flat-plate leading-edge suction pi rho V^2 alpha^2 c on a long wing', () => {
    // Reference: thin-aerofoil theory (Katz & Plotkin, Low-Speed Aerodynamics, 2nd ed., sec. 5.3): a flat
    // plate's leading-edge suction per unit span is S' = pi rho V^2 alpha^2 c = L'^2 / (pi rho V^2 c), with
    // L' = rho V Gamma the section lift. Checked at mid-span of a wing of aspect ratio 200, where the section
    // is 2-D at its effective incidence. Band: the estimate's first-order convergence in the leading
    // panel's chord (measured 0.97 of the exact value at 8 panels, 0.99 at 32).
    const cases = [
      { chordCount: 8, lo: 0.95, hi: 1.0 },
      { chordCount: 32, lo: 0.98, hi: 1.01 },
    ];
    for (const { chordCount, lo, hi } of cases) {
      const span = 200;
      const spanCount = 40;
      const lattice = rectangularLattice(span, 1, spanCount, chordCount, -span / 2, Number.NaN);
      const open = new Float64Array(lattice.panelCount);
      const sol = solveLattice(lattice, open);
      const e = edgeSuctionShares(lattice, sol.gamma, open);
      const s = spanCount / 2;
      const sectionLift = sol.gamma[s * chordCount + chordCount - 1]!; // rho = V = 1
      const exact = (sectionLift * sectionLift) / Math.PI;
      const got = e.outerEdgeSuction[s]! / (span / spanCount);
      const ratio = got / exact;
      expect(
        ratio >= lo && ratio <= hi,
        `M=${chordCount} got=${got} exact=${exact} ratio=${ratio} band=[${lo}, ${hi}]`,
      ).toBe(true);
    }
  });

  it('puts all of a solid disc suction at its outer edge and shares sum to 1 (invariant)', () => {
    const lattice = buildWheelLattice({
      radiusM: 0.33,
      spanCount: 16,
      chordCount: 8,
      ground: false,
      openAnnuliM: [],
    });
    const open = new Float64Array(lattice.panelCount);
    const sol = solveLattice(lattice, open);
    const e = edgeSuctionShares(lattice, sol.gamma, open);
    let sum = 0;
    for (const v of e.outerEdgeShare) sum += v;
    expect(e.innerEdgeShare, `inner=${e.innerEdgeShare}`).toBe(0);
    expect(Math.abs(sum - 1), `sum=${sum}`).toBeLessThanOrEqual(1e-12);
    // Symmetric about the disc's centre line without ground: strip s mirrors strip spanCount-1-s.
    for (let s = 0; s < 8; s++) {
      const a = e.outerEdgeShare[s]!;
      const b = e.outerEdgeShare[15 - s]!;
      expect(Math.abs(a - b), `strip ${s}: ${a} vs ${b}`).toBeLessThanOrEqual(1e-9 * (a + b));
    }
  });

  it('gives an open ring part of its suction at the inner (porous-bounded) edge', () => {
    const R = 0.33;
    const lattice = buildWheelLattice({
      radiusM: R,
      spanCount: 24,
      chordCount: 12,
      ground: false,
      openAnnuliM: [[0, 0.26]],
    });
    const open = new Float64Array(lattice.panelCount);
    for (let p = 0; p < lattice.panelCount; p++) {
      const r = Math.hypot(lattice.centroidX[p]!, lattice.centroidZ[p]!);
      open[p] = r < 0.26 ? 0.6 : 0;
    }
    const sol = solveLattice(lattice, open);
    const e = edgeSuctionShares(lattice, sol.gamma, open);
    let outer = 0;
    for (const v of e.outerEdgeShare) outer += v;
    expect(e.innerEdgeShare > 0.05 && e.innerEdgeShare < 0.95, `inner=${e.innerEdgeShare}`).toBe(true);
    expect(Math.abs(outer + e.innerEdgeShare - 1)).toBeLessThanOrEqual(1e-12);
  });

  it('with solid shares of 0 and 1 gives the same shares as without them (invariant)', () => {
    const lattice = buildWheelLattice({
      radiusM: 0.33,
      spanCount: 16,
      chordCount: 8,
      ground: true,
      openAnnuliM: [[0, 0.26]],
    });
    const open = new Float64Array(lattice.panelCount);
    const solid = new Float64Array(lattice.panelCount);
    for (let p = 0; p < lattice.panelCount; p++) {
      const inside = Math.hypot(lattice.centroidX[p]!, lattice.centroidZ[p]!) < 0.26;
      open[p] = inside ? 0.7 : 0;
      solid[p] = inside ? 0 : 1;
    }
    const sol = solveLattice(lattice, open);
    const a = edgeSuctionShares(lattice, sol.gamma, open);
    const b = edgeSuctionShares(lattice, sol.gamma, open, solid);
    expect(b.innerEdgeShare).toBe(a.innerEdgeShare);
    expect([...b.outerEdgeShare]).toEqual([...a.outerEdgeShare]);
  });

  it('checks its arguments', () => {
    const lattice = rectangularLattice(2, 1, 2, 2, 0, Number.NaN);
    expect(() => edgeSuctionShares(lattice, new Float64Array(3), new Float64Array(4))).toThrow(RangeError);
  });
});
