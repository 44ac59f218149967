// The command line's option errors: plain text, the nearest option suggested (common practice, no source).
import { describe, expect, it } from 'vitest';
import { runCompare } from '../../src/cli/compareCommand';
import { main } from '../../src/cli/main';
import { OptionError, parseOptions } from '../../src/cli/parseOptions';
import { runRide } from '../../src/cli/rideCommand';
import { runValidate } from '../../src/cli/validateCommand';

function capture() {
  let out = '';
  let err = '';
  return {
    io: { stdout: (s: string) => void (out += s), stderr: (s: string) => void (err += s) },
    out: () => out,
    err: () => err,
  };
}

describe('parseOptions', () => {
  const options = { out: { type: 'string' }, force: { type: 'boolean' } } as const;
  it('names an unknown option and the nearest known one, without quotes', () => {
    expect(() => parseOptions('solve', { args: ['--outt', 'x'], options, allowPositionals: true })).toThrow(
      new OptionError('solve: unknown option --outt (did you mean --out?)'),
    );
    expect(() => parseOptions('solve', { args: ['--forse'], options })).toThrow(
      'solve: unknown option --forse (did you mean --force?)',
    );
    expect(() => parseOptions('solve', { args: ['--zebra=1'], options })).toThrow(
      /^solve: unknown option --zebra$/,
    );
    expect(() => parseOptions('solve', { args: ['--out'], options })).toThrow(
      'solve: option --out needs a value',
    );
    expect(() => parseOptions('solve', { args: ['a'], options, allowPositionals: false })).toThrow(
      'solve: unexpected argument a',
    );
  });
});

describe('every command names an unknown option with a suggestion and no stray quote', () => {
  const cases: [string, string[], string][] = [
    ['example', ['example', '--plna'], '--plan'],
    ['solve', ['solve', 'case.json', '--outt', 'x.json'], '--out'],
    ['sweep', ['sweep', 'plan.json', '--worker', '2'], '--workers'],
    ['ride', ['ride', 'ride.json', '--fromat', 'table'], '--format'],
    ['compare', ['compare', 'a.json', 'b.csv', '--calibrat'], '--calibrate'],
    ['validate', ['validate', '--jsno'], '--json'],
  ];
  for (const [command, argv, near] of cases) {
    it(command, async () => {
      const t = capture();
      const code = await main(argv, { ...t.io, cwd: '/nonexistent' });
      expect(code, t.err()).toBe(2);
      const bad = argv.find((a) => a.startsWith('--'))!;
      expect(t.err(), `stderr of ${argv.join(' ')}`).toContain(
        `unknown option ${bad} (did you mean ${near}?)`,
      );
      expect(t.err()).not.toMatch(/'/);
      expect(t.out()).toBe('');
    });
  }
  it('the command functions called directly say the same', () => {
    const t = capture();
    expect(runRide(['--hlep'], { ...t.io, readFile: () => '' })).toBe(2);
    expect(runValidate(['--jsn'], t.io)).toBe(2);
    expect(runCompare(['--mpa', 'x'], { ...t.io, readFile: () => '', fileSize: () => 0 })).toBe(2);
    expect(t.err()).toContain('ride: unknown option --hlep (did you mean --help?)');
    expect(t.err()).toContain('validate: unknown option --jsn (did you mean --json?)');
    expect(t.err()).toContain('compare: unknown option --mpa (did you mean --map?)');
  });
});
