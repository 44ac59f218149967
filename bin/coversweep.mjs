#!/usr/bin/env node
// The `coversweep` command. Runs the TypeScript sources directly through tsx (no build step).
import { register } from 'tsx/esm/api';

// The commands write stdout through a checked writer (src/cli/stdoutWriter.ts: a closed pipe or a full
// disk is an error, exit 2). Should anything still write through process.stdout, a closed pipe there
// ends the command quietly.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});
register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
