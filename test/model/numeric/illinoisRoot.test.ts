import { describe, expect, it } from 'vitest';
import { illinoisRoot } from '../../../src/model/numeric/illinoisRoot';

describe('illinoisRoot', () => {
  it("finds the real root of Wallis's cubic x^3 - 2x - 5 = 0", () => {
    // The classic test equation of root finders (Wallis, used by Newton and Fourier); its real root
    // 2.0945514815423265 (from memory, checked here by the residual too). Tolerance 1e-12.
    const g = (x: number) => x ** 3 - 2 * x - 5;
    const got = illinoisRoot(g, 2, 3, 1e-14);
    const exp = 2.0945514815423265;
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=1e-12`).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(g(got))).toBeLessThan(1e-12);
  });

  it('keeps the root bracketed for a strongly curved function (plain false position stalls here)', () => {
    // exp(10 x) - 2 on [0, 1]: root ln 2 / 10 exactly; one end stays fixed under plain regula falsi.
    const got = illinoisRoot((x) => Math.exp(10 * x) - 2, 0, 1, 1e-13);
    const exp = Math.LN2 / 10;
    expect(Math.abs(got - exp), `got=${got} expected=${exp} tol=1e-12`).toBeLessThanOrEqual(1e-12);
  });

  it('returns lo when g(lo) >= 0 and checks its bracket', () => {
    expect(illinoisRoot((x) => x, 0, 1)).toBe(0);
    expect(() => illinoisRoot((x) => x - 0.5, 1, 0)).toThrow(RangeError);
    expect(() => illinoisRoot((x) => x - 2, 0, 1)).toThrow(/not bracketed/);
    expect(() => illinoisRoot((x) => x, -1, 1, 0)).toThrow(RangeError);
  });
});
