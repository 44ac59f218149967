import { describe, expect, it } from 'vitest';
import { saturationVapourPressure } from '../../../src/model/air/saturationVapourPressure';

// Reference: IAPWS-95 steam tables (Wagner & Pruss 2002), saturation pressure of water, from memory:
// 0.01 C: 611.66 Pa (triple point), 20 C: 2339.2 Pa, 40 C: 7384.9 Pa, 100 C: 101418 Pa.
// Buck (1981/1996) claims ~0.05 % over -40..50 C; at 100 C we allow 0.2 %.
const CASES = [
  { tC: 0.01, p: 611.66, tol: 5e-4 },
  { tC: 20, p: 2339.2, tol: 5e-4 },
  { tC: 40, p: 7384.9, tol: 5e-4 },
  { tC: 100, p: 101418, tol: 2e-3 },
];

describe('saturationVapourPressure', () => {
  it('matches steam-table saturation pressures', () => {
    for (const c of CASES) {
      const got = saturationVapourPressure(c.tC + 273.15);
      const rel = Math.abs(got / c.p - 1);
      expect(rel, `T=${c.tC} C got=${got} expected=${c.p} tol(rel)=${c.tol}`).toBeLessThanOrEqual(c.tol);
    }
  });

  it('rejects temperatures outside -50..100 C', () => {
    expect(() => saturationVapourPressure(200)).toThrow(/temperatureK/);
    expect(() => saturationVapourPressure(400)).toThrow(RangeError);
  });
});
