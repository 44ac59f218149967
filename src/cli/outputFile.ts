/**
 * Atomic output files: everything is written to a temporary file in the target's folder, then moved
 * into place in one step (rename, or a hard link when overwriting is not allowed, so a file that
 * appeared meanwhile is never clobbered). A failure or interruption leaves no half-written file.
 */
import {
  closeSync,
  existsSync,
  fstatSync,
  fsyncSync,
  linkSync,
  openSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import { basename, dirname, resolve } from 'node:path';
import { CliInputError } from './io';

let tempCounter = 0;

/** Check an output path before any work is done: its folder exists, it is not a folder, and it may be written. */
export function checkOutputPath(path: string, force: boolean): void {
  const dir = dirname(path);
  if (!existsSync(dir) || !statSync(dir).isDirectory()) {
    throw new CliInputError(`--out ${path}: the folder ${dir} does not exist`);
  }
  if (existsSync(path)) {
    if (statSync(path).isDirectory()) throw new CliInputError(`--out ${path}: is a folder, not a file`);
    if (!force) {
      throw new CliInputError(`--out ${path}: the file already exists; use --force to overwrite it`);
    }
  }
}

export class AtomicFile {
  readonly path: string;
  readonly tempPath: string;
  private fd: number | null;
  private readonly force: boolean;

  constructor(path: string, force: boolean) {
    this.path = resolve(path);
    this.force = force;
    tempCounter++;
    this.tempPath = resolve(dirname(this.path), `.${basename(this.path)}.${process.pid}.${tempCounter}.tmp`);
    this.fd = openSync(this.tempPath, 'wx');
  }

  write(text: string): void {
    if (this.fd === null) throw new Error(`AtomicFile ${this.path}: write after close`);
    writeSync(this.fd, text);
  }

  /** Move the finished file into place. */
  commit(): void {
    if (this.fd === null) throw new Error(`AtomicFile ${this.path}: commit after close`);
    fsyncSync(this.fd);
    closeSync(this.fd);
    this.fd = null;
    if (this.force) {
      renameSync(this.tempPath, this.path);
      return;
    }
    try {
      linkSync(this.tempPath, this.path);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      if (code === 'EEXIST') {
        this.abort();
        throw new CliInputError(`--out ${this.path}: the file already exists; use --force to overwrite it`);
      }
      // A file system without hard links: fall back to check-then-rename.
      if (existsSync(this.path)) {
        this.abort();
        throw new CliInputError(`--out ${this.path}: the file already exists; use --force to overwrite it`);
      }
      renameSync(this.tempPath, this.path);
      return;
    }
    unlinkSync(this.tempPath);
  }

  /**
   * Keep what was written so far beside the target, as `<target>.partial` (or `.partial.1`, ... when
   * that exists: nothing is overwritten), and drop the temporary file. Returns the path kept, or null
   * when nothing had been written (or the file was already closed). For a sweep interrupted or failed
   * half-way: its finished rows are not lost, and the target's name never holds an unfinished file.
   */
  keepPartial(): string | null {
    if (this.fd === null) return null;
    const fd = this.fd;
    this.fd = null;
    const size = fstatSync(fd).size;
    fsyncSync(fd);
    closeSync(fd);
    if (size === 0) {
      this.abort();
      return null;
    }
    for (let k = 0; k < 100; k++) {
      const candidate = `${this.path}.partial${k === 0 ? '' : `.${k}`}`;
      try {
        linkSync(this.tempPath, candidate);
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'EEXIST') continue;
        // No hard links here: a rename, after checking the name is free.
        if (existsSync(candidate)) continue;
        renameSync(this.tempPath, candidate);
        return candidate;
      }
      unlinkSync(this.tempPath);
      return candidate;
    }
    this.abort();
    throw new Error(`${this.path}.partial ... .partial.99 all exist`);
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
    try {
      unlinkSync(this.tempPath);
    } catch {
      // already gone
    }
  }
}
