import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CELIK_TABLE_1 } from '../../../src/compute/validation/referenceValues';
import { gridConvergenceIndex } from '../../../src/model/convergence/gridConvergenceIndex';

describe('gridConvergenceIndex', () => {
  it('reproduces the worked example of Celik et al. 2008, Table 1 (to the paper rounding)', () => {
    // Reference: Celik et al. (2008), J. Fluids Eng. 130, 078001, Table 1, first column (from memory):
    // N1 = 18000, N2 = 8000, N3 = 4500 cells in 2-D (h = N^-1/2, r21 = 1.5, r32 = 1.333),
    // phi = 6.063, 5.972, 5.863 -> p = 1.53, phi_ext21 = 6.1685, e_a21 = 1.5 %, e_ext21 = 1.7 %, GCI21 = 2.2 %.
    // Tolerances: half a unit in the last printed digit.
    const h = (n: number) => Math.sqrt(1 / n);
    const t = CELIK_TABLE_1;
    const got = gridConvergenceIndex({
      h1: h(t.cells[0]),
      h2: h(t.cells[1]),
      h3: h(t.cells[2]),
      phi1: t.phi[0],
      phi2: t.phi[1],
      phi3: t.phi[2],
    });
    const checks: [string, number, number, number][] = [
      ['r21', got.refinementRatio21, 1.5, 5e-13],
      ['r32', got.refinementRatio32, 1.333, 5e-4],
      ['p', got.observedOrder, t.observedOrder.value, t.observedOrder.tolAbs],
      ['phi_ext21', got.extrapolated, t.extrapolated21.value, t.extrapolated21.tolAbs],
      [
        'e_a21',
        got.approximateRelativeError21,
        t.approximateRelativeError21.value,
        t.approximateRelativeError21.tolAbs,
      ],
      [
        'e_ext21',
        got.extrapolatedRelativeError21,
        t.extrapolatedRelativeError21.value,
        t.extrapolatedRelativeError21.tolAbs,
      ],
      ['GCI21', got.gciRelative, t.gci21.value, t.gci21.tolAbs],
    ];
    for (const [name, g, e, tol] of checks) {
      expect(Math.abs(g - e), `${name}: got=${g} expected=${e} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
    expect(got.status).toBe('monotonic');
    expect(got.fine).toBe(t.phi[0]);
  });

  it('recovers the order of manufactured monotone data phi = E + C h^p (1e-6 absolute on p)', () => {
    // Common practice, no source: Richardson-type data with exact order p must return p, and phi_ext = E.
    // Tolerance 1e-6: the differences of nearly equal phi lose digits (r = 1.1, p = 4 gives e21 ~ 1e-5).
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 4, noNaN: true }),
        fc.double({ min: 1.1, max: 2.5, noNaN: true }),
        fc.double({ min: 1.1, max: 2.5, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }).filter((c) => Math.abs(c) > 0.1),
        (p, r21, r32, c) => {
          const h1 = 0.1;
          const h2 = h1 * r21;
          const h3 = h2 * r32;
          const E = 1;
          const res = gridConvergenceIndex({
            h1,
            h2,
            h3,
            phi1: E + c * h1 ** p,
            phi2: E + c * h2 ** p,
            phi3: E + c * h3 ** p,
          });
          const tolP = 1e-6;
          expect(
            Math.abs(res.observedOrder - p),
            `p=${p} r21=${r21} r32=${r32} C=${c} got=${res.observedOrder} tol=${tolP}`,
          ).toBeLessThanOrEqual(tolP);
          expect(
            Math.abs(res.extrapolated - E),
            `phi_ext got=${res.extrapolated} expected=${E}`,
          ).toBeLessThanOrEqual(1e-9);
          expect(res.status).toBe('monotonic');
        },
      ),
      { numRuns: 200, seed: 20080701 },
    );
  });

  it('flags oscillatory convergence and recovers the order of alternating data', () => {
    // phi1 = E + C h1^p, phi2 = E - C h2^p, phi3 = E + C h3^p gives |e32/e21| = r21^p (r32^p + 1)/(r21^p + 1),
    // the s = -1 form of Celik's eq. (3); p = 2, r21 = 2, r32 = 1.5.
    const h1 = 0.1;
    const h2 = 0.2;
    const h3 = 0.3;
    const res = gridConvergenceIndex({ h1, h2, h3, phi1: 1 + h1 ** 2, phi2: 1 - h2 ** 2, phi3: 1 + h3 ** 2 });
    expect(res.status).toBe('oscillatory');
    expect(
      Math.abs(res.observedOrder - 2),
      `got p=${res.observedOrder} expected=2 tol=1e-9`,
    ).toBeLessThanOrEqual(1e-9);
    expect(Number.isFinite(res.gciRelative)).toBe(true);
  });

  it('returns NaN and status divergent when the differences grow under refinement (never throws)', () => {
    // e21 = 0.1, e32 = 0.05: the finer pair differs more than the coarser one. Celik's |.| form alone would
    // still return a positive p here; the status must say divergent.
    const res = gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: 1, phi2: 1.1, phi3: 1.15 });
    expect(res.status).toBe('divergent');
    expect(Number.isNaN(res.observedOrder)).toBe(true);
    expect(Number.isNaN(res.gciRelative)).toBe(true);
    const osc = gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: 1, phi2: 1.2, phi3: 1.1 });
    expect(osc.status).toBe('divergent');
  });

  it('handles identical and degenerate values and non-finite solutions without throwing', () => {
    const same = gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: 3, phi2: 3, phi3: 3 });
    expect(same.status).toBe('identical');
    expect(same.gciRelative).toBe(0);
    const half = gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: 3, phi2: 3, phi3: 3.1 });
    expect(half.status).toBe('indeterminate');
    expect(Number.isNaN(half.observedOrder)).toBe(true);
    const nan = gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: Number.NaN, phi2: 3, phi3: 3.1 });
    expect(nan.status).toBe('indeterminate');
  });

  it('rejects unordered or non-positive cell sizes', () => {
    expect(() => gridConvergenceIndex({ h1: 2, h2: 1, h3: 4, phi1: 1, phi2: 2, phi3: 3 })).toThrow(/h2/);
    expect(() => gridConvergenceIndex({ h1: 0, h2: 1, h3: 4, phi1: 1, phi2: 2, phi3: 3 })).toThrow(/h1/);
    expect(() =>
      gridConvergenceIndex({ h1: 1, h2: 2, h3: 4, phi1: 1, phi2: 2, phi3: 3, safetyFactor: 0.5 }),
    ).toThrow(/safetyFactor/);
  });
});
