// Whether the compiled command line in dist-cli/ (`npm run build:cli`, run by `npm ci` through
// `prepare`) was built from the sources as they are now. Plain JavaScript: bin/coversweep.mjs reads it
// before anything is compiled, and vite.cli.config.ts writes the stamp with it.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Folder of the compiled command line, relative to the repository. */
export const CLI_OUT_DIR = 'dist-cli';
/** The stamp the build writes into CLI_OUT_DIR once every output file is written. */
export const STAMP_FILE = 'stamp.json';

/** Folders the command line is built from (src/ui is the page's: the CLI never imports it). */
const SOURCE_DIRS = ['src', 'workers'];
const SKIPPED_DIRS = new Set(['src/ui']);
/** Single files that change the build: dependencies and the build's own config. */
const SOURCE_FILES = ['package.json', 'package-lock.json', 'vite.cli.config.ts'];

/**
 * A fingerprint of the command line's sources under `root`: a hash of every file's path, size and
 * modification time (no file is read). Any edit, new, removed or renamed file changes it.
 */
export function sourceFingerprint(root) {
  const lines = [];
  const addFile = (rel) => {
    const stats = statSync(join(root, rel), { throwIfNoEntry: false });
    lines.push(stats ? `${rel}\t${stats.size}\t${stats.mtimeMs}` : `${rel}\tmissing`);
  };
  const visit = (rel) => {
    for (const entry of readdirSync(join(root, rel), { withFileTypes: true })) {
      const child = `${rel}/${entry.name}`;
      if (entry.isDirectory()) {
        if (!SKIPPED_DIRS.has(child)) visit(child);
      } else addFile(child);
    }
  };
  for (const dir of SOURCE_DIRS) visit(dir);
  for (const file of SOURCE_FILES) addFile(file);
  lines.sort();
  return createHash('sha256').update(lines.join('\n')).digest('hex');
}

/**
 * The compiled command line under `root` if it exists and its stamp matches the sources as they are
 * now: `{ main, worker }` (absolute paths of the CLI module and the solver worker entry); otherwise
 * undefined (no build, a failed or partial build, or a source changed since: run the sources).
 */
export function builtCli(root) {
  const outDir = join(root, CLI_OUT_DIR);
  let stamp;
  try {
    stamp = JSON.parse(readFileSync(join(outDir, STAMP_FILE), 'utf8'));
  } catch {
    return undefined;
  }
  const main = join(outDir, 'cli', 'main.mjs');
  const worker = join(outDir, 'workers', 'solver.node.mjs');
  if (!existsSync(main) || !existsSync(worker)) return undefined;
  if (stamp?.fingerprint !== sourceFingerprint(root)) return undefined;
  return { main, worker };
}
