import { describe, expect, it } from 'vitest';
import { NEWTONS_PER_LBF, toSI, UNIT_TO_SI } from '../../../src/compute/compare/quantities';

describe('unit factors', () => {
  it('match NIST SP 811 (2008) appendix B definitions (exact formulas, 2 epsilon relative)', () => {
    // Reference: NIST SP 811 B.8/B.9: gram-force = 9.80665e-3 N, kilogram-force = 9.80665 N (exact),
    // pound-force = 4.4482216152605 N (exact), cm^2 = 1e-4 m^2, km/h = 0.2777... m/s, mile per hour =
    // 0.44704 m/s (exact), degree = pi/180 rad.
    const cases: [string, number, number][] = [
      ['gf', UNIT_TO_SI.gf, 9.80665e-3],
      ['kgf', UNIT_TO_SI.kgf, 9.80665],
      ['lbf', UNIT_TO_SI.lbf, 4.4482216152605],
      ['cm2', UNIT_TO_SI.cm2, 1e-4],
      ['kmh', UNIT_TO_SI.kmh, 1 / 3.6],
      ['mph', UNIT_TO_SI.mph, 0.44704],
      ['deg', UNIT_TO_SI.deg, Math.PI / 180],
      ['Nmm', UNIT_TO_SI.Nmm, 1e-3],
      ['N', UNIT_TO_SI.N, 1],
    ];
    for (const [name, got, exp] of cases) {
      const tol = 2 * Number.EPSILON * exp;
      expect(Math.abs(got - exp), `${name}: got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
    expect(Math.abs(NEWTONS_PER_LBF - 4.4482216152605)).toBeLessThanOrEqual(4 * Number.EPSILON * 4.45);
  });
  it('converts 250 g-force to 2.4516625 N (1 gf = g0 / 1000 N; 2 epsilon)', () => {
    const got = toSI(250, 'gf');
    expect(Math.abs(got - 2.4516625), `got=${got}`).toBeLessThanOrEqual(2 * Number.EPSILON * 2.45);
  });
});
