import { describe, expect, it } from 'vitest';
import { InProcessRunner } from '../../../src/compute/engine/inProcessRunner';
import type { JobRunner } from '../../../src/compute/engine/jobRunner';
import type { SolveJob } from '../../../src/compute/engine/protocol';
import { runSweep } from '../../../src/compute/engine/runSweep';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import { expandPlan } from '../../../src/compute/planFile';
import { commandLineStudy } from '../../../src/compute/study/commandLineStudy';
import { OutcomeCache } from '../../../src/compute/study/outcomeCache';
import { runStudies } from '../../../src/compute/study/runStudies';
import type { StudyPlan } from '../../../src/compute/study/studyPlan';
import { smallSweep } from '../engine/fixtures';
import { inProcessSpawner } from '../engine/inProcessSpawn';

const FAST_MODEL = { lattice_span: 8, lattice_chord: 6, grid_convergence: false };

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

describe('runStudies', () => {
  it('puts every case where its axes say, the same bits as a plain sweep, on a pool or in this thread', async () => {
    const plan = gridStudy();
    const reference = await runSweep(new InProcessRunner(), plan.inputs as never);
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    try {
      for (const runner of [new InProcessRunner(), pool]) {
        const out = await runStudies(runner, [plan]);
        const cube = out.results[0]!.cube!;
        expect(out.failedCount).toBe(0);
        smallSweep().forEach((_, k) => {
          const f = Math.floor(k / 2);
          const d = k % 2;
          const points = reference.solutions[k]!.points;
          const got = cube.pick({ coverFraction: f, rimDepth: d }).column('axialN').values();
          // 2 airspeeds x 4 yaws, row-major: the case's own point order.
          expect([...got], `case ${k}`).toEqual(points.map((p) => p.axialN));
        });
      }
    } finally {
      pool.close();
    }
  });

  it('runs several studies in one run and keeps them apart', async () => {
    const a = gridStudy();
    const b: StudyPlan = { ...gridStudy(), name: 'second', caseAxes: [a.caseAxes[1]!, a.caseAxes[0]!] };
    // b's axes are swapped, so its inputs must be too: rimDepth outer, coverFraction inner.
    b.inputs = [0, 1].flatMap((d) => [0, 1, 2].map((f) => a.inputs[f * 2 + d]!));
    const out = await runStudies(new InProcessRunner(), [a, b]);
    const [ra, rb] = out.results;
    const pa = ra!.cube!.pick({ coverFraction: 2, rimDepth: 1, airspeed: 1, yaw: 3 }).row();
    const pb = rb!.cube!.pick({ coverFraction: 2, rimDepth: 1, airspeed: 1, yaw: 3 }).row();
    expect([...pa]).toEqual([...pb]);
  });

  it('reports progress from zero to the end and lands a plan file’s cases with their messages', async () => {
    const r = expandPlan({
      wheel: { cover: { fraction: [0, 1] } },
      conditions: { airspeed_mps: 10, yaw_deg: [0, 10] },
      model: FAST_MODEL,
    });
    if (!r.ok) throw new Error(r.errors.join('\n'));
    const study = commandLineStudy(r.value);
    expect(study.caseAxes[0]!.values).toEqual([0, 1]);
    const progress: number[] = [];
    const landed: number[] = [];
    const out = await runStudies(new InProcessRunner(), [study], {
      reportStart: true,
      onProgress: (p) => progress.push(p.pointsDone),
      onCase: (c) => landed.push(c.caseIndex),
    });
    expect(progress).toEqual([0, 2, 4]);
    expect(landed).toEqual([0, 1]);
    const side = out.results[0]!.cube!.pick({ airspeed: 0, yaw: 1 }).column('sideN').values();
    // A full disc makes more side force at yaw than an open wheel (design notes section 1).
    expect(side[1]!).toBeGreaterThan(side[0]!);
  });

  it('keeps a case the planner could not set up as a failed case with its message, rows NaN', async () => {
    const plan = gridStudy();
    plan.inputs = [{ error: 'wheel: a stand-in planning failure' }, ...plan.inputs.slice(1)];
    const out = await runStudies(new InProcessRunner(), [plan]);
    expect(out.failedCount).toBe(1);
    expect(out.results[0]!.errors[0]).toBe('wheel: a stand-in planning failure');
    const v = out.results[0]!.cube!.pick({ coverFraction: 0, rimDepth: 0 }).column('axialN').values();
    expect([...v].every(Number.isNaN)).toBe(true);
  });

  it('deals the jobs stage by stage in one run, says when each stage has landed, same bits as one stage', async () => {
    const a = gridStudy();
    const b: StudyPlan = { ...gridStudy(), name: 'second' };
    const c: StudyPlan = { ...gridStudy(), name: 'third' };
    // A pool that records the order it is given the jobs in (and runs them on two workers).
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    const dealt: SolveJob[][] = [];
    const recording: JobRunner = {
      size: pool.size,
      run: (jobs, options) => {
        dealt.push([...jobs]);
        return pool.run(jobs, options);
      },
    };
    try {
      const order: string[] = [];
      const out = await runStudies(recording, [a, b, c], {
        stages: [1, 0, 1],
        onCase: (k) => order.push(`case ${k.study}`),
        onStageDone: (stage, results) => {
          order.push(`stage ${stage}`);
          // Every case of the stage has landed when it is said to be done.
          const studies = stage === 0 ? [1] : [0, 2];
          for (const s of studies) expect([...results[s]!.landed].every((x) => x === 1)).toBe(true);
        },
      });
      // One run: study b's six cases (stage 0) dealt first, then a's and c's.
      expect(dealt.length).toBe(1);
      const cases = dealt[0]!.flatMap((job) => job.cases.map((x) => x.caseIndex));
      expect(new Set(cases.slice(0, 6))).toEqual(new Set([6, 7, 8, 9, 10, 11]));
      expect(cases.length).toBe(18);
      expect(order.filter((x) => x.startsWith('stage'))).toEqual(['stage 0', 'stage 1']);
      expect(order.indexOf('stage 1')).toBe(order.length - 1);
      const plain = await runStudies(new InProcessRunner(), [a]);
      for (const r of out.results) expect([...r.cube!.data]).toEqual([...plain.results[0]!.cube!.data]);
    } finally {
      pool.close();
    }
  });

  it('says at once that a stage whose cases are all kept is done, before any solve', async () => {
    const a = gridStudy();
    const b: StudyPlan = {
      ...gridStudy(),
      name: 'second',
      inputs: smallSweep().map((x) => ({ ...x, points: x.points.slice(0, 1) })),
    };
    b.pointAxes = [
      { name: 'airspeed', unit: 'm/s', values: [8] },
      { name: 'yaw', unit: 'deg', values: [0] },
    ];
    const cache = new OutcomeCache(1e6);
    await runStudies(new InProcessRunner(), [a], { cache });
    const order: string[] = [];
    await runStudies(new InProcessRunner(), [b, a], {
      cache,
      stages: [0, 1],
      onCase: (k) => order.push(`case ${k.study}`),
      onStageDone: (stage) => order.push(`stage ${stage}`),
    });
    // Study a (stage 1) is kept: it lands and is done before study b (stage 0) is solved.
    expect(order.slice(0, 7)).toEqual([...new Array(6).fill('case 1'), 'stage 1']);
    expect(order.slice(7)).toEqual([...new Array(6).fill('case 0'), 'stage 0']);
  });

  it('refuses a plan whose inputs do not fill its axes', async () => {
    const plan = { ...gridStudy(), inputs: smallSweep().slice(1) };
    await expect(runStudies(new InProcessRunner(), [plan])).rejects.toThrow(
      /study test grid: 5 inputs for 6 case cells \(coverFraction 3 x rimDepth 2\)/,
    );
  });
});
