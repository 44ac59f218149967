import { describe, expect, it } from 'vitest';
import { assembleSystem, buildWheelLattice } from '../../../src/model/lattice';
import { cachedWheelLattice, FIXED, FIXED_CHORD_CLUSTERING } from '../../../src/model/wheel/latticeCache';

const bits = (a: Float64Array) => Buffer.from(a.buffer, a.byteOffset, a.byteLength);

describe('cachedWheelLattice', () => {
  it("builds into evicted lattices' influence arrays the bits of a fresh build, and empties the evicted ones", () => {
    // Three sizes (as a convergence study asks) over ten designs: the cache (six lattices) evicts
    // every call from the seventh on, and the next builds of the same size reuse those arrays.
    const sizes = [
      [24, 12],
      [16, 8],
      [11, 5],
    ] as const;
    const got: Array<{ lattice: ReturnType<typeof cachedWheelLattice>; fresh: Float64Array }> = [];
    for (let design = 0; design < 10; design++) {
      const inner = 0.05 + 0.01 * design;
      const annuli = [
        [0, inner],
        [inner + 0.08, 0.28],
      ] as const;
      for (const [span, chord] of sizes) {
        const lattice = cachedWheelLattice(0.334, span, chord, design % 2 === 0, annuli);
        const fresh = buildWheelLattice({
          radiusM: 0.334,
          spanCount: span,
          chordCount: chord,
          ground: design % 2 === 0,
          openAnnuliM: annuli,
        });
        expect(
          bits(lattice.influence).equals(bits(fresh.influence)),
          `design ${design} ${span}x${chord}`,
        ).toBe(true);
        expect(bits(lattice.controlX).equals(bits(fresh.controlX))).toBe(true);
        got.push({ lattice, fresh: fresh.influence });
      }
    }
    // The six most recent are still cached and whole; the older ones have given their arrays away.
    for (const [k, { lattice, fresh }] of got.entries()) {
      if (k >= got.length - 6) expect(bits(lattice.influence).equals(bits(fresh))).toBe(true);
      else expect(lattice.influence.length).toBe(0);
    }
    // Using an evicted lattice fails loudly instead of solving with another lattice's matrix.
    const evicted = got[0]!.lattice;
    expect(() => assembleSystem(evicted, new Float64Array(evicted.panelCount))).toThrow(/evicted/);
  });

  it('keeps the fixed lattice (chordwise clustering, no circles) under its own key', () => {
    const fixed = cachedWheelLattice(0.3, 12, 6, true, FIXED);
    const fresh = buildWheelLattice({
      radiusM: 0.3,
      spanCount: 12,
      chordCount: 6,
      ground: true,
      openAnnuliM: [],
      chordClustering: FIXED_CHORD_CLUSTERING,
    });
    expect(bits(fixed.influence).equals(bits(fresh.influence))).toBe(true);
    expect(cachedWheelLattice(0.3, 12, 6, true, FIXED)).toBe(fixed);
  });
});
