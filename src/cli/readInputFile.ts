/**
 * Read an input file with a hard byte cap, in bounded time: only regular files are read (a device such
 * as /dev/zero or /dev/urandom, a FIFO, a socket or a folder is refused from fstat before any read,
 * and the file is opened non-blocking so opening a FIFO cannot wait for a writer); at most
 * `maxBytes + 1` bytes are read whatever the size fstat reports (files under /proc report 0). The
 * bytes must be valid UTF-8 (a byte-order mark is allowed): invalid bytes are refused with their
 * offset, never silently replaced.
 */
import { closeSync, constants, fstatSync, openSync, readSync } from 'node:fs';
import { readErrorReason } from './io';

/** A file that cannot or may not be read; `message` is plain words without the path. */
export class InputFileError extends Error {
  /** True when `message` is a whole sentence (a size refusal worded by the caller's `tooBig`). */
  readonly whole: boolean;
  constructor(message: string, whole = false) {
    super(message);
    this.whole = whole;
    this.name = 'InputFileError';
  }
}

function kind(stats: import('node:fs').Stats): string {
  if (stats.isDirectory()) return 'is a folder, not a file';
  if (stats.isFIFO()) return 'is a FIFO (named pipe), not a regular file';
  if (stats.isCharacterDevice()) return 'is a character device, not a regular file';
  if (stats.isBlockDevice()) return 'is a block device, not a regular file';
  if (stats.isSocket()) return 'is a socket, not a regular file';
  return 'is not a regular file';
}

const MB = 1024 * 1024;

function sizeText(bytes: number): string {
  return bytes >= MB ? `${(bytes / MB).toFixed(1)} MB` : `${bytes} bytes`;
}

/** The text of a regular file of at most `maxBytes` bytes. Throws InputFileError with plain words;
 * `tooBig(bytes)`, when given, words the refusal of a file over the limit. */
export function readInputFile(
  path: string,
  maxBytes: number,
  tooBig?: (bytes: number) => string | null,
): string {
  const refuseSize = (bytes: number, exact: boolean): never => {
    const message = tooBig?.(bytes);
    if (message)
      throw new InputFileError(
        exact ? message : message.replace(/ is [\d.]+ MB, more than/, ' is more than'),
        true,
      );
    throw new InputFileError(
      exact
        ? `is ${sizeText(bytes)}, more than the ${sizeText(maxBytes)} limit`
        : `is more than the ${sizeText(maxBytes)} limit (stopped reading there)`,
    );
  };
  let fd: number;
  try {
    fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    throw new InputFileError(readErrorReason(error));
  }
  try {
    const stats = fstatSync(fd);
    if (!stats.isFile()) throw new InputFileError(kind(stats));
    if (stats.size > maxBytes) refuseSize(stats.size, true);
    const buffer = Buffer.allocUnsafe(Math.min(maxBytes + 1, Math.max(stats.size + 1, 64 * 1024)));
    let length = 0;
    let grown = buffer;
    while (true) {
      if (length === grown.length) {
        if (grown.length > maxBytes) break;
        const bigger = Buffer.allocUnsafe(Math.min(maxBytes + 1, grown.length * 2));
        grown.copy(bigger, 0, 0, length);
        grown = bigger;
      }
      let n: number;
      try {
        n = readSync(fd, grown, length, grown.length - length, null);
      } catch (error) {
        throw new InputFileError(readErrorReason(error));
      }
      if (n === 0) break;
      length += n;
    }
    if (length > maxBytes) refuseSize(length, false);
    return decodeUtf8(grown.subarray(0, length));
  } finally {
    closeSync(fd);
  }
}

/** Strict UTF-8: the text, or InputFileError naming the first invalid byte's offset. */
export function decodeUtf8(bytes: Uint8Array): string {
  if (
    bytes.length >= 2 &&
    ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))
  ) {
    throw new InputFileError('is UTF-16 text (it starts with a UTF-16 byte-order mark); save it as UTF-8');
  }
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    // Find the first offset where decoding fails, for the message.
    let lo = 0;
    let hi = bytes.length;
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      try {
        new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, mid), { stream: true });
        lo = mid;
      } catch {
        hi = mid;
      }
    }
    throw new InputFileError(`is not valid UTF-8 text (an invalid byte near offset ${lo}); save it as UTF-8`);
  }
}
