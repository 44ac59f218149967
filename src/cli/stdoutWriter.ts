/**
 * Standard output with every write checked: `solve > file` on a full disk, a closed pipe (EPIPE) or a
 * closed stdout (`solve >&-`) is an error (exit 2, one plain line), never a silent success. Node
 * reopens a closed fd 1 on /dev/null (read-write) before any script runs, so a closed stdout is
 * recognised, on Linux, as /dev/null open for reading and writing (a shell's `> /dev/null` opens it
 * write-only; /proc/self/fdinfo gives the open flags).
 */
import { fstatSync, readFileSync } from 'node:fs';
import { CliInputError } from './cliInputError';
import { writeErrorReason } from './errorReason';
import { writeAll } from './writeAll';

/** /dev/null is character device 1:3 on Linux. */
const DEV_NULL_RDEV = (1 << 8) | 3;

/** True when fd `fd` is the /dev/null Node opened in place of a closed descriptor (Linux only). */
export function wasClosedAtStart(fd: number): boolean {
  try {
    const stats = fstatSync(fd);
    if (!stats.isCharacterDevice() || stats.rdev !== DEV_NULL_RDEV) return false;
    const info = readFileSync(`/proc/self/fdinfo/${fd}`, 'utf8');
    const flags = /^flags:\s*([0-7]+)/m.exec(info);
    return flags !== null && (Number.parseInt(flags[1]!, 8) & 3) === 2; // O_RDWR
  } catch {
    return false;
  }
}

/** A checked writer for fd 1 (standard output). */
export function stdoutWriter(fd = 1): (text: string) => void {
  let checked = false;
  return (text) => {
    if (!checked) {
      checked = true;
      if (wasClosedAtStart(fd)) {
        throw new CliInputError(
          'cannot write to standard output: it is closed; nothing was written (give --out FILE, or a redirection)',
        );
      }
    }
    try {
      writeAll(fd, text);
    } catch (error) {
      throw new CliInputError(
        `cannot write to standard output: ${writeErrorReason(error)}; the output is incomplete`,
      );
    }
  };
}
