/** The page benches' `vite preview` server (bench/page.ts, bench/pageTrace.ts). */
import { type ChildProcess, execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname, '..');
const VITE = join(ROOT, 'node_modules/vite/bin/vite.js');

/**
 * The page to serve: COVERSWEEP_PAGE_BENCH_DIST (a page built elsewhere, e.g. another commit's
 * `vite build --outDir <dir>`, `given`), or this tree built now into a new temporary folder.
 */
export function pageBuild(prefix: string): { dist: string; given: boolean } {
  const given = process.env.COVERSWEEP_PAGE_BENCH_DIST;
  if (given) return { dist: resolve(given), given: true };
  const dist = mkdtempSync(join(tmpdir(), prefix));
  execFileSync(process.execPath, [VITE, 'build', '--outDir', dist, '--emptyOutDir', '--logLevel', 'error'], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  return { dist, given: false };
}

/** Wait until the preview server `child` answers at `url` (up to 30 s; throws if it exits first). */
export async function waitForServer(url: string, child: ChildProcess): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error('vite preview exited early');
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((ok) => setTimeout(ok, 100));
  }
  throw new Error(`vite preview did not answer at ${url}`);
}
