import { describe, expect, it } from 'vitest';
import { InProcessRunner } from '../../../src/compute/engine/inProcessRunner';
import { runSweep } from '../../../src/compute/engine/runSweep';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import { expandPlan } from '../../../src/compute/planFile';
import { commandLineStudy } from '../../../src/compute/study/commandLineStudy';
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

  it('refuses a plan whose inputs do not fill its axes', async () => {
    const plan = { ...gridStudy(), inputs: smallSweep().slice(1) };
    await expect(runStudies(new InProcessRunner(), [plan])).rejects.toThrow(
      /study test grid: 5 inputs for 6 case cells \(coverFraction 3 x rimDepth 2\)/,
    );
  });
});
