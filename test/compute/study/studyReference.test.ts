/**
 * Bit identity with the results of the code before the study runner (issue 11): the command line's
 * sweeps of two plan files and the page's solved designs for two states were written to reference/
 * before the runner existed (`coversweep sweep PLAN --workers 0 --out F`, and for the page the script
 * test/compute/study/makePageReference.ts of commit 1df3d46, which solved the old computePlan's inputs
 * one by one and stored them in the old per-role lists: family[k], cover[k] with point index
 * speed * yaws + yaw, map[depth * fractions + fraction]). They were rewritten the same way at commit
 * 2c6f200 (the code before the runner, with the spoke-cage swirl model change that landed beside it), so
 * the comparison is with the old code on today's model; and again at commit 27980eb (that code with
 * issue 13's re-blocked LU and influence build, whose last bits differ: at most 2.6e-13 of a column's
 * largest value, in the grid-convergence columns). Here the page's studies run through the
 * study runner on a worker pool and are read back from the cubes by axis name.
 * CSV and JSON print each float64 in its shortest round-trip form, so equal text is equal bits; the
 * page's results are compared as Float64Array bytes. No tolerance: any change of a bit fails.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../../src/cli/main';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import {
  type AxisPick,
  isUnplanned,
  OutcomeCache,
  pageStudies,
  runStudies,
  type StudyPlan,
  type StudyResult,
} from '../../../src/compute/study';
import { inProcessSpawner } from '../engine/inProcessSpawn';
import { pageReferenceStates } from './pageReference';

const REF = join(dirname(fileURLToPath(import.meta.url)), 'reference');
const dir = mkdtempSync(join(tmpdir(), 'coversweep-study-ref-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function sweep(plan: string, out: string, workers: number): Promise<string> {
  const path = join(dir, out);
  const errors: string[] = [];
  const code = await main(['sweep', join(REF, plan), '--workers', String(workers), '--out', path], {
    cwd: dir,
    stdout: () => undefined,
    stderr: (t) => errors.push(t),
    stderrIsTTY: false,
  });
  expect(code, errors.join('')).toBe(0);
  return readFileSync(path, 'utf8');
}

describe('command-line sweeps equal the reference files written before the study runner', () => {
  for (const [plan, out, workers] of [
    ['plan-demo.json', 'sweep-demo.csv', 0],
    ['plan-demo.json', 'sweep-demo.json', 0],
    ['plan-mixed.json', 'sweep-mixed.csv', 0],
    ['plan-mixed.json', 'sweep-mixed.csv', 2],
  ] as const) {
    it(`${plan} -> ${out} on ${workers} worker(s)`, async () => {
      const got = await sweep(plan, `${workers}-${out}`, workers);
      const expected = readFileSync(join(REF, out), 'utf8');
      if (got !== expected) {
        const g = got.split('\n');
        const e = expected.split('\n');
        const line = g.findIndex((l, i) => l !== e[i]);
        expect.fail(
          `${plan} ${out}: first differing line ${line + 1}\n got: ${g[line]}\n expected: ${e[line]}`,
        );
      }
    }, 60_000);
  }
});

interface SolvedRef {
  input: string;
  pointCount: number;
  packed: string;
}

/** The case's packed rows, point axes walked in order (airspeed outer, yaw inner), as base64 bytes. */
function caseBytes(result: StudyResult, at: AxisPick): string {
  const cube = result.cube!.pick(at);
  const rows: Float64Array[] = [];
  const speeds = cube.axis('airspeed').values.length;
  const yaws = cube.axis('yaw').values.length;
  for (let si = 0; si < speeds; si++)
    for (let yi = 0; yi < yaws; yi++) rows.push(cube.pick({ airspeed: si, yaw: yi }).row());
  const all = new Float64Array(rows.reduce((n, r) => n + r.length, 0));
  let o = 0;
  for (const r of rows) {
    all.set(r, o);
    o += r.length;
  }
  return Buffer.from(all.buffer).toString('base64');
}

function inputHash(plan: StudyPlan, k: number): string {
  const input = plan.inputs[k]!;
  if (isUnplanned(input)) throw new Error(`${plan.name} case ${k}: ${input.error}`);
  return createHash('sha256').update(JSON.stringify(input)).digest('hex');
}

describe("the page's studies, run on a pool and read by axis name, equal the reference written before the study runner", () => {
  for (const state of pageReferenceStates()) {
    it(`state ${state.name}`, async () => {
      const ref = JSON.parse(readFileSync(join(REF, `page-${state.name}.json`), 'utf8'));
      const studies = pageStudies(state.case, state.view, state.baseline);
      const plans: StudyPlan[] = [studies.current, studies.family, studies.cover, studies.map];
      if (studies.quick) plans.push(studies.quick);
      if (studies.baseline) plans.push(studies.baseline.curve, studies.baseline.cover, studies.baseline.map);
      const pool = new WorkerPool(inProcessSpawner().spawn, 2);
      // Solved once on the pool (kept as the page keeps them), then again: every case from the kept ones.
      const cache = new OutcomeCache(64e6);
      const runs: StudyResult[][] = [];
      try {
        for (let pass = 0; pass < 2; pass++) {
          const out = await runStudies(pool, plans, { cache });
          expect(out.failedCount).toBe(0);
          runs.push(out.results);
        }
      } finally {
        pool.close();
      }
      for (const [pass, results] of runs.entries()) {
        const byPlan = new Map(plans.map((p, i) => [p, results[i]!]));
        const check = (what: string, plan: StudyPlan, k: number, at: AxisPick, expected: SolvedRef) => {
          expect(inputHash(plan, k), `${what}: model input`).toBe(expected.input);
          expect(
            caseBytes(byPlan.get(plan)!, at),
            `${what}: packed result bytes, ${pass === 0 ? 'solved' : 'kept'}`,
          ).toBe(expected.packed);
        };
        check('current', studies.current, 0, {}, ref.current);
        if (studies.quick) check('current, first pass', studies.quick, 0, {}, ref.quick);
        ref.family.forEach((expected: SolvedRef, k: number) => {
          check(`family ${k}`, studies.family, k, { coverFraction: k }, expected);
        });
        ref.cover.forEach((expected: SolvedRef, k: number) => {
          check(`cover ${k}`, studies.cover, k, { coverFraction: k }, expected);
        });
        const nx = ref.axes.mapFractions.length;
        ref.map.forEach((expected: SolvedRef, i: number) => {
          const at = { rimDepth: Math.floor(i / nx), coverFraction: i % nx };
          check(`map ${i}`, studies.map, i, at, expected);
        });
        expect(studies.family.inputs.length).toBe(ref.family.length);
        expect(studies.cover.inputs.length).toBe(ref.cover.length);
        expect(studies.map.inputs.length).toBe(ref.map.length);
        expect(studies.notes).toEqual(ref.notes);
        if (studies.baseline) {
          check('baseline curve', studies.baseline.curve, 0, {}, ref.baseline.curve);
          check('baseline cover', studies.baseline.cover, 0, {}, ref.baseline.cover);
          check('baseline map', studies.baseline.map, 0, {}, ref.baseline.map);
        } else {
          expect(ref.baseline).toBeNull();
        }
      }
    }, 120_000);
  }
});
