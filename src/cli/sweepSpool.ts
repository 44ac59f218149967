/**
 * Finished cases that arrive before their turn. A pooled sweep's jobs finish in any order (they are
 * planned by lattice, not by case), while the output lists cases in plan order. Cases that cannot be
 * written yet are rendered at once (their solutions are dropped) and held here as text, in a temporary
 * file that is unlinked as soon as it is opened (nothing is left behind, even after SIGKILL), so
 * memory does not grow with the sweep and an interrupted run can still write every finished case
 * (drainTo). Should the temporary folder refuse a write, the text is held in memory instead.
 */
import { closeSync, openSync, readSync, unlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeAll } from './writeAll';

let spoolCounter = 0;

export class SweepSpool {
  private fd: number | null = null;
  private diskFailed = false;
  private end = 0;
  private readonly onDisk = new Map<number, { offset: number; length: number }>();
  private readonly inMemory = new Map<number, string>();

  constructor(private readonly dir: string = tmpdir()) {}

  /** Cases held. */
  get size(): number {
    return this.onDisk.size + this.inMemory.size;
  }

  has(index: number): boolean {
    return this.onDisk.has(index) || this.inMemory.has(index);
  }

  private file(): number | null {
    if (this.fd !== null || this.diskFailed) return this.fd;
    try {
      spoolCounter++;
      const path = join(this.dir, `.coversweep-spool.${process.pid}.${spoolCounter}`);
      this.fd = openSync(path, 'wx+', 0o600);
      unlinkSync(path);
    } catch {
      this.diskFailed = true;
      this.fd = null;
    }
    return this.fd;
  }

  /** Hold case `index`'s rendered text until its turn. */
  put(index: number, text: string): void {
    const fd = this.file();
    if (fd !== null) {
      try {
        const length = writeAll(fd, text);
        this.onDisk.set(index, { offset: this.end, length });
        this.end += length;
        return;
      } catch {
        this.diskFailed = true;
      }
    }
    this.inMemory.set(index, text);
  }

  /** Take case `index`'s text out of the spool (null when it is not held). */
  take(index: number): string | null {
    const text = this.inMemory.get(index);
    if (text !== undefined) {
      this.inMemory.delete(index);
      return text;
    }
    const at = this.onDisk.get(index);
    if (at === undefined || this.fd === null) return null;
    this.onDisk.delete(index);
    const buffer = Buffer.allocUnsafe(at.length);
    let read = 0;
    while (read < at.length) {
      const n = readSync(this.fd, buffer, read, at.length - read, at.offset + read);
      if (n <= 0) throw new Error(`sweep spool: case ${index} could not be read back`);
      read += n;
    }
    return buffer.toString('utf8');
  }

  /** Write every held case to `sink` in index order, emptying the spool. Returns how many. */
  drainTo(sink: (text: string) => void): number {
    const indices = [...this.onDisk.keys(), ...this.inMemory.keys()].sort((a, b) => a - b);
    for (const index of indices) sink(this.take(index) ?? '');
    return indices.length;
  }

  close(): void {
    if (this.fd !== null) {
      try {
        closeSync(this.fd);
      } catch {
        // already closed
      }
      this.fd = null;
    }
    this.onDisk.clear();
    this.inMemory.clear();
  }
}
