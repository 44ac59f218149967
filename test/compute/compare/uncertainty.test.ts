import { describe, expect, it } from 'vitest';
import { convergenceStudy, propagateUncertainty } from '../../../src/compute/compare/index';
import { gridConvergenceIndex } from '../../../src/model/convergence/index';
import { gridPoints, testCase } from './helpers';

describe('convergenceStudy', () => {
  it('reports three lattices and, per output, the Celik et al. (2008) GCI of the three values', () => {
    // The procedure itself is checked against Celik et al. 2008 Table 1 in
    // test/model/convergence/gridConvergenceIndex.test.ts; here each row must be that procedure applied
    // to the row's own three values (exact reuse, 0 tolerance).
    const caseFile = testCase();
    const pts = gridPoints([13.9], 1.2, [5, 15]);
    const study = convergenceStudy(caseFile, pts, { span: 18, chord: 12, ratio: 1.5 });
    expect(study.lattices.map((l) => [l.span, l.chord])).toEqual([
      [18, 12],
      [12, 8],
      [8, 5],
    ]);
    expect(study.rows.length).toBe(2 * 5);
    for (const r of study.rows) {
      const g = gridConvergenceIndex({
        h1: study.lattices[0]!.h_m,
        h2: study.lattices[1]!.h_m,
        h3: study.lattices[2]!.h_m,
        phi1: r.values[0],
        phi2: r.values[1],
        phi3: r.values[2],
      });
      expect(r.status).toBe(g.status);
      if (Number.isFinite(g.gciRelative)) expect(r.gci_relative).toBe(g.gciRelative);
      else expect(r.gci_relative).toBeNull();
    }
    expect(() => convergenceStudy(caseFile, pts, { ratio: 1 })).toThrow(/ratio=1/);
  });
});

describe('propagateUncertainty', () => {
  const caseFile = testCase({ grid_convergence: false });
  const pts = gridPoints([13.9], 1.2, [0, 10]);

  it('scales the force bands with a density range (forces ~ rho; Reynolds effects aside)', () => {
    // Dynamic pressure is linear in rho; only the Reynolds-number dependence of friction and section
    // drag breaks the proportionality, so the band of a force lies within nominal x [1.1, 1.3] / 1.2
    // (to 3%) and side force and drag share nearly the same factor (3%, common practice, no source).
    const band = propagateUncertainty(
      caseFile,
      pts,
      1.2,
      [{ name: 'air_density_kgpm3', min: 1.1, max: 1.3 }],
      {
        samples: 32,
        seed: 3,
      },
    );
    const axial0 = band.rows.find((r) => r.output === 'axial_N' && r.yaw_deg === 0)!;
    expect(axial0.lower).toBeLessThan(axial0.nominal);
    expect(axial0.upper).toBeGreaterThan(axial0.nominal);
    expect(axial0.lower / axial0.nominal).toBeGreaterThanOrEqual((1.1 / 1.2) * 0.97);
    expect(axial0.upper / axial0.nominal).toBeLessThanOrEqual((1.3 / 1.2) * 1.03);
    const side10 = band.rows.find((r) => r.output === 'side_N' && r.yaw_deg === 10)!;
    const rel = (x: number) => x / side10.nominal;
    expect(
      Math.abs(rel(side10.lower) - axial0.lower / axial0.nominal),
      'side and drag share the density factor',
    ).toBeLessThan(0.03);
    expect(rel(side10.upper)).toBeGreaterThan(1);
  });

  it('is reproducible with a seed and changes with another', () => {
    const ranges = [{ name: 'suction_recovered' as const, min: 0.3, max: 0.7 }];
    const a = propagateUncertainty(caseFile, pts, 1.2, ranges, { samples: 16, seed: 9 });
    const b = propagateUncertainty(caseFile, pts, 1.2, ranges, { samples: 16, seed: 9 });
    const c = propagateUncertainty(caseFile, pts, 1.2, ranges, { samples: 16, seed: 10 });
    expect(a.rows).toEqual(b.rows);
    expect(a.rows).not.toEqual(c.rows);
    expect(a.method).toMatch(/mulberry32 seed 9/);
  });

  it('rejects bad ranges naming them', () => {
    expect(() =>
      propagateUncertainty(caseFile, pts, 1.2, [{ name: 'suction_recovered', min: 0.5, max: 1.5 }]),
    ).toThrow(/ranges\.suction_recovered: min=0.5, max=1.5/);
    expect(() => propagateUncertainty(caseFile, pts, 1.2, [])).toThrow(/at least one/);
    expect(() =>
      propagateUncertainty(caseFile, pts, 1.2, [{ name: 'suction_recovered', min: 0.3, max: 0.4 }], {
        samples: 1,
      }),
    ).toThrow(/samples=1/);
  });
});
