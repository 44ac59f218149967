import { describe, expect, it } from 'vitest';
import { allocateByLength } from '../../../src/model/lattice/allocateByLength';

const shares = (lengths: number[], total: number) => {
  const counts = new Float64Array(lengths.length);
  allocateByLength(Float64Array.from(lengths), lengths.length, total, counts);
  return [...counts];
};

describe('allocateByLength', () => {
  it('gives each interval one, then the spare by largest remainder (Hamilton apportionment)', () => {
    // Spare 7 over lengths 5:3:2 -> ideal 3.5, 2.1, 1.4: floors 3, 2, 1, the last one to the 0.5.
    expect(shares([5, 3, 2], 10)).toEqual([5, 3, 2]);
    // Spare 3 over 1:1:1 -> 1 each; spare 1 -> the tie goes to the first interval.
    expect(shares([1, 1, 1], 6)).toEqual([2, 2, 2]);
    expect(shares([1, 1, 1], 4)).toEqual([2, 1, 1]);
    // Remainders 0.2, 0.8, 0.0 (ideal 1.2, 2.8, 2 of spare 6): the one left goes to the 0.8.
    expect(shares([3, 7, 5], 9)).toEqual([2, 4, 3]);
  });

  it('shares evenly when every length is zero and always sums to the total', () => {
    expect(shares([0, 0, 0, 0], 7)).toEqual([2, 2, 2, 1]);
    for (const total of [3, 5, 11, 40]) {
      const counts = shares([0.3, 1.7, 0.01, 2.2], Math.max(total, 4));
      expect(counts.reduce((a, b) => a + b, 0)).toBe(Math.max(total, 4));
      expect(Math.min(...counts)).toBeGreaterThanOrEqual(1);
    }
  });

  it('rejects a count outside the arrays', () => {
    expect(() => allocateByLength(new Float64Array(2), 3, 5, new Float64Array(3))).toThrow(RangeError);
  });
});
