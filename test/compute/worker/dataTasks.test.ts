// The data panel's tasks (src/compute/worker/dataTasks.ts), run through a task worker's runTask as the
// page sends them: a table read from text or a file stream and compared gives, once its columns are read back, exactly the report the command line's comparison
// gives (the same code on the same numbers: exact equality).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCaseFile } from '../../../src/compute/caseFile';
import { parseCsvText, parseMapFile, runComparison } from '../../../src/compute/compare/index';
import { unpackComparison } from '../../../src/compute/engine/packComparison';
import type { TaskKind, TaskOf, TaskResults } from '../../../src/compute/engine/tasks';
import { solverApi } from '../../../src/compute/worker/solverApi';

/** One task as a task worker runs it (the same call the pool makes over comlink). */
const run = <K extends TaskKind>(task: TaskOf<K>) => solverApi.runTask(task) as Promise<TaskResults[K]>;

const ROOT = join(__dirname, '../../..');

describe('data panel tasks', () => {
  const csv = readFileSync(join(ROOT, 'public/demo/demo-tunnel.csv'), 'utf8');
  const c = parseCaseFile(readFileSync(join(ROOT, 'public/demo/demo-case.json'), 'utf8'));
  const m = parseMapFile(readFileSync(join(ROOT, 'public/demo/demo-map.json'), 'utf8'));
  if (!c.ok || !m.ok) throw new Error('demo files unreadable');

  it('reads a table into a summary (headers, rows, preview, guessed map)', async () => {
    const r = await run({
      kind: 'dataRead',
      ref: { id: 1, source: { kind: 'text', text: csv }, label: 'demo' },
      context: { referenceAreaM2: 0.35, airspeedMps: 10 },
    });
    if (!r.ok) throw new Error(r.errors.join('; '));
    const t = parseCsvText(csv);
    if (!t.ok) throw new Error('demo csv');
    expect(r.summary.headers).toEqual(t.value.headers);
    expect(r.summary.rowCount).toBe(t.value.rows.length);
    expect(r.summary.preview).toEqual(t.value.rows.slice(0, 6));
    expect(r.summary.guess.map.columns['Yaw [deg]']?.quantity).toBe('yaw_deg');
  });

  it('compares a table kept in the worker (or read again from a file) exactly as runComparison does', async () => {
    const t = parseCsvText(csv);
    if (!t.ok) throw new Error('demo csv');
    const expected = runComparison({ caseFile: c.value, table: t.value, map: m.value, dataLabel: 'demo' });
    if (!expected.ok) throw new Error(expected.errors.join('; '));
    const file = new File([csv], 'demo.csv');
    for (const id of [2, 3]) {
      const got = await run({
        kind: 'dataCompare',
        request: {
          caseFile: c.value,
          ref: { id, source: { kind: 'file', file }, label: 'demo' },
          map: m.value,
          dataLabel: 'demo',
        },
      });
      if (!got.ok) throw new Error(got.errors.join('; '));
      expect(got.value.residuals.count).toBe(expected.value.residuals.length);
      expect(unpackComparison(got.value)).toEqual(expected.value);
    }
  });

  it('returns the reader’s messages for a table that cannot be read', async () => {
    const r = await run({
      kind: 'dataRead',
      ref: { id: 4, source: { kind: 'text', text: 'a,b\n1\n' }, label: 'bad' },
      context: { referenceAreaM2: 0.35, airspeedMps: 10 },
    });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.errors[0]).toMatch(/line 2: 1 field, but the header has 2/);
  });
});
