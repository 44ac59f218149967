import type { SpawnWorker } from '../compute/engine/workerHandle';
import { nodeWorkerSpawner } from './nodeWorker';
import { type PrestartedSpawner, prestartedSpawner } from './prestartedSpawner';

/** The value of a `--workers` option given once (`--workers N` or `--workers=N`), else undefined. */
function workersOption(args: readonly string[]): string | undefined {
  let value: string | undefined;
  let count = 0;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === '--') break;
    if (arg === '--help' || arg === '-h') return undefined;
    if (arg === '--workers') {
      value = args[++i];
      count++;
    } else if (arg.startsWith('--workers=')) {
      value = arg.slice('--workers='.length);
      count++;
    }
  }
  return count === 1 ? value : undefined;
}

/**
 * Start the worker threads a sweep asks for (`--workers N`, N from 1 to 64) before the sweep's own
 * modules are even loaded, so their start-up (a thread, its modules, the WebAssembly kernel) overlaps
 * this thread's loading and reading of the plan. A light look at the arguments only: the sweep command
 * checks them fully and releases these workers when it refuses them (or needs fewer). Undefined when
 * no valid --workers is given (the sweep then decides from the plan). `spawner` makes the spawn
 * function (tests pass a fake).
 */
export function sweepPrestart(
  args: readonly string[],
  workerEntry: string | undefined,
  spawner: (entry: string | undefined) => SpawnWorker = nodeWorkerSpawner,
): PrestartedSpawner | undefined {
  const value = workersOption(args);
  if (value === undefined || !/^\d+$/.test(value)) return undefined;
  const count = Number(value);
  if (count < 1 || count > 64) return undefined;
  return prestartedSpawner(spawner(workerEntry), count);
}
