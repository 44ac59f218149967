/**
 * `coversweep validate`: the table and the JSON report carry every reference case with its source,
 * strength, band and the model's value; the exit code says whether all passed. The reference rows
 * themselves are checked in test/compute/validation/referenceSet.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import { REFERENCE_CASES } from '../../src/compute/validation/referenceCases';
import type { ValidationReport } from '../../src/compute/validation/types';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, {
    stdout: (t) => {
      stdout += t;
    },
    stderr: (t) => {
      stderr += t;
    },
  });
  return { code, stdout, stderr };
}

describe('coversweep validate', () => {
  it('prints every case with its source, strength, band and model value; exit 1 only on a failure not documented as known', async () => {
    const json = await run(['validate', '--json']);
    const report = JSON.parse(json.stdout) as ValidationReport;
    expect(report.format).toBe('coversweep-validation');
    expect(report.rows.map((r) => r.id)).toEqual(REFERENCE_CASES.map((c) => c.id));
    expect(report.passed + report.failed).toBe(REFERENCE_CASES.length);
    expect(report.failed).toBe(report.rows.filter((r) => !r.pass).length);
    for (const row of report.rows) {
      expect(row.source.length, row.id).toBeGreaterThan(10);
      expect(row.strength.length, row.id).toBeGreaterThan(3);
      if (row.error === null) expect(typeof row.model, row.id).toBe('number');
    }
    const known = report.rows.filter((r) => !r.pass && r.known_disagreement !== null).length;
    expect(report.known).toBe(known);
    expect(report.unexpected).toBe(report.failed - known);
    expect(json.code, json.stderr).toBe(report.unexpected > 0 ? 1 : 0);
    if (report.unexpected > 0) expect(json.stderr).toMatch(/reference case\(s\) failed/);
    if (known > 0) expect(json.stderr).toMatch(/known disagreement\(s\), documented/);

    const table = await run(['validate']);
    expect(table.code).toBe(json.code);
    for (const row of report.rows) {
      const status = row.pass ? 'PASS' : row.known_disagreement ? 'FAIL (known disagreement)' : 'FAIL';
      expect(table.stdout, row.id).toContain(`${status}  ${row.id}: `);
      expect(table.stdout, row.id).toContain(`band ${row.band_text}`);
    }
    expect(table.stdout).toContain('strength:  measured');
    expect(table.stdout).toContain(
      `${report.passed} passed, ${report.failed} failed (${report.known} of them known disagreements) of ${report.rows.length}`,
    );
  });

  it('shows its help and refuses unknown options (exit 2)', async () => {
    const help = await run(['validate', '--help']);
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/Usage: coversweep validate \[--json\]/);
    const bad = await run(['validate', '--bogus']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--bogus/);
    expect(bad.stdout).toBe('');
    const top = await run(['--help']);
    expect(top.stdout).toMatch(/coversweep validate \[--json\]/);
  });
});
