// `compare --calibrate --write-case FILE`: the written case, solved as `coversweep solve` solves it,
// reproduces the fitted curve (the calibration's model values at the data points). Independent of the
// fit: the solve goes through the case-file parser and solveCase, not the comparison's evaluator.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCompare } from '../../src/cli/compareCommand';
import { main } from '../../src/cli/main';
import { parseCaseFile, solveCase } from '../../src/compute/caseFile';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-writecase-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const files: Record<string, string> = {
  'case.json': readFileSync('public/demo/demo-case.json', 'utf8').replace(
    '"grid_convergence": true',
    '"grid_convergence": false, "lattice_span": 12, "lattice_chord": 8',
  ),
  'data.csv': readFileSync('public/demo/demo-tunnel.csv', 'utf8'),
  'map.json': readFileSync('public/demo/demo-map.json', 'utf8'),
};

function io() {
  let out = '';
  let err = '';
  return {
    io: {
      stdout: (s: string) => void (out += s),
      stderr: (s: string) => void (err += s),
      readFile: (p: string) => {
        if (!(p in files)) throw new Error(`ENOENT: no such file '${p}'`);
        return files[p]!;
      },
      fileSize: (p: string) => files[p]?.length ?? 0,
      cwd: dir,
    },
    out: () => out,
    err: () => err,
  };
}

const ARGS = ['case.json', 'data.csv', '--map', 'map.json', '--calibrate'];

describe('compare --write-case', () => {
  it('writes a calibrated case whose solve reproduces the fitted curve', () => {
    const t = io();
    expect(runCompare([...ARGS, '--write-case', 'calibrated.json'], t.io), t.err()).toBe(0);
    expect(t.err()).toMatch(/wrote calibrated\.json \(the calibrated case\)/);
    const report = JSON.parse(t.out());
    const cal = report.calibration;
    const parsed = parseCaseFile(readFileSync(join(dir, 'calibrated.json'), 'utf8'));
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    expect(parsed.value.name).toMatch(/CALIBRATED/);
    for (const p of cal.parameters) expect(parsed.value.model[p.name as 'porosity_scale']).toBe(p.value);
    const doc = solveCase(parsed.value);
    // The fitted curve: the calibration's model values at each data point (on the case's own lattice).
    let matched = 0;
    for (const row of cal.residuals as {
      yaw_deg: number;
      airspeed_mps: number;
      output: string;
      model: number;
    }[]) {
      const r = doc.results.find(
        (x) => x.yaw_deg === row.yaw_deg && Math.abs(x.airspeed_mps! / row.airspeed_mps - 1) < 1e-12,
      );
      if (!r) continue;
      const solved = r[row.output as 'axial_N' | 'side_N' | 'yaw_moment_Nm'] as number;
      const tol = 1e-9 * Math.max(1, Math.abs(row.model));
      expect(
        Math.abs(solved - row.model),
        `${row.output} at ${row.yaw_deg} deg, ${row.airspeed_mps} m/s: solve ${solved}, fit ${row.model}, tolerance ${tol}`,
      ).toBeLessThanOrEqual(tol);
      matched++;
    }
    // The demo case lists 3 airspeeds x 8 yaws; the data hold those 24 points (and 6 more) x 3 outputs.
    expect(matched).toBe(72);
  });

  it('never overwrites without --force, and needs --calibrate', () => {
    writeFileSync(join(dir, 'taken.json'), 'mine');
    const t = io();
    expect(runCompare([...ARGS, '--write-case', 'taken.json'], t.io)).toBe(2);
    expect(t.err()).toMatch(/--write-case .*taken\.json: the file already exists; use --force/);
    expect(t.out()).toBe('');
    expect(readFileSync(join(dir, 'taken.json'), 'utf8')).toBe('mine');
    const u = io();
    expect(runCompare(['case.json', 'data.csv', '--map', 'map.json', '--write-case', 'x.json'], u.io)).toBe(
      2,
    );
    expect(u.err()).toMatch(/--write-case: only used with --calibrate/);
    const f = io();
    expect(runCompare([...ARGS, '--write-case', 'taken.json', '--force'], f.io), f.err()).toBe(0);
    expect(readFileSync(join(dir, 'taken.json'), 'utf8')).toMatch(/"format": "coversweep-case"/);
  });

  it('main passes its folder on: relative paths land there', async () => {
    for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
    let err = '';
    const code = await main(['compare', ...ARGS, '--write-case', 'via-main.json', '--format', 'table'], {
      cwd: dir,
      stdout: () => {},
      stderr: (s) => void (err += s),
    });
    expect(code, err).toBe(0);
    expect(parseCaseFile(readFileSync(join(dir, 'via-main.json'), 'utf8')).ok).toBe(true);
  });
});
