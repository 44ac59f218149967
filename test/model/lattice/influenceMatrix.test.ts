import { describe, expect, it } from 'vitest';
import { influenceMatrix } from '../../../src/model/lattice/influenceMatrix';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';

describe('influenceMatrix', () => {
  it('gives a single horseshoe the closed-form normal velocity (Katz & Plotkin sec. 2.13 segment + semi-infinite legs)', () => {
    // One strip, one panel, chord c, span b: bound vortex at c/4 (x = c/4 from LE at c/2: x = c/4),
    // legs from x = c/2 - 1.25 c = -3c/4 to -infinity; control point at 3c/4 chord (x = -c/4), mid-span.
    const b = 2;
    const c = 0.5;
    const lat = rectangularLattice(b, c, 1, 1, -1, Number.NaN);
    const d = c / 2; // control point is half a chord behind the bound vortex
    const h = b / 2;
    // Bound: Gamma/(4 pi d) * 2 h / sqrt(h^2 + d^2), along -y (downwash) for a +z bound vortex.
    const bound = (1 / (4 * Math.PI * d)) * ((2 * h) / Math.hypot(h, d));
    // Two chordwise sides (length c, from x = c/4 to -3c/4) and two legs: together a semi-infinite
    // vortex starting at x = c/4 at distance h each: 1/(4 pi h) (1 + d / sqrt(d^2 + h^2)).
    const trailing = 2 * (1 / (4 * Math.PI * h)) * (1 + d / Math.hypot(d, h));
    const expected = -(bound + trailing);
    const got = lat.influence[0]!;
    const tol = 16 * Number.EPSILON * Math.abs(expected);
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
  });

  it('with ground adds the mirror image: for one ring, the image equals the free ring mirrored to z in [-2, -1] (method of images)', () => {
    // Mirroring about z = -0.5 reverses the ring's sense of traversal, and the image carries -Gamma:
    // together this is the same ring translated to [-2, -1] with +Gamma (its bound segment again along +z).
    const free = rectangularLattice(1, 0.4, 1, 1, 0, Number.NaN);
    const grounded = rectangularLattice(1, 0.4, 1, 1, 0, -0.5);
    const imageFree = rectangularLattice(1, 0.4, 1, 1, -2, Number.NaN);
    const tmp = new Float64Array(1);
    influenceMatrix(imageFree.edgeZ, imageFree.nodeX, 1, free.controlX, free.controlZ, Number.NaN, tmp);
    const expected = free.influence[0]! + tmp[0]!;
    const got = grounded.influence[0]!;
    const tol = 16 * Number.EPSILON * Math.abs(expected);
    expect(Math.abs(got - expected), `got=${got} expected=${expected} tol=${tol}`).toBeLessThanOrEqual(tol);
    // The image of a lifting ring below it induces upwash at the ring: |A| decreases (ground effect).
    expect(
      Math.abs(got),
      `|A_ground|=${Math.abs(got)} < |A_free|=${Math.abs(free.influence[0]!)}`,
    ).toBeLessThan(Math.abs(free.influence[0]!));
  });

  it('checks its arguments', () => {
    const lat = rectangularLattice(1, 1, 2, 2, 0, Number.NaN);
    expect(() =>
      influenceMatrix(lat.edgeZ, lat.nodeX, 2, lat.controlX, lat.controlZ, Number.NaN, new Float64Array(3)),
    ).toThrow(/out.length=3/);
    expect(() =>
      influenceMatrix(lat.edgeZ, lat.nodeX, 3, lat.controlX, lat.controlZ, Number.NaN, new Float64Array(36)),
    ).toThrow(/nodeX.length/);
  });
});
