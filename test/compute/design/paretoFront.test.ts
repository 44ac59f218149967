import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { paretoFront } from '../../../src/compute/design/paretoFront';

/** The definition, O(n^2): i is dominated when some j is no worse in both and better in one. */
function bruteFront(a: number[], b: number[]): Set<number> {
  const out = new Set<number>();
  a.forEach((_, i) => {
    const dominated = a.some(
      (_, j) => j !== i && a[j]! <= a[i]! && b[j]! <= b[i]! && (a[j]! < a[i]! || b[j]! < b[i]!),
    );
    if (!dominated) out.add(i);
  });
  return out;
}

describe('paretoFront (two figures, both minimised)', () => {
  it('matches the definition on seeded random sets (duplicates keep one representative)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 20 })), {
          maxLength: 60,
        }),
        (pts) => {
          const a = pts.map((p) => p[0]);
          const b = pts.map((p) => p[1]);
          const got = paretoFront(a, b);
          const want = bruteFront(a, b);
          // Every point of the front is non-dominated, and every non-dominated value pair is on it once.
          for (const i of got) expect(want.has(i), `index ${i} of ${JSON.stringify(pts)}`).toBe(true);
          const pairs = new Set([...want].map((i) => `${a[i]},${b[i]}`));
          expect(new Set(got.map((i) => `${a[i]},${b[i]}`))).toEqual(pairs);
          expect(got.length).toBe(pairs.size);
          for (let k = 1; k < got.length; k++) expect(a[got[k]!]!).toBeGreaterThan(a[got[k - 1]!]!);
        },
      ),
      { seed: 11, numRuns: 200 },
    );
  });
  it('leaves out NaN points and refuses arrays of different lengths', () => {
    expect(paretoFront([1, Number.NaN, 0], [1, 0, 2])).toEqual([2, 0]);
    expect(() => paretoFront([1], [])).toThrow(RangeError);
  });
});
