import { describe, expect, it } from 'vitest';
import { chunkText } from '../../src/cli/sweepCommand';
import { type SweepChunk, SweepSpool } from '../../src/cli/sweepSpool';

const encoder = new TextEncoder();

describe('SweepSpool: cases finished before their turn', () => {
  it('gives back each case as it was put, from memory or from its file', () => {
    const cases: SweepChunk[] = ['a,1\n', encoder.encode('b,2\nb,3\n'), 'é,"x,y"\n', encoder.encode('')];
    // Budget 0: everything goes to the temporary file; the default: everything stays in memory.
    for (const budget of [0, undefined]) {
      const spool = new SweepSpool(undefined, budget);
      cases.forEach((chunk, i) => {
        spool.put(10 + i, chunk);
      });
      expect(spool.size).toBe(cases.length);
      expect(spool.take(9)).toBeNull();
      for (const [i, chunk] of cases.entries()) {
        expect(spool.has(10 + i)).toBe(true);
        expect(chunkText(spool.take(10 + i)!), `budget ${budget}, case ${i}`).toBe(chunkText(chunk));
        expect(spool.has(10 + i)).toBe(false);
      }
      expect(spool.size).toBe(0);
      spool.close();
    }
  });

  it('keeps cases in memory up to its budget, then on disk, and drains them all in index order', () => {
    const row = (i: number) => encoder.encode(`${i},${'x'.repeat(10)}\n`);
    // 13 bytes a case, 40 allowed in memory: three cases there, the rest in the file.
    const spool = new SweepSpool(undefined, 40);
    for (const i of [5, 2, 9, 7, 1, 8]) spool.put(i, row(i));
    // Taking a case frees its share of the budget for the next.
    expect(chunkText(spool.take(2)!)).toBe(chunkText(row(2)));
    spool.put(3, row(3));
    const drained: string[] = [];
    expect(spool.drainTo((chunk) => drained.push(chunkText(chunk)))).toBe(6);
    expect(drained).toEqual([1, 3, 5, 7, 8, 9].map((i) => chunkText(row(i))));
    expect(spool.size).toBe(0);
    spool.close();
  });
});
