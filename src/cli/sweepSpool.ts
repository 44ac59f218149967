/**
 * Finished cases that arrive before their turn. A pooled sweep's jobs finish in any order (two workers
 * often finish job k + 1 before job k), while the output lists cases in plan order. Cases that cannot
 * be written yet are rendered at once (their solutions are dropped) and held here: as they are, up to
 * `memoryBudgetBytes` (a job or two of a standard sweep: writing them to disk and reading them back
 * cost the main thread more than their bytes), then in a temporary file that is unlinked as soon as it
 * is opened (nothing is left behind, even after SIGKILL), so memory does not grow with the sweep and an
 * interrupted run can still write every finished case (drainTo). Should the temporary folder refuse a
 * write, the text is held in memory instead.
 */
import { closeSync, openSync, readSync, unlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeAll } from './writeAll';

let spoolCounter = 0;

/** A case's rendered rows: text, or its UTF-8 bytes. */
export type SweepChunk = string | Uint8Array;

/** Bytes of cases held in memory before the spool turns to its file (16 MB). */
export const SPOOL_MEMORY_BYTES = 16 * 2 ** 20;

function chunkBytes(chunk: SweepChunk): number {
  // A string's UTF-8 length is at most 3 bytes per UTF-16 code unit.
  return typeof chunk === 'string' ? 3 * chunk.length : chunk.byteLength;
}

export class SweepSpool {
  private fd: number | null = null;
  private diskFailed = false;
  private end = 0;
  private readonly onDisk = new Map<number, { offset: number; length: number }>();
  private readonly inMemory = new Map<number, SweepChunk>();
  /** Bytes (at most) of each case held in memory within the budget, and their sum. */
  private readonly budgeted = new Map<number, number>();
  private budgetUsed = 0;

  constructor(
    private readonly dir: string = tmpdir(),
    private readonly memoryBudgetBytes: number = SPOOL_MEMORY_BYTES,
  ) {}

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

  /** Hold case `index`'s rendered rows until its turn. */
  put(index: number, chunk: SweepChunk): void {
    const size = chunkBytes(chunk);
    if (this.budgetUsed + size <= this.memoryBudgetBytes) {
      this.budgetUsed += size;
      this.budgeted.set(index, size);
      this.inMemory.set(index, chunk);
      return;
    }
    const fd = this.file();
    if (fd !== null) {
      try {
        const length = writeAll(fd, chunk);
        this.onDisk.set(index, { offset: this.end, length });
        this.end += length;
        return;
      } catch {
        this.diskFailed = true;
      }
    }
    // Beyond the budget: the disk refused it.
    this.inMemory.set(index, chunk);
  }

  /** Take case `index`'s rows out of the spool (null when it is not held). */
  take(index: number): SweepChunk | null {
    const chunk = this.inMemory.get(index);
    if (chunk !== undefined) {
      this.inMemory.delete(index);
      this.budgetUsed -= this.budgeted.get(index) ?? 0;
      this.budgeted.delete(index);
      return chunk;
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
    return buffer;
  }

  /** Write every held case to `sink` in index order, emptying the spool. Returns how many. */
  drainTo(sink: (chunk: SweepChunk) => void): number {
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
    this.budgeted.clear();
    this.budgetUsed = 0;
  }
}
