/**
 * Bit identity with the results of the code before the study runner (issue 11): the command line's
 * sweeps of two plan files and the page's solved designs for two states were written to reference/
 * (makePageReference.ts, and `coversweep sweep PLAN --workers 0 --out F`) before the runner existed.
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
import { solveJob } from '../../../src/compute/engine/solverApi';
import type { WheelInput } from '../../../src/model/wheel';
import { computePlan } from '../../../src/ui/computePlan';
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

function bytesOf(values: Float64Array): string {
  return Buffer.from(values.buffer, values.byteOffset, values.byteLength).toString('base64');
}

function hashOf(input: WheelInput): string {
  return createHash('sha256').update(JSON.stringify(input)).digest('hex');
}

function solvedPacked(input: WheelInput): Float64Array {
  const o = solveJob({ jobId: 0, cases: [{ caseIndex: 0, input }] }).outcomes[0]!;
  if (!o.ok) throw new Error(o.error);
  return o.packed;
}

describe("the page's solved designs equal the reference written before the study runner", () => {
  for (const state of pageReferenceStates()) {
    it(`state ${state.name}`, () => {
      const ref = JSON.parse(readFileSync(join(REF, `page-${state.name}.json`), 'utf8'));
      const plan = computePlan(state.case, state.view, state.baseline);
      const check = (what: string, input: WheelInput, expected: SolvedRef) => {
        expect(hashOf(input), `${what}: model input`).toBe(expected.input);
        expect(bytesOf(solvedPacked(input)), `${what}: packed result bytes`).toBe(expected.packed);
      };
      check('current', plan.current, ref.current);
      plan.family.inputs.forEach((input, k) => {
        check(`family ${k}`, input, ref.family[k]);
      });
      plan.cover.inputs.forEach((input, k) => {
        check(`cover ${k}`, input, ref.cover[k]);
      });
      plan.map.inputs.forEach((input, k) => {
        check(`map ${k}`, input, ref.map[k]);
      });
      if (plan.baseline) {
        check('baseline curve', plan.baseline.curve, ref.baseline.curve);
        check('baseline cover', plan.baseline.cover, ref.baseline.cover);
        check('baseline map', plan.baseline.map, ref.baseline.map);
      } else {
        expect(ref.baseline).toBeNull();
      }
    }, 120_000);
  }
});
