import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Compile workers/solver.node.ts of the tree at `cwd` into one self-contained .mjs, in a child process
 * (so the build's memory does not count in the benchmark's peak). Returns the file's path. */
export function buildNodeWorker(cwd = '.'): string {
  const outDir = mkdtempSync(join(tmpdir(), 'coversweep-worker-'));
  const result = spawnSync(
    'npx',
    ['vite', 'build', '--config', 'bench/vite.worker.config.ts', '--outDir', outDir],
    {
      cwd,
      stdio: ['ignore', 'ignore', 'inherit'],
    },
  );
  if (result.status !== 0) throw new Error(`building the worker failed (exit ${result.status})`);
  return join(outDir, 'solver.node.mjs');
}
