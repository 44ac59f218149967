#!/usr/bin/env node
// The `coversweep` command. Runs the compiled command line in dist-cli/ (`npm run build:cli`, run by
// `npm ci`) when its stamp matches the sources as they are now (bin/builtCli.mjs, ~2 ms); otherwise, or
// with COVERSWEEP_FROM_SOURCE=1, the TypeScript sources through tsx, so an edited source is never
// run stale.
import { fileURLToPath, pathToFileURL } from 'node:url';
import { builtCli } from './builtCli.mjs';

// The commands write stdout through a checked writer (src/cli/stdoutWriter.ts: a closed pipe or a full
// disk is an error, exit 2). Should anything still write through process.stdout, a closed pipe there
// ends the command quietly.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});
const built = process.env.COVERSWEEP_FROM_SOURCE
  ? undefined
  : builtCli(fileURLToPath(new URL('..', import.meta.url)));
let main;
if (built) {
  ({ main } = await import(pathToFileURL(built.main).href));
} else {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('../src/cli/main.ts'));
}
// The compiled CLI's worker threads run the compiled worker entry (no tsx in any thread).
process.exitCode = await main(process.argv.slice(2), built ? { workerEntry: built.worker } : {});
