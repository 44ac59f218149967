/**
 * Atomic output files: everything is written to a temporary file in the target's folder, then moved
 * into place in one step (rename, or a hard link when overwriting is not allowed, so a file that
 * appeared meanwhile is never clobbered). Every write is checked (writeAll): a full disk or an I/O
 * error stops the run with a plain message and never leaves a file under the final name. Only regular
 * files or new names are written: a folder, symbolic link, device, FIFO or socket is never replaced,
 * with or without --force (POSIX rename(2) would replace any of them).
 */
import {
  closeSync,
  fdatasync,
  fstatSync,
  fsyncSync,
  ftruncateSync,
  linkSync,
  lstatSync,
  openSync,
  readdirSync,
  renameSync,
  type Stats,
  statSync,
  unlinkSync,
} from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { CliInputError, writeErrorReason } from './io';
import { writeAll } from './writeAll';

let tempCounter = 0;

/** With `flushInBackground`, bytes written between two background flushes (see AtomicFile.write). */
const BACKGROUND_FLUSH_BYTES = 4 << 20;

function lstatOrNull(path: string): Stats | null {
  try {
    return lstatSync(path);
  } catch {
    return null;
  }
}

/** What kind of thing a non-regular path is, in plain words. */
function kindOf(stats: Stats): string {
  if (stats.isDirectory()) return 'a folder';
  if (stats.isSymbolicLink()) return 'a symbolic link';
  if (stats.isFIFO()) return 'a FIFO (named pipe)';
  if (stats.isCharacterDevice()) return 'a character device';
  if (stats.isBlockDevice()) return 'a block device';
  if (stats.isSocket()) return 'a socket';
  return 'not a regular file';
}

/** Why `path` may not be written (a message), or null when it is a new name or (with force) a regular file. */
function outputRefusal(path: string, force: boolean, option = '--out'): string | null {
  const stats = lstatOrNull(path);
  if (stats === null) return null;
  if (stats.isSymbolicLink()) {
    let target = 'a missing file';
    try {
      const to = statSync(path);
      target = to.isFile() ? 'a file' : kindOf(to);
    } catch {
      // a dangling link
    }
    return `${option} ${path}: is a symbolic link (to ${target}); name the file itself or a new name`;
  }
  if (!stats.isFile()) {
    return `${option} ${path}: is ${kindOf(stats)}, not a regular file; outputs are regular files or new names (never replaced, even with --force)`;
  }
  if (!force) return `${option} ${path}: the file already exists; use --force to overwrite it`;
  return null;
}

/** Check an output path before any work is done: its folder exists, and the path is a new name or
 * (with --force) a regular file. `option` names the option in messages. */
export function checkOutputPath(path: string, force: boolean, option = '--out'): void {
  const dir = dirname(path);
  let dirStats: Stats | null = null;
  try {
    dirStats = statSync(dir);
  } catch {
    dirStats = null;
  }
  if (dirStats === null || !dirStats.isDirectory()) {
    throw new CliInputError(`${option} ${path}: the folder ${dir} does not exist`);
  }
  const refusal = outputRefusal(path, force, option);
  if (refusal) throw new CliInputError(refusal);
}

/** Hidden temporary files of this output left by a run that was killed (its process is gone). */
function staleTemps(path: string): string[] {
  const dir = dirname(path);
  const prefix = `.${basename(path)}.`;
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return [];
  }
  const stale: string[] = [];
  for (const name of names) {
    if (!name.startsWith(prefix) || !name.endsWith('.tmp')) continue;
    const m = /^\.(\d+)\.(\d+)\.tmp$/.exec(name.slice(prefix.length - 1));
    if (!m) continue;
    const pid = Number(m[1]);
    if (pid === process.pid) continue;
    try {
      process.kill(pid, 0);
      continue; // that process is alive: its file is not stale
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'ESRCH') continue;
    }
    stale.push(join(dir, name));
  }
  return stale;
}

/** A finished output whose name was taken when it was moved into place: its content was kept aside. */
export class OutputTakenError extends CliInputError {
  constructor(
    readonly path: string,
    readonly keptPath: string,
    reason: string,
  ) {
    super(
      `${path} was taken while the run went on (${reason}); nothing was replaced, and the finished output is kept in ${keptPath}`,
    );
    this.name = 'OutputTakenError';
  }
}

export class AtomicFile {
  readonly path: string;
  readonly tempPath: string;
  /** Stale temporary files of this output (from a killed run) removed when this one was opened. */
  readonly removedStale: string[] = [];
  private fd: number | null;
  private readonly force: boolean;
  /** Bytes of whole chunks written: a kept partial file is cut back to this boundary. */
  private wholeBytes = 0;
  /** Bytes written since the last background flush began, the flush running, and its error. */
  private unflushed = 0;
  private flushing: Promise<void> | null = null;
  private flushError: unknown = null;

  /**
   * `flushInBackground`: every few MB written, start an fdatasync of the temporary file on libuv's
   * thread pool (one at a time), so most of a large output reaches the disk while the run goes on and
   * the commit's own fsync, on the critical path at the end, has little left (12.8 MB: 15-30 ms here).
   * Call `settled()` before `commit()`. A failed background flush fails the commit.
   */
  constructor(
    path: string,
    force: boolean,
    private readonly flushInBackground = false,
  ) {
    this.path = resolve(path);
    this.force = force;
    for (const stale of staleTemps(this.path)) {
      try {
        unlinkSync(stale);
        this.removedStale.push(stale);
      } catch {
        // gone already, or not ours to remove
      }
    }
    tempCounter++;
    this.tempPath = resolve(dirname(this.path), `.${basename(this.path)}.${process.pid}.${tempCounter}.tmp`);
    try {
      this.fd = openSync(this.tempPath, 'wx');
    } catch (error) {
      throw new CliInputError(
        `--out ${this.path}: cannot create a file in ${dirname(this.path)}: ${writeErrorReason(error)}`,
      );
    }
  }

  /** Write one whole chunk (e.g. a case's rows, text or UTF-8 bytes). On failure nothing of the chunk counts. */
  write(text: string | Uint8Array): void {
    if (this.fd === null) throw new Error(`AtomicFile ${this.path}: write after close`);
    let written: number;
    try {
      written = writeAll(this.fd, text);
    } catch (error) {
      throw new CliInputError(`cannot write ${this.path}: ${writeErrorReason(error)}`);
    }
    this.wholeBytes += written;
    this.unflushed += written;
    if (this.flushInBackground && this.unflushed >= BACKGROUND_FLUSH_BYTES && this.flushing === null) {
      this.unflushed = 0;
      const fd = this.fd;
      this.flushing = new Promise((resolve) => {
        fdatasync(fd, (error) => {
          // An error after the file was closed (kept partial or aborted) no longer matters.
          if (error && this.fd === fd) this.flushError ??= error;
          this.flushing = null;
          resolve();
        });
      });
    }
  }

  /** Resolves once no background flush is running (call it before commit). */
  async settled(): Promise<void> {
    while (this.flushing !== null) await this.flushing;
  }

  /** Flush, close and check the temporary file: the last step where the disk can refuse. */
  private finishTemp(): void {
    const fd = this.fd;
    if (fd === null) throw new Error(`AtomicFile ${this.path}: commit after close`);
    this.fd = null;
    try {
      if (this.flushError !== null) throw this.flushError;
      fsyncSync(fd);
      const size = fstatSync(fd).size;
      if (size !== this.wholeBytes) throw new Error(`wrote ${this.wholeBytes} bytes, the file holds ${size}`);
    } catch (error) {
      try {
        closeSync(fd);
      } catch {
        // closing is best effort here
      }
      this.abort();
      throw new CliInputError(`cannot write ${this.path}: ${writeErrorReason(error)}`);
    }
    try {
      closeSync(fd);
    } catch (error) {
      this.abort();
      throw new CliInputError(`cannot write ${this.path}: ${writeErrorReason(error)}`);
    }
  }

  /** Move the finished file into place. A name taken meanwhile (a file, a dangling link, another
   * writer's result) is never replaced without --force, and never when it is not a regular file: the
   * finished content is then kept as `OUT.new` (or `.new.1`, ...) and OutputTakenError says so. */
  commit(): void {
    this.finishTemp();
    const refusal = outputRefusal(this.path, this.force);
    if (refusal !== null) this.keepAside(refusal);
    if (this.force) {
      try {
        renameSync(this.tempPath, this.path);
      } catch (error) {
        this.abort();
        throw new CliInputError(`cannot move the finished file to ${this.path}: ${writeErrorReason(error)}`);
      }
      return;
    }
    try {
      linkSync(this.tempPath, this.path);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      if (code === 'EEXIST') this.keepAside(outputRefusal(this.path, false) ?? 'the name was taken');
      // A file system without hard links: check, then rename.
      if (lstatOrNull(this.path) !== null) this.keepAside('the name was taken meanwhile');
      try {
        renameSync(this.tempPath, this.path);
      } catch (renameError) {
        this.abort();
        throw new CliInputError(
          `cannot move the finished file to ${this.path}: ${writeErrorReason(renameError)}`,
        );
      }
      return;
    }
    this.dropTemp();
  }

  private keepAside(reason: string): never {
    const kept = this.moveBeside('new');
    throw new OutputTakenError(this.path, kept, reason.replace(/^--out \S+: /, ''));
  }

  private dropTemp(): void {
    try {
      unlinkSync(this.tempPath);
    } catch {
      // already gone
    }
  }

  /** Move the closed temporary file to `<target>.<suffix>` (or `.<suffix>.1`, ...), never over anything. */
  private moveBeside(suffix: string): string {
    for (let k = 0; k < 100; k++) {
      const candidate = `${this.path}.${suffix}${k === 0 ? '' : `.${k}`}`;
      try {
        linkSync(this.tempPath, candidate);
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'EEXIST') continue;
        // No hard links here: a rename, after checking the name is free.
        if (lstatOrNull(candidate) !== null) continue;
        renameSync(this.tempPath, candidate);
        return candidate;
      }
      this.dropTemp();
      return candidate;
    }
    throw new Error(`${this.path}.${suffix} ... .${suffix}.99 all exist; the rows are in ${this.tempPath}`);
  }

  /**
   * Keep what was written so far beside the target, as `<target>.partial` (or `.partial.1`, ... when
   * that exists: nothing is overwritten), cut back to the last whole chunk (a case's rows), and drop the
   * temporary file. Returns the path kept, or null when nothing had been written (or the file was
   * already closed). For a sweep interrupted or failed half-way: its finished rows are not lost, and
   * the target's name never holds an unfinished file.
   */
  keepPartial(): string | null {
    if (this.fd === null) return null;
    const fd = this.fd;
    this.fd = null;
    try {
      ftruncateSync(fd, this.wholeBytes);
      fsyncSync(fd);
    } catch {
      // a failing disk: keep what is there (the cut may not have happened)
    }
    try {
      closeSync(fd);
    } catch {
      // already closed
    }
    if (this.wholeBytes === 0) {
      this.abort();
      return null;
    }
    return this.moveBeside('partial');
  }

  /** Throw the temporary file away (safe to call more than once). */
  abort(): void {
    if (this.fd !== null) {
      try {
        closeSync(this.fd);
      } catch {
        // already closed
      }
      this.fd = null;
    }
    this.dropTemp();
  }
}
