import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runRide } from '../../src/cli/rideCommand';

const examplePath = new URL('../../public/examples/ride.json', import.meta.url).pathname;

function run(argv: string[], files: Record<string, string> = {}) {
  let stdout = '';
  let stderr = '';
  const code = runRide(argv, {
    stdout: (s) => {
      stdout += s;
    },
    stderr: (s) => {
      stderr += s;
    },
    readFile: (p) => {
      if (p in files) return files[p]!;
      return readFileSync(p, 'utf8');
    },
  });
  return { code, stdout, stderr };
}

describe('coversweep ride', () => {
  it('prints the ride result as JSON for the example file', () => {
    const r = run([examplePath]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const doc = JSON.parse(r.stdout);
    expect(doc.format).toBe('coversweep-ride-result');
    for (const key of ['delta_power_W', 'delta_time_s', 'yaw_p90_deg'])
      expect(typeof doc[key], key).toBe('number');
    expect(typeof doc.wind_averaged_axial_N.design).toBe('number');
    expect(typeof doc.lean_deg.design).toBe('number');
    expect(doc.cautions.length).toBeGreaterThan(0);
  });

  it('invalid input: exit 2, the field and the rule on stderr, nothing on stdout', () => {
    const bad = JSON.parse(readFileSync(examplePath, 'utf8'));
    bad.rider.crr = 0.5;
    const r = run(['bad.json'], { 'bad.json': JSON.stringify(bad) });
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('invalid ride file bad.json');
    expect(r.stderr).toContain('rider.crr: must be a number at least 0 and at most 0.05, got 0.5');
  });

  it('a missing file, a missing or extra argument: exit 2 and nothing on stdout', () => {
    const missing = run(['/nonexistent/ride.json']);
    expect(missing.code).toBe(2);
    expect(missing.stdout).toBe('');
    expect(missing.stderr).toContain('no such file');
    const none = run([]);
    expect(none.code).toBe(2);
    expect(none.stdout).toBe('');
    expect(run(['a.json', 'b.json']).code).toBe(2);
    expect(run(['--bogus']).code).toBe(2);
  });

  it('--help prints the usage and exits 0', () => {
    const r = run(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Usage: coversweep ride RIDE.json/);
  });
});
