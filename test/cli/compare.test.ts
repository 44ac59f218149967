import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCompare } from '../../src/cli/compareCommand';

/** In-memory files; nothing is read from or written to disk except the demo files named here. */
function io(files: Record<string, string>, sizes: Record<string, number> = {}) {
  let out = '';
  let err = '';
  return {
    io: {
      stdout: (s: string) => {
        out += s;
      },
      stderr: (s: string) => {
        err += s;
      },
      readFile: (p: string) => {
        if (!(p in files)) throw new Error(`ENOENT: no such file '${p}'`);
        return files[p]!;
      },
      fileSize: (p: string) => {
        if (p in sizes) return sizes[p]!;
        if (!(p in files)) throw new Error(`ENOENT: no such file '${p}'`);
        return files[p]!.length;
      },
    },
    out: () => out,
    err: () => err,
  };
}

/** The first data row's drag cell (grams-force), read from the demo file itself. */
const firstDragCell = (csv: string): string => {
  const rows = csv.split('\n').filter((l) => l !== '' && !l.startsWith('#'));
  return rows[1]!.split(',')[2]!;
};

const demo = {
  'case.json': readFileSync('public/demo/demo-case.json', 'utf8').replace(
    '"grid_convergence": true',
    '"grid_convergence": true, "lattice_span": 12, "lattice_chord": 8',
  ),
  'data.csv': readFileSync('public/demo/demo-tunnel.csv', 'utf8'),
  'map.json': readFileSync('public/demo/demo-map.json', 'utf8'),
  'slips.json': readFileSync('public/demo/demo-map-slips.json', 'utf8'),
};

describe('coversweep compare', () => {
  it('prints converted data, flags and residuals for the demo files', () => {
    const t = io(demo);
    const code = runCompare(['compare', 'case.json', 'data.csv', '--map', 'map.json'], t.io);
    expect(code, t.err()).toBe(0);
    const doc = JSON.parse(t.out());
    expect(doc.format).toBe('coversweep-compare');
    expect(doc.converted.length).toBe(30);
    expect(Array.isArray(doc.flags)).toBe(true);
    for (const f of doc.flags) expect(typeof f.code === 'string' && typeof f.message === 'string').toBe(true);
    expect(doc.residuals.length).toBe(90);
    expect(doc.residuals[0]).toHaveProperty('residual');
    expect(doc.calibration).toBeUndefined();
    // The file's grams-force became newtons: the first row's drag x g0 / 1000 (NIST SP 811).
    const grams = Number(firstDragCell(demo['data.csv']));
    expect(Math.abs(doc.converted[0].axial_N - (grams / 1000) * 9.80665)).toBeLessThan(1e-12);
  });

  it('the demo data (mixed units) show no slip with demo-map.json and each slip with demo-map-slips.json', () => {
    const right = io(demo);
    expect(runCompare(['case.json', 'data.csv', '--map', 'map.json'], right.io), right.err()).toBe(0);
    const clean = JSON.parse(right.out()).flags as { code: string }[];
    expect(clean.filter((f) => f.code !== 'beyond_model_range')).toEqual([]);
    const t = io(demo);
    expect(runCompare(['case.json', 'data.csv', '--map', 'slips.json'], t.io), t.err()).toBe(0);
    const flags = JSON.parse(t.out()).flags as { code: string; output?: string; message: string }[];
    const find = (code: string, output: string) => flags.find((f) => f.code === code && f.output === output);
    expect(find('unit_factor', 'axial_N')?.message, t.err()).toMatch(/grams-force.*set its unit to "gf"/);
    expect(find('unit_factor', 'side_N')?.message, t.err()).toMatch(/pounds-force.*set its unit to "lbf"/);
    expect(find('side_force_sign', 'side_N')?.message, t.err()).toMatch(
      /side_force_sign is -1 now.*set side_force_sign to 1\./,
    );
    expect(t.err()).toMatch(/^flag unit_factor: axial drag/m);
  });

  it('--calibrate adds fitted parameters with intervals', () => {
    const t = io(demo);
    const code = runCompare(
      [
        'case.json',
        'data.csv',
        '--map',
        'map.json',
        '--calibrate',
        '--parameters',
        'suction_recovered,porosity_scale,profile_drag_factor',
      ],
      t.io,
    );
    expect(code, t.err()).toBe(0);
    const doc = JSON.parse(t.out());
    expect(doc.calibration.parameters.map((p: { name: string }) => p.name)).toEqual([
      'suction_recovered',
      'porosity_scale',
      'profile_drag_factor',
    ]);
    for (const p of doc.calibration.parameters) expect(p.interval.length).toBe(2);
    expect(doc.calibration.label).toMatch(/calibrated to data\.csv/);
  });

  it('without --map prints the guessed map for confirmation', () => {
    const t = io(demo);
    expect(runCompare(['case.json', 'data.csv'], t.io)).toBe(0);
    const doc = JSON.parse(t.out());
    expect(doc.format).toBe('coversweep-map-guess');
    expect(doc.map.columns['Drag [g]']).toEqual({ quantity: 'axial_force', unit: 'gf' });
    expect(t.err()).toMatch(/no --map given/);
  });

  it('refuses a 100 MB data file from its size, before reading it', () => {
    const t = io({ ...demo, 'big.csv': '' }, { 'big.csv': 100 * 1024 * 1024 });
    t.io.readFile = (p: string) => {
      if (p === 'big.csv') throw new Error('must not be read');
      return demo[p as keyof typeof demo];
    };
    expect(runCompare(['case.json', 'big.csv', '--map', 'map.json'], t.io)).toBe(2);
    expect(t.err()).toMatch(/data file big\.csv: data file is 100\.0 MB, more than the 32\.0 MB limit/);
    expect(t.out()).toBe('');
  });

  it('gives clear messages for malformed input (exit 2, nothing on stdout)', () => {
    const cases: [Record<string, string>, string[], RegExp][] = [
      [
        { ...demo, 'data.csv': '' },
        ['case.json', 'data.csv', '--map', 'map.json'],
        /data\.csv: the data file is empty/,
      ],
      [
        { ...demo, 'data.csv': 'Yaw [deg],Speed [km/h]\n0,30,1\n' },
        ['case.json', 'data.csv', '--map', 'map.json'],
        /line 2: 3 fields, but the header has 2/,
      ],
      [
        { ...demo, 'data.csv': demo['data.csv'].replace(`,${firstDragCell(demo['data.csv'])},`, ',n/a,') },
        ['case.json', 'data.csv', '--map', 'map.json'],
        /column "Drag \[g\]": "n\/a" is not a number/,
      ],
      [
        { ...demo, 'map.json': '{"format":"coversweep-map"}' },
        ['case.json', 'data.csv', '--map', 'map.json'],
        // A map without "version" is version 1 (issue 7); what it lacks is its columns.
        /map\.json: columns:/,
      ],
      [demo, ['case.json'], /exactly two files/],
      [demo, ['case.json', 'data.csv', '--bogus'], /unknown option --bogus\n/],
      [demo, ['case.json', 'missing.csv', '--map', 'map.json'], /data file missing\.csv: cannot be read/],
      [
        demo,
        ['case.json', 'data.csv', '--map', 'map.json', '--uncertainty', 'wind=1:2'],
        /"wind" is not one of/,
      ],
    ];
    for (const [files, argv, re] of cases) {
      const t = io(files);
      const code = runCompare(argv, t.io);
      expect(code, `${argv.join(' ')}: ${t.err()}`).toBe(2);
      expect(t.err(), argv.join(' ')).toMatch(re);
      expect(t.out()).toBe('');
    }
  });
});
