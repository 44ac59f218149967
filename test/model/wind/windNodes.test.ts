import { describe, expect, it } from 'vitest';
import { weightedHistogram } from '../../../src/model/wind/weightedHistogram';
import { weightedQuantile } from '../../../src/model/wind/weightedQuantile';
import { windDirectionNodes } from '../../../src/model/wind/windDirectionNodes';
import { windStates } from '../../../src/model/wind/windStates';

describe('windDirectionNodes', () => {
  it('uniform nodes integrate cos^2 to exactly 1/2 (trapezoidal rule on a periodic function, Davis & Rabinowitz sec. 2.9)', () => {
    const { fromRad, weights } = windDirectionNodes({ kind: 'uniform' }, 36);
    let s = 0;
    for (let j = 0; j < fromRad.length; j++) s += weights[j]! * Math.cos(fromRad[j]!) ** 2;
    expect(Math.abs(s - 0.5), `got=${s} expected=0.5 tol=1e-14`).toBeLessThanOrEqual(1e-14);
  });

  it('sector weights are normalised and kept per sector (definition)', () => {
    const { fromRad, weights } = windDirectionNodes({ kind: 'sectors', weights: [3, 1, 0, 0] }, 40);
    let head = 0;
    let total = 0;
    for (let j = 0; j < fromRad.length; j++) {
      total += weights[j]!;
      if (Math.abs(fromRad[j]!) < Math.PI / 4) head += weights[j]!;
    }
    expect(Math.abs(total - 1), `total=${total}`).toBeLessThanOrEqual(1e-14);
    expect(Math.abs(head - 0.75), `head sector weight=${head} expected=0.75`).toBeLessThanOrEqual(1e-14);
    expect(() => windDirectionNodes({ kind: 'sectors', weights: [0, 0] }, 8)).toThrow(/must not all be zero/);
  });
});

describe('windStates', () => {
  it('product weights sum to 1 and speeds are scaled (Fubini; definition)', () => {
    const s = windStates(
      { speedsMps: Float64Array.of(1, 2), weights: Float64Array.of(0.25, 0.75) },
      { fromRad: Float64Array.of(0, Math.PI), weights: Float64Array.of(0.5, 0.5) },
      2,
    );
    expect(Array.from(s.speedsMps)).toEqual([2, 2, 4, 4]);
    expect(Array.from(s.weights)).toEqual([0.125, 0.125, 0.375, 0.375]);
  });
});

describe('weightedQuantile', () => {
  it('equal weights: the 0.9 quantile of 1..10 is 9 (Hyndman & Fan 1996, definition 1)', () => {
    const v = Float64Array.from({ length: 10 }, (_, i) => 10 - i);
    const w = new Float64Array(10).fill(1);
    expect(weightedQuantile(v, w, 0.9)).toBe(9);
    expect(weightedQuantile(v, w, 0.91)).toBe(10);
  });
  it('weights count as repeated values (definition)', () => {
    expect(weightedQuantile(Float64Array.of(1, 2), Float64Array.of(9, 1), 0.9)).toBe(1);
    expect(weightedQuantile(Float64Array.of(1, 2), Float64Array.of(8, 2), 0.9)).toBe(2);
  });
});

describe('weightedHistogram', () => {
  it('uniform values give a density of 1 / range (Silverman 1986, sec. 2.2)', () => {
    const n = 1000;
    const v = Float64Array.from({ length: n }, (_, i) => ((i + 0.5) / n) * 10);
    const { density, fractionAbove } = weightedHistogram(v, new Float64Array(n).fill(1), 1, 10);
    for (let b = 0; b < 10; b++) {
      expect(Math.abs(density[b]! - 0.1), `bin ${b} got=${density[b]} expected=0.1`).toBeLessThanOrEqual(
        1e-12,
      );
    }
    expect(fractionAbove).toBe(0);
    const half = weightedHistogram(v, new Float64Array(n).fill(1), 1, 5);
    expect(Math.abs(half.fractionAbove - 0.5), `fraction above=${half.fractionAbove}`).toBeLessThanOrEqual(
      1e-12,
    );
  });
});
