import { stdoutWriter } from './stdoutWriter';

export { CliInputError } from './cliInputError';
export { readErrorReason, writeErrorReason } from './errorReason';

/** What the command line talks to: output streams and whether stderr is a terminal (for the progress bar). */
export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  stderrIsTTY: boolean;
  /** Directory relative paths are resolved against. */
  cwd: string;
  /** Compiled solver worker entry (.mjs) for pooled sweeps; unset: the TypeScript entry through tsx. */
  workerEntry?: string;
}

export function processIo(): CliIo {
  return {
    stdout: stdoutWriter(),
    stderr: (text) => {
      process.stderr.write(text);
    },
    stderrIsTTY: process.stderr.isTTY === true,
    cwd: process.cwd(),
  };
}

/** Exit codes. */
export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_INPUT = 2;
