import { describe, expect, it } from 'vitest';
import { studentTCdf } from '../../../src/model/fit/studentTCdf';
import { studentTQuantile } from '../../../src/model/fit/studentTQuantile';

describe('studentTQuantile', () => {
  it('matches the published two-sided 95% critical values t(0.975, dof) (table rounding, 5e-4)', () => {
    // Reference: NIST/SEMATECH e-Handbook of Statistical Methods, table 1.3.6.7.2 (critical values of
    // Student's t), column 0.025 upper tail.
    const table: [number, number][] = [
      [1, 12.706],
      [2, 4.303],
      [3, 3.182],
      [4, 2.776],
      [5, 2.571],
      [10, 2.228],
      [12, 2.179],
      [20, 2.086],
      [30, 2.042],
      [100, 1.984],
    ];
    for (const [dof, exp] of table) {
      const got = studentTQuantile(0.975, dof);
      const tol = 5e-4;
      expect(Math.abs(got - exp), `dof=${dof} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(
        tol,
      );
    }
  });

  it('matches the closed forms for 1 and 2 degrees of freedom (relative 1e-12)', () => {
    // Reference: dof = 1 is the Cauchy law, t = tan(pi (p - 1/2)); dof = 2: t = (2p - 1) / sqrt(2 p (1 - p))
    // (e.g. W. T. Shaw 2006, J. Computational Finance 9(4), "Sampling Student's T distribution", eqs. for n = 1, 2).
    for (const p of [0.6, 0.9, 0.975, 0.995, 0.3]) {
      const e1 = Math.tan(Math.PI * (p - 0.5));
      const e2 = (2 * p - 1) / Math.sqrt(2 * p * (1 - p));
      const g1 = studentTQuantile(p, 1);
      const g2 = studentTQuantile(p, 2);
      expect(Math.abs(g1 - e1), `p=${p} dof=1 got=${g1} expected=${e1}`).toBeLessThanOrEqual(
        1e-12 * Math.abs(e1),
      );
      expect(Math.abs(g2 - e2), `p=${p} dof=2 got=${g2} expected=${e2}`).toBeLessThanOrEqual(
        1e-12 * Math.abs(e2),
      );
    }
  });

  it('inverts the CDF and rejects bad arguments', () => {
    const t = studentTQuantile(0.9, 7.5);
    expect(Math.abs(studentTCdf(t, 7.5) - 0.9)).toBeLessThanOrEqual(1e-13);
    expect(studentTQuantile(0.5, 3)).toBe(0);
    expect(() => studentTQuantile(1, 3)).toThrow(/p=1/);
    expect(() => studentTQuantile(0.9, 0)).toThrow(/dof=0/);
  });
});
