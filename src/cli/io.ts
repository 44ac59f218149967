import { stdoutWriter } from './stdoutWriter';

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

/** Plain words for why a write failed (a full disk, an I/O error, a closed pipe, ...). */
export function writeErrorReason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  const words: Record<string, string> = {
    ENOSPC: 'the disk is full',
    EDQUOT: 'the disk quota is exceeded',
    EIO: 'an input/output error (the disk or its connection failed)',
    EFBIG: 'the file is larger than this file system allows',
    EROFS: 'the file system is read-only',
    EACCES: 'permission denied',
    EPERM: 'operation not permitted',
    EPIPE: 'the reading end was closed',
    EBADF: 'it is not open for writing',
    ENOENT: 'the folder does not exist',
    ENOTDIR: 'a part of the path is not a folder',
    EISDIR: 'is a folder, not a file',
    ENAMETOOLONG: 'the name is too long',
  };
  if (code !== undefined && words[code] !== undefined) return `${words[code]} (${code})`;
  return error instanceof Error ? error.message.split('\n')[0]! : String(error);
}
