import { describe, expect, it } from 'vitest';
import { leastSquaresCovariance } from '../../../src/model/fit/leastSquaresCovariance';
import { levenbergMarquardt } from '../../../src/model/fit/levenbergMarquardt';

// NIST Statistical Reference Datasets, nonlinear regression, Misra1a (lower difficulty):
// y = b1 (1 - exp(-b2 x)), 14 observations, certified b1 = 2.3894212918E+02, b2 = 5.5015643181E-04,
// standard deviations 2.7070075241E+00 and 7.2668688436E-06, residual sum of squares 1.2455138894E-01,
// residual standard deviation 1.0187876330E-01; starts (500, 1e-4) and (250, 5e-4).
const X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];
const Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.4, 75.47, 81.78];
const residuals = (b: Float64Array, out: Float64Array) => {
  for (let i = 0; i < X.length; i++) out[i] = Y[i]! - b[0]! * (1 - Math.exp(-b[1]! * X[i]!));
};

function lre(got: number, exp: number): number {
  // Log relative error (number of correct significant digits), as NIST StRD reports accuracy.
  return got === exp ? 15 : -Math.log10(Math.abs(got - exp) / Math.abs(exp));
}

describe('levenbergMarquardt', () => {
  for (const start of [
    [500, 1e-4],
    [250, 5e-4],
  ]) {
    it(`solves NIST StRD Misra1a from start (${start}) to >= 6 significant digits, errors to >= 4`, () => {
      const fit = levenbergMarquardt({ residualCount: X.length, residuals, initial: start });
      expect(fit.converged, fit.reason).toBe(true);
      const checks: [string, number, number, number][] = [
        ['b1', fit.params[0]!, 2.3894212918e2, 6],
        ['b2', fit.params[1]!, 5.5015643181e-4, 6],
        ['SSE', fit.sumOfSquares, 1.2455138894e-1, 6],
      ];
      const cov = leastSquaresCovariance(fit.jacobian, X.length, 2, fit.sumOfSquares);
      checks.push(['sd b1', cov.standardErrors[0]!, 2.7070075241, 4]);
      checks.push(['sd b2', cov.standardErrors[1]!, 7.2668688436e-6, 4]);
      checks.push(['residual sd', Math.sqrt(cov.residualVariance), 1.018787633e-1, 6]);
      for (const [name, got, exp, digits] of checks) {
        const l = lre(got, exp);
        expect(
          l,
          `${name}: got=${got} expected=${exp} digits=${l.toFixed(2)} required=${digits}`,
        ).toBeGreaterThanOrEqual(digits);
      }
      expect(cov.dof).toBe(12);
    });
  }

  it('respects bounds: with b1 <= 200 the fit ends on the bound and reports it', () => {
    // Common practice, no source: a bounded minimiser must return a feasible point, on the active bound.
    const fit = levenbergMarquardt({
      residualCount: X.length,
      residuals,
      initial: [150, 1e-3],
      lower: [0, 0],
      upper: [200, 1],
    });
    expect(fit.params[0]).toBe(200);
    expect(fit.atBound).toEqual([true, false]);
    const free = levenbergMarquardt({
      residualCount: X.length,
      residuals,
      initial: [150, 1e-3],
      lower: [0, 0],
    });
    expect(fit.sumOfSquares).toBeGreaterThan(free.sumOfSquares);
    const cov = leastSquaresCovariance(fit.jacobian, X.length, 2, fit.sumOfSquares, fit.atBound);
    expect(Number.isNaN(cov.standardErrors[0]!)).toBe(true);
    expect(cov.standardErrors[1]! > 0).toBe(true);
    expect(cov.dof).toBe(13);
  });

  it('fits a straight line exactly (zero residual; 1e-10 absolute)', () => {
    // Exact: y = 2 + 3 x through 5 points.
    const xs = [0, 1, 2, 3, 4];
    const fit = levenbergMarquardt({
      residualCount: 5,
      residuals: (b, out) => {
        for (let i = 0; i < 5; i++) out[i] = 2 + 3 * xs[i]! - (b[0]! + b[1]! * xs[i]!);
      },
      initial: [0, 0],
    });
    expect(Math.abs(fit.params[0]! - 2), `a got=${fit.params[0]}`).toBeLessThanOrEqual(1e-10);
    expect(Math.abs(fit.params[1]! - 3), `b got=${fit.params[1]}`).toBeLessThanOrEqual(1e-10);
  });

  it('flags an undetermined parameter through a singular J^T J', () => {
    const fit = levenbergMarquardt({
      residualCount: 3,
      residuals: (b, out) => {
        for (let i = 0; i < 3; i++) out[i] = i - (b[0]! + b[1]!);
      },
      initial: [0, 0],
    });
    const cov = leastSquaresCovariance(fit.jacobian, 3, 2, fit.sumOfSquares);
    expect(cov.determined).toBe(false);
  });

  it('rejects bad input naming the argument', () => {
    expect(() => levenbergMarquardt({ residualCount: 0, residuals, initial: [1, 1] })).toThrow(
      /residualCount=0/,
    );
    expect(() =>
      levenbergMarquardt({ residualCount: 14, residuals, initial: [1, 1], lower: [2, 0], upper: [1, 1] }),
    ).toThrow(/lower=2/);
    expect(() => levenbergMarquardt({ residualCount: 14, residuals, initial: [Number.NaN, 1] })).toThrow(
      /initial\[0\]/,
    );
  });
});
