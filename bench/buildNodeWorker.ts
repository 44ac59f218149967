import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'vite';

/** Compile workers/solver.node.ts into one self-contained .mjs (SSR build, all deps bundled). */
export async function buildNodeWorker(): Promise<string> {
  const outDir = mkdtempSync(join(tmpdir(), 'coversweep-worker-'));
  await build({
    configFile: false,
    logLevel: 'warn',
    ssr: { noExternal: true },
    build: {
      ssr: 'workers/solver.node.ts',
      outDir,
      emptyOutDir: true,
      target: 'node20',
      minify: false,
      rollupOptions: { output: { entryFileNames: 'solver.node.mjs', format: 'es' } },
    },
  });
  return join(outDir, 'solver.node.mjs');
}
