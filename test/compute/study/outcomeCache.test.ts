import { describe, expect, it } from 'vitest';
import { COLUMN_COUNT } from '../../../src/compute/engine/columns';
import { InProcessRunner } from '../../../src/compute/engine/inProcessRunner';
import type { JobRunner } from '../../../src/compute/engine/jobRunner';
import type { SolvedCase } from '../../../src/compute/engine/protocol';
import { inputKey } from '../../../src/compute/study/inputKey';
import { OutcomeCache } from '../../../src/compute/study/outcomeCache';
import { runStudies } from '../../../src/compute/study/runStudies';
import type { StudyPlan } from '../../../src/compute/study/studyPlan';
import { smallSweep } from '../engine/fixtures';

function gridStudy(): StudyPlan {
  // smallSweep: fractions [0, 0.5, 1] x depths [0.03, 0.06], points airspeed [8, 13.41] x yaw [0..15].
  return {
    name: 'test grid',
    caseAxes: [
      { name: 'coverFraction', unit: '1', values: [0, 0.5, 1] },
      { name: 'rimDepth', unit: 'm', values: [0.03, 0.06] },
    ],
    pointAxes: [
      { name: 'airspeed', unit: 'm/s', values: [8, 13.41] },
      { name: 'yaw', unit: 'deg', values: [0, 5, 10, 15] },
    ],
    inputs: smallSweep(),
  };
}

/** An in-process runner that counts the cases it is given to solve. */
function countingRunner(): JobRunner & { cases: number } {
  const inner = new InProcessRunner();
  const runner = {
    cases: 0,
    size: inner.size,
    inOrder: inner.inOrder,
    run: (jobs: Parameters<JobRunner['run']>[0], options: Parameters<JobRunner['run']>[1]) => {
      for (const j of jobs) runner.cases += j.cases.length;
      return inner.run(jobs, options);
    },
  };
  return runner;
}

const bytesOf = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);

function solved(caseIndex: number, values: number[]): SolvedCase {
  const packed = Float64Array.from(values);
  return { caseIndex, ok: true, surface: {} as SolvedCase['surface'], pointCount: 1, packed };
}

describe('OutcomeCache with runStudies', () => {
  it('solves only the cases whose input changed, and lands the kept ones with the same bits', async () => {
    const cache = new OutcomeCache(1e6);
    const fresh = await runStudies(new InProcessRunner(), [gridStudy()]);
    const runner = countingRunner();
    const first = await runStudies(runner, [gridStudy()], { cache });
    expect(runner.cases).toBe(6);
    expect(cache.size).toBe(6);
    // The same studies again: nothing solved, every number identical to a run without the cache.
    const landed: number[] = [];
    const again = await runStudies(runner, [gridStudy()], { cache, onCase: (c) => landed.push(c.caseIndex) });
    expect(runner.cases).toBe(6);
    expect(landed.sort()).toEqual([0, 1, 2, 3, 4, 5]);
    for (const out of [first, again]) {
      expect(out.failedCount).toBe(0);
      expect(bytesOf(out.results[0]!.cube!.data)).toEqual(bytesOf(fresh.results[0]!.cube!.data));
    }
    // One case changed (its airspeeds): only that one is solved; the rest still equal the fresh run.
    const changed = gridStudy();
    const inputs = changed.inputs.slice() as ReturnType<typeof smallSweep>;
    inputs[3] = { ...inputs[3]!, points: inputs[3]!.points.map((p) => ({ ...p, rhoKgPerM3: 1.1 })) };
    changed.inputs = inputs;
    const third = await runStudies(runner, [changed], { cache });
    expect(runner.cases).toBe(7);
    // Case k's rows: 8 points (2 airspeeds x 4 yaws) of COLUMN_COUNT numbers.
    const size = 8 * COLUMN_COUNT;
    const row = (out: typeof fresh, k: number) => [
      ...out.results[0]!.cube!.data.subarray(k * size, (k + 1) * size),
    ];
    for (const k of [0, 1, 2, 4, 5]) expect(row(third, k)).toEqual(row(fresh, k));
    expect(row(third, 3)).not.toEqual(row(fresh, 3));
  });

  it('spells out -0 and non-finite numbers in the key, so they are never taken for 0 or null', () => {
    const input = smallSweep()[0]!;
    const zero = { ...input, steering: { ...input.steering } };
    const negative = structuredClone(zero);
    const p0 = negative.points[0]!;
    negative.points[0] = { ...p0, yawRad: -0 };
    const positive = structuredClone(zero);
    positive.points[0] = { ...p0, yawRad: 0 };
    expect(inputKey(negative)).not.toBe(inputKey(positive));
    const inf = structuredClone(zero);
    inf.points[0] = { ...p0, yawRad: Number.POSITIVE_INFINITY };
    const nan = structuredClone(zero);
    nan.points[0] = { ...p0, yawRad: Number.NaN };
    expect(new Set([inputKey(inf), inputKey(nan), inputKey(positive)]).size).toBe(3);
  });

  it('hands out its own copy of the numbers and drops the least recently used beyond its budget', () => {
    const values = Array.from({ length: 100 }, (_, i) => i + 1);
    // Each case costs 100 x 8 bytes + 2 per key character + 256: the budget holds three.
    const cache = new OutcomeCache(3 * (800 + 2 + 256));
    cache.keep('a', solved(0, values));
    const got = cache.take('a', 5)!;
    expect(got.caseIndex).toBe(5);
    got.packed[0] = 99;
    expect([...cache.take('a', 0)!.packed]).toEqual(values);
    // A fourth case pushes out the least recently used.
    for (const k of ['b', 'c', 'd']) cache.keep(k, solved(0, values));
    expect(cache.heldBytes).toBeLessThanOrEqual(cache.budgetBytes);
    expect(cache.has('a')).toBe(false);
    expect(cache.has('d')).toBe(true);
    expect(() => new OutcomeCache(10)).toThrow(/budgetBytes must be a finite number >= 1024, got 10/);
  });
});
