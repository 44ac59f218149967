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
