import { describe, expect, it } from 'vitest';
import { lanczosGamma } from '../../../src/model/wind/lanczosGamma';
import { rayleighScaleMps } from '../../../src/model/wind/rayleighScaleMps';
import { weibullMean } from '../../../src/model/wind/weibullMean';
import { weibullQuantile } from '../../../src/model/wind/weibullQuantile';
import { windSpeedNodes } from '../../../src/model/wind/windSpeedNodes';

const rel = (got: number, exp: number) => Math.abs(got - exp) / Math.abs(exp);

describe('lanczosGamma', () => {
  it('matches exact values Gamma(1/2) = sqrt(pi), Gamma(3/2) = sqrt(pi)/2, Gamma(5) = 24 (Abramowitz & Stegun 6.1.8, 6.1.6)', () => {
    const cases: [number, number][] = [
      [0.5, Math.sqrt(Math.PI)],
      [1.5, Math.sqrt(Math.PI) / 2],
      [5, 24],
      [1, 1],
      [0.25, 3.625609908221908], // A&S table 6.1: Gamma(1/4) = 3.6256099082
    ];
    const tol = 1e-13;
    for (const [x, exp] of cases) {
      const got = lanczosGamma(x);
      expect(rel(got, exp), `x=${x} got=${got} expected=${exp} tol=${tol}`).toBeLessThanOrEqual(tol);
    }
  });
});

describe('weibullQuantile / weibullMean / rayleighScaleMps', () => {
  it('the 1 - 1/e quantile is the scale and the median is c (ln 2)^(1/k) (Justus et al. 1978, closed form)', () => {
    for (const [k, c] of [
      [2, 6],
      [1.5, 4],
      [3, 8],
    ] as const) {
      const q = weibullQuantile(1 - Math.exp(-1), k, c);
      expect(rel(q, c), `k=${k} c=${c} got=${q} expected=${c} tol=1e-14`).toBeLessThanOrEqual(1e-14);
      const med = weibullQuantile(0.5, k, c);
      const expMed = c * Math.LN2 ** (1 / k);
      expect(rel(med, expMed), `k=${k} got=${med} expected=${expMed}`).toBeLessThanOrEqual(1e-14);
    }
  });

  it('a Rayleigh distribution of mean 5 m/s has scale 2 x 5 / sqrt(pi) = 5.6419 m/s and mean back (IEC 61400-1 sec. 6.3.1.1; from memory)', () => {
    const c = rayleighScaleMps(5);
    expect(Math.abs(c - 5.641895835), `got=${c} expected=5.641895835 tol=1e-9`).toBeLessThanOrEqual(1e-9);
    const mean = weibullMean(2, c);
    expect(rel(mean, 5), `got=${mean} expected=5 tol=1e-13`).toBeLessThanOrEqual(1e-13);
  });

  it('equal-probability speed nodes average to the Weibull mean (quadrature, 1e-3 relative at 256 nodes)', () => {
    const { speedsMps, weights } = windSpeedNodes({ kind: 'weibull', shapeK: 2, scaleMps: 6 }, 256);
    let m = 0;
    let wsum = 0;
    for (let i = 0; i < speedsMps.length; i++) {
      m += speedsMps[i]! * weights[i]!;
      wsum += weights[i]!;
    }
    const exp = weibullMean(2, 6);
    expect(Math.abs(wsum - 1), `weights sum=${wsum}`).toBeLessThanOrEqual(1e-12);
    expect(rel(m, exp), `node mean=${m} expected=${exp} tol=1e-3`).toBeLessThanOrEqual(1e-3);
  });

  it('rejects bad parameters, naming them', () => {
    expect(() => weibullQuantile(1, 2, 5)).toThrow(/p=1/);
    expect(() => weibullMean(0, 5)).toThrow(/shapeK=0/);
    expect(() => rayleighScaleMps(-1)).toThrow(/meanMps=-1/);
  });
});
