#!/usr/bin/env node
// The `coversweep` command. Runs the TypeScript sources directly through tsx (no build step).
import { register } from 'tsx/esm/api';

// A closed pipe (e.g. `coversweep solve case.json | head`) ends the command quietly.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});
register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
