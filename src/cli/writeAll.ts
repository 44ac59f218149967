/**
 * Checked writes to a file descriptor: every byte is written or the call throws. A short write is
 * continued (the kernel may accept part of a buffer); a write that makes no progress is a full disk.
 * `EAGAIN` on a non-blocking pipe waits 1 ms and retries. Errors carry the system code (ENOSPC, EIO,
 * EPIPE, ...) so callers can say in plain words what happened (writeErrorReason).
 */
import { writeSync } from 'node:fs';

const pause = new Int32Array(new SharedArrayBuffer(4));

/** Write all of `text` (UTF-8) to `fd`. Returns the number of bytes written. */
export function writeAll(fd: number, text: string | Uint8Array): number {
  const bytes = typeof text === 'string' ? Buffer.from(text, 'utf8') : text;
  let offset = 0;
  let stalls = 0;
  while (offset < bytes.length) {
    let n: number;
    try {
      n = writeSync(fd, bytes, offset, bytes.length - offset);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'EAGAIN' && stalls++ < 600_000) {
        Atomics.wait(pause, 0, 0, 1);
        continue;
      }
      throw error;
    }
    if (n <= 0) {
      const full = new Error('no space left on device (a write made no progress)') as NodeJS.ErrnoException;
      full.code = 'ENOSPC';
      throw full;
    }
    offset += n;
  }
  return bytes.length;
}
