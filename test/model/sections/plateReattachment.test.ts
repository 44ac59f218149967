import { describe, expect, it } from 'vitest';
import { plateReattachment } from '../../../src/model/sections/plateReattachment';

describe('plateReattachment', () => {
  it('is 0 where the shear layers roll up beyond the plate and 1 where they reattach', () => {
    // Reference: Apelt, West & Szewczyk 1973, J. Fluid Mech. 61:187 and Apelt & West 1975, J. Fluid Mech.
    // 71:145 (from memory): the shear layers close on the plate from L/D ~ 2; shedding is suppressed and
    // they reattach from L/D ~ 5. The thresholds are the published regimes; exact at the stated points.
    expect(plateReattachment(0)).toBe(0);
    expect(plateReattachment(0.9)).toBe(0);
    expect(plateReattachment(2)).toBe(0);
    expect(plateReattachment(3.5)).toBeCloseTo(0.5, 14);
    expect(plateReattachment(5)).toBe(1);
    expect(plateReattachment(Number.POSITIVE_INFINITY)).toBe(1);
  });

  it('checks its argument', () => {
    expect(() => plateReattachment(-0.1)).toThrow(RangeError);
    expect(() => plateReattachment(Number.NaN)).toThrow(RangeError);
  });
});
