import { describe, expect, it } from 'vitest';
import { traceStreamline } from '../../../src/model/flowField/traceStreamline';
import { buildWheelLattice } from '../../../src/model/lattice/buildWheelLattice';
import { rectangularLattice } from '../../../src/model/lattice/rectangularLattice';
import { solveLattice } from '../../../src/model/lattice/solveLattice';

const EPS = Number.EPSILON;
const R = 0.334;

/** A solid wheel-sized disc standing on the ground, solved for unit forcing. */
function solvedDisc() {
  const lattice = buildWheelLattice({
    radiusM: R,
    spanCount: 16,
    chordCount: 8,
    ground: true,
    openAnnuliM: [],
  });
  const { gamma } = solveLattice(lattice, new Float64Array(lattice.panelCount));
  return { lattice, gamma };
}

/** Circulations at airspeed V and yaw b: unit-forcing gamma times the normal velocity V sin(b). */
function scaled(gamma: Float64Array, v: number, b: number): Float64Array {
  return gamma.map((g) => g * v * Math.sin(b));
}

describe('traceStreamline', () => {
  it('zero circulation: a straight line along the freestream with exact step length, tol 16 eps', () => {
    const { lattice } = solvedDisc();
    const zero = new Float64Array(lattice.panelCount);
    const u = [-12 * Math.cos(0.3), 12 * Math.sin(0.3), 0];
    const seed = [0.8, -0.3, 0.1];
    const steps = 30;
    const out = new Float64Array(3 * (steps + 1));
    const n = traceStreamline(lattice, zero, u, seed, 0.05, steps, out);
    expect(n).toBe(steps + 1);
    const e = [-Math.cos(0.3), Math.sin(0.3), 0];
    for (let k = 0; k < n; k++) {
      for (let j = 0; j < 3; j++) {
        const exp = seed[j]! + k * 0.05 * e[j]!;
        const got = out[3 * k + j]!;
        const tol = 16 * EPS * (1 + k);
        expect(
          Math.abs(got - exp),
          `k=${k} j=${j} got=${got} expected=${exp} tol=${tol}`,
        ).toBeLessThanOrEqual(tol);
      }
    }
  });

  it('far from the loaded wheel the line stays straight: lateral drift over 1 m at 20 R < 1e-3 R (common practice, no source)', () => {
    const { lattice, gamma } = solvedDisc();
    const b = (10 * Math.PI) / 180;
    const g = scaled(gamma, 10, b);
    const u = [-10 * Math.cos(b), 10 * Math.sin(b), 0];
    const seed = [0.5, 20 * R, 2];
    const out = new Float64Array(3 * 21);
    const n = traceStreamline(lattice, g, u, seed, 0.05, 20, out);
    // Distance of the end point from the straight line through the seed along the freestream.
    const dx = out[3 * (n - 1)]! - seed[0]!;
    const dy = out[3 * (n - 1) + 1]! - seed[1]!;
    const dz = out[3 * (n - 1) + 2]! - seed[2]!;
    const along = -dx * Math.cos(b) + dy * Math.sin(b);
    const off = Math.sqrt(Math.max(0, dx * dx + dy * dy + dz * dz - along * along));
    expect(off, `drift=${off} m tol=${1e-3 * R}`).toBeLessThanOrEqual(1e-3 * R);
  });

  it('streamlines of a straight line vortex are circles (Batchelor, An Introduction to Fluid Dynamics, sec. 2.6; from memory): radius kept within 1e-3', () => {
    // One ring 2 km long: near its middle its bound segment is a 2-D point vortex, the far legs add < 1e-6.
    const lat = rectangularLattice(2000, 1, 1, 1, -1000, Number.NaN);
    const gamma = Float64Array.from([2]);
    const xc = 0.5 - 0.25; // the bound segment at the quarter chord
    const r = 0.05;
    const steps = 126; // about one turn of 2 pi r at step r / 20
    const out = new Float64Array(3 * (steps + 1));
    const n = traceStreamline(lat, gamma, [0, 0, 0], [xc + r, 0, 0], r / 20, steps, out);
    expect(n).toBe(steps + 1);
    let worst = 0;
    for (let k = 0; k < n; k++) {
      const d = Math.hypot(out[3 * k]! - xc, out[3 * k + 1]!);
      worst = Math.max(worst, Math.abs(d - r) / r);
      expect(Math.abs(out[3 * k + 2]!), `k=${k} z stays 0`).toBeLessThanOrEqual(1e-9);
    }
    expect(worst, `worst relative radius error=${worst} tol=1e-3`).toBeLessThanOrEqual(1e-3);
    // Counter-clockwise about +z seen from above for positive circulation: starts moving toward +y.
    expect(out[4]!).toBeGreaterThan(0);
  });

  it('never crosses the ground plane z = -R; a line aimed at it ends on it', () => {
    const { lattice, gamma } = solvedDisc();
    const b = (15 * Math.PI) / 180;
    const g = scaled(gamma, 10, b);
    const out = new Float64Array(3 * 201);
    // A freestream tilted down into the ground (not physical for the wheel, a test of the stop rule).
    const n = traceStreamline(lattice, g, [-10, 1, -3], [0.6, -0.2, -0.1], 0.03, 200, out);
    expect(n).toBeLessThan(201);
    for (let k = 0; k < n; k++) expect(out[3 * k + 2]!, `k=${k}`).toBeGreaterThanOrEqual(-R);
    expect(out[3 * (n - 1) + 2]).toBe(-R);
    // And the wheel's own flow never pushes a low line through it.
    for (const z of [-0.3, -0.25, -0.15]) {
      const m = traceStreamline(
        lattice,
        g,
        [-10 * Math.cos(b), 10 * Math.sin(b), 0],
        [0.7, -0.15, z],
        0.03,
        100,
        out,
      );
      for (let k = 0; k < m; k++) expect(out[3 * k + 2]!, `seed z=${z} k=${k}`).toBeGreaterThanOrEqual(-R);
    }
  });

  it('yaw -> -yaw mirrors y exactly (the lattice is the plane y = 0), tol 64 eps', () => {
    const { lattice, gamma } = solvedDisc();
    const b = (12 * Math.PI) / 180;
    const steps = 40;
    const a = new Float64Array(3 * (steps + 1));
    const c = new Float64Array(3 * (steps + 1));
    const na = traceStreamline(
      lattice,
      scaled(gamma, 10, b),
      [-10 * Math.cos(b), 10 * Math.sin(b), 0],
      [0.5, -0.12, 0.2],
      0.03,
      steps,
      a,
    );
    const nc = traceStreamline(
      lattice,
      scaled(gamma, 10, -b),
      [-10 * Math.cos(b), -10 * Math.sin(b), 0],
      [0.5, 0.12, 0.2],
      0.03,
      steps,
      c,
    );
    expect(nc).toBe(na);
    let bent = 0;
    for (let k = 0; k < na; k++) {
      const tol = 64 * EPS;
      expect(Math.abs(c[3 * k]! - a[3 * k]!), `k=${k} x`).toBeLessThanOrEqual(tol);
      expect(Math.abs(c[3 * k + 1]! + a[3 * k + 1]!), `k=${k} y`).toBeLessThanOrEqual(tol);
      expect(Math.abs(c[3 * k + 2]! - a[3 * k + 2]!), `k=${k} z`).toBeLessThanOrEqual(tol);
      bent = Math.max(bent, Math.abs(a[3 * k + 2]! - 0.2));
    }
    expect(bent, 'the wheel deflects the line (the test is not trivially symmetric)').toBeGreaterThan(1e-3);
  });

  it('stops beyond maxDistanceM and at a stagnation point, and names bad arguments', () => {
    const { lattice } = solvedDisc();
    const zero = new Float64Array(lattice.panelCount);
    const out = new Float64Array(3 * 101);
    const n = traceStreamline(lattice, zero, [-1, 0, 0], [0, 0.5, 0], 0.1, 100, out, 1);
    // Points at distance sqrt(0.25 + (0.1 k)^2) > 1 first for k = 9.
    expect(n).toBe(10);
    expect(traceStreamline(lattice, zero, [0, 0, 0], [0, 0.5, 0], 0.1, 100, out)).toBe(1);
    expect(() => traceStreamline(lattice, zero, [-1, 0], [0, 0, 0], 0.1, 3, out)).toThrow(
      /freestreamMps.length=2/,
    );
    expect(() => traceStreamline(lattice, zero, [-1, 0, 0], [0, 0, 0], -1, 3, out)).toThrow(/stepM=-1/);
    expect(() => traceStreamline(lattice, zero, [-1, 0, 0], [0, 0, 0], 0.1, 3, new Float64Array(5))).toThrow(
      /out.length=5/,
    );
    expect(() => traceStreamline(lattice, zero, [-1, 0, 0], [0, 0, -1], 0.1, 3, out)).toThrow(/seed z=-1/);
  });
});
