/** What the command line talks to: output streams and whether stderr is a terminal (for the progress bar). */
export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  stderrIsTTY: boolean;
  /** Directory relative paths are resolved against. */
  cwd: string;
}

export function processIo(): CliIo {
  return {
    stdout: (text) => {
      process.stdout.write(text);
    },
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

/** Invalid input or usage: exit code 2, messages on stderr, nothing on stdout, no file written. */
export class CliInputError extends Error {
  readonly messages: string[];
  constructor(headline: string, messages: string[] = []) {
    super(headline);
    this.name = 'CliInputError';
    this.messages = messages;
  }
}

/** Plain words for why a file could not be read (a missing file, a folder, no permission, ...). */
export function readErrorReason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EISDIR') return 'is a folder, not a file';
  if (code === 'EACCES') return 'permission denied';
  return error instanceof Error ? error.message : String(error);
}
