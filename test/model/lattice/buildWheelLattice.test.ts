import { describe, expect, it } from 'vitest';
import { buildDiscLattice, buildWheelLattice, solveLattice } from '../../../src/model/lattice';

describe('buildWheelLattice', () => {
  it('without region circles is the disc lattice (same geometry, same influence matrix)', () => {
    for (const ground of [false, true]) {
      const disc = buildDiscLattice({ radiusM: 0.33, spanCount: 16, chordCount: 8, ground });
      const wheel = buildWheelLattice({
        radiusM: 0.33,
        spanCount: 16,
        chordCount: 8,
        ground,
        openAnnuliM: [],
      });
      expect(wheel.panelCount).toBe(disc.panelCount);
      let worst = 0;
      let scale = 0;
      for (let i = 0; i < disc.influence.length; i++) {
        worst = Math.max(worst, Math.abs(disc.influence[i]! - wheel.influence[i]!));
        scale = Math.max(scale, Math.abs(disc.influence[i]!));
      }
      // Same kernels summed in another order: agreement to rounding.
      expect(worst, `ground=${ground} worst=${worst}`).toBeLessThanOrEqual(1e-12 * scale);
      const a = solveLattice(disc, new Float64Array(disc.panelCount));
      const b = solveLattice(wheel, new Float64Array(wheel.panelCount));
      expect(Math.abs(a.normalSlope - b.normalSlope)).toBeLessThanOrEqual(1e-12);
    }
  });

  it('puts strip edges at the tops and bottoms of the region circles and no panel across a circle', () => {
    const annuli: Array<[number, number]> = [
      [0.03, 0.12],
      [0.2, 0.26],
    ];
    const lattice = buildWheelLattice({
      radiusM: 0.334,
      spanCount: 20,
      chordCount: 12,
      ground: true,
      openAnnuliM: annuli,
    });
    for (const r of [0.03, 0.12, 0.2, 0.26]) {
      for (const z of [-r, r])
        expect(
          lattice.edgeZ.some((e) => Math.abs(e - z) < 1e-12),
          `edge at z=${z}`,
        ).toBe(true);
    }
    // Panels follow the circles: the panels whose centroids lie in the open annuli cover their area
    // (to the polygon's second-order error).
    let openArea = 0;
    for (let q = 0; q < lattice.panelCount; q++) {
      const r = Math.hypot(lattice.centroidX[q]!, lattice.centroidZ[q]!);
      if (annuli.some(([a, b]) => r > a && r < b)) openArea += lattice.areaM2[q]!;
    }
    const exact = annuli.reduce((sum, [a, b]) => sum + Math.PI * (b * b - a * a), 0);
    expect(Math.abs(openArea / exact - 1), `open area ${openArea} vs ${exact}`).toBeLessThan(0.01);
  });

  it('converges for a disc with a porous ring (ground on): side-force slope settles within 1%', () => {
    // Convergence check of the method itself (no published value): slopes on three refinements.
    const annuli: Array<[number, number]> = [[0.03, 0.2]];
    const slope = (spanCount: number, chordCount: number) => {
      const lattice = buildWheelLattice({
        radiusM: 0.334,
        spanCount,
        chordCount,
        ground: true,
        openAnnuliM: annuli,
      });
      const openness = new Float64Array(lattice.panelCount);
      for (let p = 0; p < lattice.panelCount; p++) {
        const r = Math.hypot(lattice.centroidX[p]!, lattice.centroidZ[p]!);
        openness[p] = r > 0.03 && r < 0.2 ? 0.95 : 0;
      }
      return solveLattice(lattice, openness).normalSlope;
    };
    const fine = slope(48, 24);
    const medium = slope(24, 12);
    expect(Math.abs(medium / fine - 1), `24x12 ${medium} vs 48x24 ${fine}`).toBeLessThan(0.01);
  });
});
