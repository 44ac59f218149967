import { describe, expect, it } from 'vitest';
import { buildStripLattice } from '../../../src/model/lattice/buildStripLattice';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

describe('buildStripLattice', () => {
  it('2-D flat plate: a very long rectangular wing has lift slope 2 pi (thin-aerofoil theory, Anderson, Fundamentals of Aerodynamics sec. 4.7; exact for the 1/4-3/4 rule at any chordwise count, James 1972 - from memory)', () => {
    for (const chordCount of [1, 4, 10]) {
      const chord = 1;
      const span = 1e6; // one strip: the tip vortices' downwash at mid-span is O(chord/span)
      const lattice = rectangularLattice(span, chord, 1, chordCount, -span / 2, Number.NaN);
      const sol = solveLattice(lattice, new Float64Array(lattice.panelCount));
      const expected = 2 * Math.PI;
      const tol = 1e-4 * expected;
      expect(
        Math.abs(sol.normalSlope - expected),
        `M=${chordCount} got=${sol.normalSlope} expected=${expected} tol=${tol}`,
      ).toBeLessThanOrEqual(tol);
      // Centre of pressure at the quarter chord (thin-aerofoil theory): x = chord/2 - chord/4.
      const cpTol = 1e-3 * chord;
      expect(
        Math.abs(sol.centreX - chord / 4),
        `M=${chordCount} x_cp=${sol.centreX} expected=${chord / 4}`,
      ).toBeLessThanOrEqual(cpTol);
    }
  });

  it('puts the panel geometry where stated (trapezoid areas sum to the planform, exact)', () => {
    const lattice = rectangularLattice(2, 0.5, 4, 3, 0, Number.NaN);
    let area = 0;
    for (let i = 0; i < lattice.panelCount; i++) area += lattice.areaM2[i]!;
    expect(Math.abs(area - 1), `area=${area}`).toBeLessThanOrEqual(8 * Number.EPSILON);
    // Panel (0,0): bound vortex at its quarter chord, control point at its three-quarter chord.
    const dx = 0.5 / 3;
    expect(Math.abs(lattice.boundX[0]! - (0.25 - 0.25 * dx))).toBeLessThanOrEqual(1e-15);
    expect(Math.abs(lattice.controlX[0]! - (0.25 - 0.75 * dx))).toBeLessThanOrEqual(1e-15);
    expect(Math.abs(lattice.centroidX[0]! - (0.25 - 0.5 * dx))).toBeLessThanOrEqual(1e-15);
  });

  it('checks its arguments', () => {
    const base = {
      edgeZ: Float64Array.from([0, 1]),
      edgeLeadingX: Float64Array.from([0, 0]),
      edgeChordM: Float64Array.from([1, 1]),
      controlZ: Float64Array.from([0.5]),
      controlLeadingX: Float64Array.from([0]),
      controlChordM: Float64Array.from([1]),
      chordFractions: Float64Array.from([0, 1]),
      groundZM: Number.NaN,
      referenceAreaM2: 1,
    };
    expect(() => buildStripLattice({ ...base, controlZ: Float64Array.from([1.5]) })).toThrow(
      /controlZ\[0\]=1.5/,
    );
    expect(() => buildStripLattice({ ...base, chordFractions: Float64Array.from([0, 0.5]) })).toThrow(
      /chordFractions/,
    );
    expect(() => buildStripLattice({ ...base, groundZM: 0.5 })).toThrow(/groundZM=0.5/);
    expect(() => buildStripLattice({ ...base, edgeChordM: Float64Array.from([0, 0]) })).toThrow(/zero chord/);
  });
});
