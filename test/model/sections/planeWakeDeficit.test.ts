import { describe, expect, it } from 'vitest';
import { planeWakeDeficit } from '../../../src/model/sections/planeWakeDeficit';

describe('planeWakeDeficit', () => {
  it("gives Schlichting's centre-line deficit 0.98 (x / Cd d)^(-1/2)", () => {
    // Reference: Schlichting, Boundary-Layer Theory, plane turbulent wake (from memory): u1/U =
    // 0.98 (x / (Cd d))^(-1/2). Exact formula: 4 epsilon relative.
    for (const [x, cdd] of [
      [1, 0.01],
      [0.6, 0.0175],
      [5, 0.2],
    ] as const) {
      const got = planeWakeDeficit(x, 0, cdd);
      const exp = 0.98 * Math.sqrt(cdd / x);
      expect(Math.abs(got - exp), `x=${x} Cd d=${cdd} got=${got} expected=${exp}`).toBeLessThanOrEqual(
        4 * Number.EPSILON * exp,
      );
    }
  });

  it('carries the body momentum deficit: integral of the deficit across the wake ~ Cd d / 2 (invariant)', () => {
    // Momentum balance of a 2-D body in its far wake (linearised): D' / (rho U^2) = Cd d / 2 = integral of
    // u/U dy (Schlichting, the plane wake). The published constants give 0.522 Cd d: tolerance 5 %.
    const x = 2;
    const cdd = 0.02;
    let integral = 0;
    const dy = 1e-4;
    for (let y = -1; y <= 1; y += dy) integral += planeWakeDeficit(x, y, cdd) * dy;
    const exp = cdd / 2;
    expect(Math.abs(integral / exp - 1), `integral=${integral} expected=${exp} tol=5%`).toBeLessThanOrEqual(
      0.05,
    );
  });

  it('halves at the half-value width 0.25 (x Cd d)^(1/2), caps at 1, and checks its arguments', () => {
    const x = 1;
    const cdd = 0.04;
    const b = 0.25 * Math.sqrt(x * cdd);
    const ratio = planeWakeDeficit(x, b, cdd) / planeWakeDeficit(x, 0, cdd);
    expect(Math.abs(ratio - 0.5), `ratio=${ratio}`).toBeLessThanOrEqual(1e-12);
    expect(planeWakeDeficit(1e-6, 0, 1)).toBe(1);
    expect(planeWakeDeficit(1, 0, 0)).toBe(0);
    expect(() => planeWakeDeficit(0, 0, 1)).toThrow(RangeError);
    expect(() => planeWakeDeficit(1, Number.NaN, 1)).toThrow(RangeError);
    expect(() => planeWakeDeficit(1, 0, -1)).toThrow(RangeError);
  });
});
