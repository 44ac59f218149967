import { describe, expect, it } from 'vitest';
import { bandText, formatNumber } from '../../../src/compute/validation/bandText';
import { inBand } from '../../../src/compute/validation/inBand';

describe('reference bands', () => {
  it('include closed ends, exclude open ends and NaN (definition)', () => {
    expect(inBand(130, { low: 130, high: 250 })).toBe(true);
    expect(inBand(250, { low: 130, high: 250 })).toBe(true);
    expect(inBand(129.9, { low: 130, high: 250 })).toBe(false);
    expect(inBand(0, { low: 0, high: 1, lowOpen: true, highOpen: true })).toBe(false);
    expect(inBand(1, { low: 0, high: 1, lowOpen: true, highOpen: true })).toBe(false);
    expect(inBand(0.5, { low: 0, high: 1, lowOpen: true, highOpen: true })).toBe(true);
    expect(inBand(1e9, { low: 0.95, high: null })).toBe(true);
    expect(inBand(-1e9, { low: null, high: 1.83, highOpen: true })).toBe(true);
    expect(inBand(Number.NaN, { low: null, high: 1 })).toBe(false);
  });

  it('print both ends with enough digits to tell them apart', () => {
    expect(bandText({ low: 130, high: 250 })).toBe('130 .. 250');
    expect(bandText({ low: 0.002946 - 1e-8, high: 0.002946 + 1e-8 })).toBe('0.00294599 .. 0.00294601');
    expect(bandText({ low: 0, high: 1, lowOpen: true, highOpen: true })).toBe('0 < x < 1');
    expect(bandText({ low: 0.95, high: null })).toBe('>= 0.95');
    expect(bandText({ low: 1, high: null, lowOpen: true })).toBe('> 1');
    expect(formatNumber(1.7894e-5)).toBe('1.7894e-5');
  });
});
