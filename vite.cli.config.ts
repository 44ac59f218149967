import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { defineConfig, type Plugin } from 'vite';
import { CLI_OUT_DIR, STAMP_FILE, sourceFingerprint } from './bin/builtCli.mjs';

/**
 * Writes the stamp bin/coversweep.mjs checks: the sources' fingerprint taken when the build starts
 * (an edit made while it runs makes the build stale), written only once every output file is.
 */
function cliStamp(): Plugin {
  let root = '.';
  let outDir = CLI_OUT_DIR;
  let fingerprint = '';
  return {
    name: 'coversweep-cli-stamp',
    apply: 'build',
    configResolved(config) {
      root = config.root;
      outDir = resolve(config.root, config.build.outDir);
    },
    buildStart() {
      fingerprint = sourceFingerprint(root);
    },
    writeBundle() {
      writeFileSync(join(outDir, STAMP_FILE), `${JSON.stringify({ fingerprint }, null, 2)}\n`);
    },
  };
}

// `npm run build:cli` (and `prepare`, so `npm ci`): the command line and its Node solver worker as plain
// ES modules in dist-cli/ (bin/coversweep.mjs runs them when the stamp matches the sources). Dependencies
// are bundled, so neither the CLI nor its worker threads load tsx or resolve packages at start-up.
export default defineConfig({
  logLevel: 'warn',
  publicDir: false,
  ssr: { noExternal: true },
  plugins: [cliStamp()],
  build: {
    ssr: true,
    outDir: CLI_OUT_DIR,
    emptyOutDir: true,
    target: 'node20',
    minify: false,
    rollupOptions: {
      // Each entry sits as deep in dist-cli/ as its source in the repository, so the sources' relative
      // URLs (commandLine.ts reads ../../package.json for --version) resolve to the same files.
      input: { 'cli/main': 'src/cli/commandLine.ts', 'workers/solver.node': 'workers/solver.node.ts' },
      output: { format: 'es', entryFileNames: '[name].mjs', chunkFileNames: 'chunks/[name]-[hash].mjs' },
    },
  },
});
