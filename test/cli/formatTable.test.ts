// `--format table` for solve, ride and compare: the same numbers as the JSON documents (to the digits
// shown), round inputs read back round, and a clear refusal of an unknown format.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bullets, num, outputFormat, table } from '../../src/cli/formatTable';
import { main } from '../../src/cli/main';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-table-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const demoCase = readFileSync('public/demo/demo-case.json', 'utf8').replace(
  '"grid_convergence": true',
  '"grid_convergence": false, "lattice_span": 12, "lattice_chord": 8',
);
writeFileSync(join(dir, 'case.json'), demoCase);
writeFileSync(
  join(dir, 'ride.json'),
  readFileSync('public/examples/ride.json', 'utf8').replace(
    '"steering":',
    '"model": { "lattice_span": 12, "lattice_chord": 8 }, "steering":',
  ),
);
writeFileSync(join(dir, 'data.csv'), readFileSync('public/demo/demo-tunnel.csv', 'utf8'));
writeFileSync(join(dir, 'slips.json'), readFileSync('public/demo/demo-map-slips.json', 'utf8'));

async function run(argv: string[]) {
  let out = '';
  let err = '';
  const code = await main(argv, { cwd: dir, stdout: (s) => void (out += s), stderr: (s) => void (err += s) });
  return { code, out, err };
}

describe('formatTable helpers', () => {
  it('aligns columns, shows numbers to a few digits, "-" for missing', () => {
    expect(num(30.000000000000004, 6)).toBe('30');
    expect(num(0.123456)).toBe('0.1235');
    expect(num(null)).toBe('-');
    expect(num(Number.NaN)).toBe('-');
    expect(
      table(
        ['a', 'value'],
        [
          ['x', '1.5'],
          ['long', '-20'],
        ],
        ['', 'N'],
      ),
    ).toBe('a     value\n          N\nx       1.5\nlong    -20\n');
    expect(bullets(['one two three'], 12)).toBe('  - one two\n    three\n');
    expect(outputFormat(undefined)).toBe('json');
    expect(outputFormat('table')).toBe('table');
    expect(() => outputFormat('xml')).toThrow('--format xml: must be json or table');
  });
});

describe('--format table', () => {
  it("solve: every point with the JSON document's numbers; 30 km/h reads 30", async () => {
    const json = await run(['solve', 'case.json']);
    const text = await run(['solve', 'case.json', '--format', 'table']);
    expect(text.code, text.err).toBe(0);
    const doc = JSON.parse(json.out);
    expect(text.out).not.toMatch(/\d\.\d{10,}/);
    const lines = text.out.split('\n');
    for (const r of doc.results) {
      const cells = [
        num(r.airspeed_mps, 6),
        num(r.airspeed_mps * 3.6, 6),
        num(r.yaw_deg, 6),
        num(r.axial_N),
        num(r.side_N),
      ];
      const line = lines.find((l) => l.trim().split(/\s+/).slice(0, 5).join(' ') === cells.join(' '));
      expect(line, `row ${cells.join(' ')}`).toBeDefined();
    }
    expect(lines.filter((l) => /^\s*8\.33333\s+30\s/.test(l)).length).toBe(8);
  });

  it('ride: design, baseline and difference as in the JSON document, with the cautions', async () => {
    const json = await run(['ride', 'ride.json']);
    const text = await run(['ride', 'ride.json', '--format', 'table']);
    expect(text.code, text.err).toBe(0);
    const doc = JSON.parse(json.out);
    const power = text.out.split('\n').find((l) => l.startsWith('power at'))!;
    expect(power.trim().split(/\s+/).slice(-4)).toEqual([
      num(doc.power_W.design),
      num(doc.power_W.baseline),
      num(doc.power_W.design - doc.power_W.baseline, 3),
      'W',
    ]);
    expect(text.out).toMatch(/Cautions:\n {2}- These are estimates from a reduced-order model/);
  });

  it('compare: the slips listed in words', async () => {
    const text = await run(['compare', 'case.json', 'data.csv', '--map', 'slips.json', '--format', 'table']);
    expect(text.code, text.err).toBe(0);
    expect(text.out).toMatch(/Flags \(likely slips\):/);
    expect(text.out).toMatch(/- unit_factor: axial drag:/);
    expect(text.out).toMatch(/- side_force_sign: the measured side force falls/);
    expect(text.out).toMatch(/Residuals, data - model:\noutput +points +bias +rms +relative rms +unit\n/);
  });

  it('an unknown format is refused for each command, nothing on stdout', async () => {
    for (const argv of [
      ['solve', 'case.json', '--format', 'xml'],
      ['ride', 'ride.json', '--format', 'xml'],
      ['compare', 'case.json', 'data.csv', '--map', 'slips.json', '--format', 'xml'],
    ]) {
      const r = await run(argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.err).toMatch(/--format xml: must be json or table/);
      expect(r.out).toBe('');
    }
  });
});
