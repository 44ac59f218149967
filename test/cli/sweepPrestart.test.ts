import { describe, expect, it } from 'vitest';
import { sweepPrestart } from '../../src/cli/sweepPrestart';
import type { SpawnWorker, WorkerHandle } from '../../src/compute/engine/workerHandle';

/** A fake spawner that counts the workers started and ended, and records the entry it was given. */
function fake() {
  const seen = { started: 0, ended: 0, entry: undefined as string | undefined };
  const spawner = (entry: string | undefined): SpawnWorker => {
    seen.entry = entry;
    return (): WorkerHandle => {
      seen.started++;
      return {
        api: {} as WorkerHandle['api'],
        failed: new Promise<never>(() => undefined),
        terminate: () => {
          seen.ended++;
        },
      };
    };
  };
  return { seen, spawner };
}

describe('sweepPrestart: workers started from a light look at the sweep arguments', () => {
  it('starts N workers for one valid --workers N or --workers=N, with the entry given', () => {
    for (const [args, n] of [
      [['plan.json', '--workers', '2'], 2],
      [['--workers=3', 'plan.json', '--out', 'x.csv'], 3],
      [['plan.json', '--workers', '64'], 64],
    ] as const) {
      const { seen, spawner } = fake();
      const early = sweepPrestart(args, 'entry.mjs', spawner);
      expect(early, `args ${args.join(' ')}`).toBeDefined();
      expect(seen, `args ${args.join(' ')}`).toEqual({ started: n, ended: 0, entry: 'entry.mjs' });
      early!.release();
      expect(seen.ended, `args ${args.join(' ')}: release() ends them all`).toBe(n);
    }
  });

  it('starts nothing when the option is missing, repeated, invalid, out of range, after -- or with --help', () => {
    for (const args of [
      ['plan.json'],
      ['plan.json', '--workers', '2', '--workers', '2'],
      ['plan.json', '--workers', '0'],
      ['plan.json', '--workers', '65'],
      ['plan.json', '--workers', '1.5'],
      ['plan.json', '--workers', '-1'],
      ['plan.json', '--workers'],
      ['plan.json', '--workers='],
      ['plan.json', '--', '--workers', '2'],
      ['plan.json', '--workers', '2', '--help'],
      ['-h', '--workers', '2'],
    ]) {
      const { seen, spawner } = fake();
      expect(sweepPrestart(args, undefined, spawner), `args ${args.join(' ')}`).toBeUndefined();
      expect(seen.started, `args ${args.join(' ')}`).toBe(0);
    }
  });
});

describe('commandSweep with workers started ahead', () => {
  it('releases them when it refuses the arguments or the plan, and for --help', async () => {
    const { commandSweep } = await import('../../src/cli/sweepCommand');
    const io = { stdout: () => undefined, stderr: () => undefined, stderrIsTTY: false, cwd: '/nonexistent' };
    for (const args of [
      ['missing.json', '--workers', '2'],
      ['missing.json', '--workers', '2', '--out', 'x.txt'],
      ['missing.json', '--workers', '2', '--bogus'],
    ]) {
      const { seen, spawner } = fake();
      const handed = sweepPrestart(args, undefined, spawner)!;
      await expect(commandSweep(args, io, handed), `args ${args.join(' ')}`).rejects.toThrow();
      expect(seen, `args ${args.join(' ')}`).toMatchObject({ started: 2, ended: 2 });
    }
    const { seen, spawner } = fake();
    const args = ['plan.json', '--workers', '2', '--help'];
    expect(await commandSweep(args, io, sweepPrestart(['--workers', '2'], undefined, spawner))).toBe(0);
    expect(seen).toMatchObject({ started: 2, ended: 2 });
  });
});
