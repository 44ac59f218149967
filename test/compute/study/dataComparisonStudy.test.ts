// The data-comparison planner (src/compute/study/dataComparisonStudy.ts) held against the comparison's
// own evaluator (createModelEvaluator, the path `coversweep compare` and the data panel took before):
// the model at the demo data's points, bit for bit, in this thread and on pooled workers, and the
// whole comparison report unchanged when runComparison is handed the planner's solve.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseAirDensity, parseCaseFile } from '../../../src/compute/caseFile';
import { parseCsvText } from '../../../src/compute/compare/csv';
import { convertTable, createModelEvaluator, runComparison } from '../../../src/compute/compare/index';
import { parseMapFile } from '../../../src/compute/compare/mapFile';
import { WorkerPool } from '../../../src/compute/engine/workerPool';
import {
  dataComparisonStudy,
  modelAtDataHere,
  modelAtDataOf,
} from '../../../src/compute/study/dataComparisonStudy';
import { runStudies } from '../../../src/compute/study/runStudies';
import { inProcessSpawner } from '../engine/inProcessSpawn';

const ROOT = join(__dirname, '../../..');
const read = (p: string) => readFileSync(join(ROOT, p), 'utf8');

function demo() {
  const c = parseCaseFile(read('public/demo/demo-case.json'));
  const m = parseMapFile(read('public/demo/demo-map.json'));
  const t = parseCsvText(read('public/demo/demo-tunnel.csv'));
  if (!c.ok || !m.ok || !t.ok) throw new Error('demo files unreadable');
  const conv = convertTable(t.value, m.value, caseAirDensity(c.value));
  if (!conv.ok) throw new Error(conv.errors.join('; '));
  return { caseFile: c.value, map: m.value, table: t.value, points: conv.value.points };
}

describe('data-comparison planner', () => {
  it("names one point axis, the data's lines, and plans one case at the data's own points", () => {
    const d = demo();
    const plan = dataComparisonStudy(d.caseFile, d.points);
    expect(plan.caseAxes).toEqual([]);
    expect(plan.pointAxes.map((a) => [a.name, a.unit])).toEqual([['dataPoint', 'line']]);
    expect(plan.pointAxes[0]!.values).toEqual(d.points.map((p) => p.line));
    const input = plan.inputs[0] as { points: { yawRad: number; airspeedMps: number }[] };
    expect(input.points.map((p) => p.yawRad)).toEqual(d.points.map((p) => p.yawRad));
    expect(input.points.map((p) => p.airspeedMps)).toEqual(d.points.map((p) => p.airspeedMps));
  });

  it("gives the evaluator's numbers bit for bit, here and on a pool", async () => {
    const d = demo();
    const expected = createModelEvaluator(d.caseFile, d.points).evaluate();
    expect(modelAtDataHere(d.caseFile, d.points)).toEqual(expected);
    const pool = new WorkerPool(inProcessSpawner().spawn, 2);
    const out = await runStudies(pool, [dataComparisonStudy(d.caseFile, d.points)]);
    pool.close();
    expect(modelAtDataOf(out.results[0]!)).toEqual(expected);
    expect(modelAtDataHere(d.caseFile, [])).toEqual([]);
  });

  it('leaves the comparison report unchanged when runComparison uses it', () => {
    const d = demo();
    const request = { caseFile: d.caseFile, table: d.table, map: d.map, dataLabel: 'demo-tunnel.csv' };
    expect(runComparison(request, modelAtDataHere)).toEqual(runComparison(request));
  });
});
