/**
 * Hostile input files at the command line (issue 14, items 7, 10, 12): every one is refused or read
 * with exit 0 or 2, never 1, never a stack trace, never past a time bound, nothing on stdout when
 * refused. Seeded: the same files every run. Run through `main` in this process (no start-up cost);
 * special files (devices, FIFOs, folders, /proc) are read with their time bound.
 */
import { execFileSync } from 'node:child_process';
import { chmodSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { exampleCase, examplePlan } from '../../src/cli/examples';
import { main } from '../../src/cli/main';
import { mulberry32 } from '../../src/model/random';
import { bounded, family, STACK_TRACE } from './tally';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const files = family('CLI: hostile input files', 'test/adversarial/hostileFiles.test.ts');
afterAll(() => files.save());

interface Run {
  code: number | 'hang';
  stdout: string;
  stderr: string;
}

async function run(argv: string[], boundMs = 10_000): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const code = await bounded(boundMs, () =>
    main(argv, {
      stdout: (t) => {
        stdout += t;
      },
      stderr: (t) => {
        stderr += t;
      },
      stderrIsTTY: false,
      cwd: dir,
    }),
  );
  files.tried++;
  if (code === 'hang') files.hangs++;
  if (code === 1 || STACK_TRACE.test(stderr)) files.crashes++;
  return { code, stdout, stderr };
}

/** Refused: exit 2, a message, nothing on stdout. */
function expectRefused(r: Run, message: RegExp, what: string): void {
  expect(r.code, `${what}: ${r.stderr}`).toBe(2);
  expect(r.stdout, what).toBe('');
  expect(r.stderr, what).toMatch(message);
  expect(r.stderr, what).not.toMatch(STACK_TRACE);
}

const caseText = (c: unknown = exampleCase()) => `${JSON.stringify(c, null, 2)}\n`;

describe('hostile input files', () => {
  it('duplicate keys anywhere in case, plan, ride and map files are refused naming the key path', async () => {
    const random = mulberry32(1401);
    // Every key of the example case, repeated in place with another value, one file each; plus a
    // whole second `conditions` object, and a key spelled with an escape.
    const base = caseText();
    const keyAt = [...base.matchAll(/"([a-z_]+)": /g)].map((m) => ({ key: m[1]!, at: m.index! }));
    let tried = 0;
    for (const { key, at } of keyAt) {
      if (random() < 0.5 && tried > 6) continue;
      // Insert `"key": <same value text>,` just before the original key.
      const lineEnd = base.indexOf('\n', at);
      const original = base.slice(at, lineEnd).replace(/,$/, '');
      if (original.endsWith('{') || original.endsWith('[')) continue; // objects: covered below
      const text = `${base.slice(0, at)}${original},\n${base.slice(at)}`;
      writeFileSync(join(dir, 'dup.json'), text);
      tried++;
      const r = await run(['solve', 'dup.json']);
      expectRefused(
        r,
        new RegExp(`the key "${key}" appears twice in one object \\(line \\d+, column \\d+\\)`),
        key,
      );
    }
    expect(tried).toBeGreaterThan(6);
    const twoConditions = base.replace(
      '"conditions": {',
      '"conditions": {"airspeed_mps": 99, "yaw_deg": 0},\n  "conditions": {',
    );
    writeFileSync(join(dir, 'dup2.json'), twoConditions);
    expectRefused(
      await run(['solve', 'dup2.json']),
      /conditions: the key "conditions" appears twice/,
      'conditions',
    );
    writeFileSync(
      join(dir, 'dup3.json'),
      base.replace('"wheel": {', '"wheel": {"n\\u0061me": 1, "name": 2, '),
    );
    expectRefused(await run(['solve', 'dup3.json']), /wheel\.name: the key "name" appears twice/, 'escaped');
    // Plans and ride files go through the same reader.
    writeFileSync(
      join(dir, 'dupplan.json'),
      caseText(examplePlan()).replace('"conditions": {', '"conditions": {"yaw_deg": [1],'),
    );
    expectRefused(
      await run(['sweep', 'dupplan.json']),
      /conditions\.yaw_deg: the key "yaw_deg" appears twice/,
      'plan',
    );
    const ride = readFileSync(join(__dirname, '../../public/examples/ride.json'), 'utf8');
    writeFileSync(join(dir, 'dupride.json'), ride.replace('"rider": {', '"rider": { "mass_kg": 1,'));
    expectRefused(
      await run(['ride', 'dupride.json']),
      /rider\.mass_kg: the key "mass_kg" appears twice/,
      'ride',
    );
  });

  it('prototype keys, numbers as strings, extreme exponents and deep nesting: refused by name, never obeyed', async () => {
    const hostile: Array<[string, string, RegExp]> = [
      [
        '__proto__ at the top',
        '{"__proto__": {"x": 1}, "conditions": {"airspeed_mps": 10, "yaw_deg": 0}}',
        /__proto__/,
      ],
      [
        'constructor key',
        '{"constructor": 1, "conditions": {"airspeed_mps": 10, "yaw_deg": 0}}',
        /constructor/,
      ],
      [
        '__proto__ in wheel',
        '{"wheel": {"__proto__": {"rim_depth_m": 0.9}}, "conditions": {"airspeed_mps": 10, "yaw_deg": 0}}',
        /__proto__/,
      ],
      ['number as string', '{"conditions": {"airspeed_mps": "10", "yaw_deg": 0}}', /airspeed_mps.*"10"/],
      [
        '1e400 overflows to Infinity',
        '{"conditions": {"airspeed_mps": 1e400, "yaw_deg": 0}}',
        /airspeed_mps/,
      ],
      ['-1e400', '{"conditions": {"airspeed_mps": 10, "yaw_deg": -1e400}}', /yaw_deg/],
      ['denormal 5e-324', '{"conditions": {"airspeed_mps": 5e-324, "yaw_deg": 0}}', /airspeed_mps/],
      [
        'huge lattice 1e308',
        '{"conditions": {"airspeed_mps": 10, "yaw_deg": 0}, "model": {"lattice_span": 1e308}}',
        /lattice_span/,
      ],
      [
        'nesting 100 000 deep',
        `{"name": ${'['.repeat(100_000)}${']'.repeat(100_000)}}`,
        /nesting deeper than 512 levels/,
      ],
      ['unbalanced nesting', `${'{"a":'.repeat(50_000)}`, /nesting deeper|invalid JSON/],
      ['a list, not an object', '[1, 2, 3]', /object/],
      ['null', 'null', /object|null/],
      ['empty file', '', /invalid JSON/],
      ['NUL bytes', '{"conditions"\u0000: 1}', /invalid JSON/],
      [
        'name over 200 characters',
        `{"name": "${'n'.repeat(5000)}", "conditions": {"airspeed_mps": 10, "yaw_deg": 0}}`,
        /name: must be at most 200 characters, got 5000/,
      ],
      [
        'explicit cover with a fraction',
        '{"wheel": {"cover": {"placement": "explicit", "inner_radius_m": 0.05, "outer_radius_m": 0.2, "fraction": 0.5}}, "conditions": {"airspeed_mps": 10, "yaw_deg": 0}}',
        /wheel\.cover\.fraction: not used when wheel\.cover\.placement is "explicit"/,
      ],
    ];
    for (const [what, text, message] of hostile) {
      writeFileSync(join(dir, 'h.json'), text);
      expectRefused(await run(['solve', 'h.json']), message, what);
      expect(({} as Record<string, unknown>).x, `${what}: Object.prototype untouched`).toBeUndefined();
    }
    // A plan that varies the cover fraction of an explicit cover is refused before anything runs.
    const plan = {
      wheel: {
        cover: { placement: 'explicit', inner_radius_m: 0.05, outer_radius_m: 0.2, fraction: [0, 0.5, 1] },
      },
      conditions: { airspeed_mps: 10, yaw_deg: 0 },
    };
    writeFileSync(join(dir, 'explicitplan.json'), JSON.stringify(plan));
    expectRefused(
      await run(['sweep', 'explicitplan.json']),
      /cover\.fraction: not used when/,
      'explicit plan',
    );
  });

  it('encodings: invalid UTF-8 in a name, UTF-16, a BOM (accepted), CR-only line ends (accepted)', async () => {
    const good = Buffer.from(caseText({ ...exampleCase(), name: 'ok' }));
    const at = good.indexOf('"ok"') + 1;
    for (const bad of [[0xff], [0xc3], [0xed, 0xa0, 0x80], [0xc0, 0xaf], [0xf8, 0x88, 0x80, 0x80, 0x80]]) {
      writeFileSync(
        join(dir, 'u.json'),
        Buffer.concat([good.subarray(0, at), Buffer.from(bad), good.subarray(at)]),
      );
      expectRefused(
        await run(['solve', 'u.json']),
        /not valid UTF-8 text \(an invalid byte near offset \d+\)/,
        `bytes ${bad}`,
      );
    }
    writeFileSync(
      join(dir, 'u16.json'),
      Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(good.toString(), 'utf16le')]),
    );
    expectRefused(await run(['solve', 'u16.json']), /UTF-16/, 'UTF-16');
    writeFileSync(join(dir, 'bom.json'), Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), good]));
    expect((await run(['solve', 'bom.json'])).code).toBe(0);
    writeFileSync(join(dir, 'cr.json'), good.toString().replace(/\n/g, '\r'));
    expect((await run(['solve', 'cr.json'])).code).toBe(0);
  });

  it('special files: devices, FIFOs, folders and /proc are refused or capped within the time bound', async () => {
    execFileSync('mkfifo', [join(dir, 'fifo.json')]);
    mkdirSync(join(dir, 'folder.json'));
    const specials: Array<[string, RegExp]> = [
      ['/dev/zero', /is a character device, not a regular file/],
      ['/dev/urandom', /is a character device, not a regular file/],
      ['/dev/null', /is a character device, not a regular file/],
      [join(dir, 'fifo.json'), /is a FIFO \(named pipe\), not a regular file/],
      [join(dir, 'folder.json'), /is a folder, not a file/],
      ['/proc/self/status', /invalid JSON/], // a regular file whose stat size is 0: read with the cap
      [join(dir, 'missing.json'), /no such file/],
    ];
    for (const [path, message] of specials) {
      for (const command of ['solve', 'sweep', 'ride']) {
        expectRefused(await run([command, path], 5_000), message, `${command} ${path}`);
      }
      const compare = await run(
        ['compare', join(__dirname, '../../public/demo/demo-case.json'), path],
        5_000,
      );
      expect(compare.code, `compare ${path}: ${compare.stderr}`).toBe(2);
      expect(compare.stderr).not.toMatch(STACK_TRACE);
    }
    // An unreadable file (no permission) when not root; as root the mode does not bind.
    writeFileSync(join(dir, 'locked.json'), caseText());
    chmodSync(join(dir, 'locked.json'), 0o000);
    const locked = await run(['solve', 'locked.json']);
    expect([0, 2]).toContain(locked.code);
  });

  it('odd paths and symbolic links to inputs: read as the files they name', async () => {
    const names = ['with space.json', 'ünïcødé.json', '-dash.json', 'semi;colon.json', "quote'.json"];
    for (const name of names) {
      writeFileSync(join(dir, name), caseText());
      const r = await run(['solve', '--', name]);
      expect(r.code, `${name}: ${r.stderr}`).toBe(0);
      expect(JSON.parse(r.stdout).format).toBe('coversweep-result');
    }
    symlinkSync(join(dir, 'with space.json'), join(dir, 'link.json'));
    expect((await run(['solve', 'link.json'])).code).toBe(0);
    symlinkSync(join(dir, 'nowhere.json'), join(dir, 'dangling.json'));
    expectRefused(await run(['solve', 'dangling.json']), /no such file/, 'dangling link');
    symlinkSync('/dev/zero', join(dir, 'zero-link.json'));
    expectRefused(await run(['solve', 'zero-link.json'], 5_000), /character device/, 'link to /dev/zero');
  });

  it('a 5 MB bad CSV cell is quoted cut, with its length; control characters are escaped', async () => {
    const cell = `x${'9'.repeat(5 * 1024 * 1024)}\u001b[31m`;
    writeFileSync(join(dir, 'data.csv'), `yaw_deg,axial_N\n0,${cell}\n`);
    writeFileSync(
      join(dir, 'map.json'),
      JSON.stringify({
        format: 'coversweep-map',
        version: 1,
        side_force_sign: 1,
        airspeed_mps: 12,
        columns: {
          yaw_deg: { quantity: 'yaw_deg', unit: 'deg' },
          axial_N: { quantity: 'axial_force', unit: 'N' },
        },
      }),
    );
    const r = await run([
      'compare',
      join(__dirname, '../../public/demo/demo-case.json'),
      'data.csv',
      '--map',
      'map.json',
    ]);
    expect(r.code, r.stderr).toBe(2);
    expect(r.stderr.length, 'stderr stays short').toBeLessThan(2000);
    expect(r.stderr).toMatch(/"x9{59}\.\.\. \(5242886 characters\)" is not a number/);
    expect(r.stderr).not.toContain('\u001b');
  });

  it('seeded mutations of the example case and ride files (bytes flipped, inserted, cut; lines repeated): exit 0 or 2, never a crash', async () => {
    const random = mulberry32(1409);
    const sources: Array<[string, string]> = [
      ['solve', caseText()],
      ['ride', readFileSync(join(__dirname, '../../public/examples/ride.json'), 'utf8')],
    ];
    const noise = [
      '"',
      '{',
      '}',
      '[',
      ']',
      ',',
      ':',
      '-',
      'e',
      '9',
      '0',
      '\\',
      '\u0000',
      '\u00ff',
      '\ud800',
      'n',
      ' ',
    ];
    for (let k = 0; k < 240; k++) {
      const [command, text] = sources[k % 3 === 2 ? 1 : 0]!;
      let mutated = text;
      const edits = 1 + Math.floor(random() * 3);
      for (let e = 0; e < edits; e++) {
        const at = Math.floor(random() * mutated.length);
        const kind = random();
        if (kind < 0.3)
          mutated = mutated.slice(0, at) + noise[Math.floor(random() * noise.length)] + mutated.slice(at + 1);
        else if (kind < 0.55)
          mutated = mutated.slice(0, at) + noise[Math.floor(random() * noise.length)] + mutated.slice(at);
        else if (kind < 0.8)
          mutated = mutated.slice(0, at) + mutated.slice(at + 1 + Math.floor(random() * 20));
        else {
          const lines = mutated.split('\n');
          const i = Math.floor(random() * lines.length);
          lines.splice(i, 0, lines[i]!);
          mutated = lines.join('\n');
        }
      }
      writeFileSync(join(dir, 'm.json'), mutated);
      const r = await run([command, 'm.json']);
      expect([0, 2], `${command} mutation ${k}: ${r.stderr.slice(0, 300)}`).toContain(r.code);
      expect(r.stderr).not.toMatch(STACK_TRACE);
      if (r.code === 2) expect(r.stdout, `mutation ${k}`).toBe('');
      else expect(() => JSON.parse(r.stdout), `mutation ${k}`).not.toThrow();
    }
  }, 120_000);

  it('usage: an option given twice is refused, whichever form', async () => {
    writeFileSync(join(dir, 'c.json'), caseText());
    for (const argv of [
      ['solve', 'c.json', '--out', 'a.json', '--out', 'b.json'],
      ['solve', 'c.json', '--out=a.json', '--out', 'b.json'],
      ['sweep', 'c.json', '--out', 'a.csv', '--out=b.csv'],
      ['sweep', 'c.json', '--workers', '1', '--workers', '2'],
    ]) {
      expectRefused(await run(argv), /given 2 times .*; give it once/, argv.join(' '));
    }
  });
});
