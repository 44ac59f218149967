/**
 * The command line's import path: `main` (commandLine.ts, which loads each command's module when it
 * runs), the help texts, and the sweep writer used by tests and benchmarks.
 */
export { HELP } from './commandHelp';
export { main } from './commandLine';
export { chunkText, writeSweep } from './sweepCommand';
