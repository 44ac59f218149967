/**
 * Solved cases kept by their exact model input, so that a run after an edit solves only the cases whose
 * input changed (an edit of the current design's cover fraction leaves the map, the family and the cover
 * sweep as they were). Safe because a case's outcome is a pure function of its input: the same code
 * solves it on any worker in any order (runCases), so a kept outcome has the bits a new solve would give.
 * Only solved cases are kept (a failure may be a worker's, not the input's). Least recently used cases
 * are dropped beyond a byte budget.
 */
import type { SolvedCase } from '../engine/protocol';

/** Bytes a kept case costs: its packed numbers and its key (two bytes a character), roughly. */
function caseBytes(key: string, outcome: SolvedCase): number {
  return outcome.packed.byteLength + 2 * key.length + 256;
}

export class OutcomeCache {
  private readonly kept = new Map<string, { outcome: SolvedCase; bytes: number }>();
  private bytes = 0;

  /** `budgetBytes`: the most the kept cases may hold (keys and numbers), at least 1 kB. */
  constructor(readonly budgetBytes: number) {
    if (!(Number.isFinite(budgetBytes) && budgetBytes >= 1024))
      throw new RangeError(`budgetBytes must be a finite number >= 1024, got ${budgetBytes}`);
  }

  get size(): number {
    return this.kept.size;
  }

  get heldBytes(): number {
    return this.bytes;
  }

  has(key: string): boolean {
    return this.kept.has(key);
  }

  /** The kept outcome for `key` placed at `caseIndex`, on its own copy of the numbers; or null. */
  take(key: string, caseIndex: number): SolvedCase | null {
    const entry = this.kept.get(key);
    if (!entry) return null;
    this.kept.delete(key);
    this.kept.set(key, entry); // most recently used last
    return { ...entry.outcome, caseIndex, packed: entry.outcome.packed.slice() };
  }

  /** Keep a solved case (its numbers copied: the caller's array may be handed on). */
  keep(key: string, outcome: SolvedCase): void {
    const old = this.kept.get(key);
    if (old) {
      this.kept.delete(key);
      this.bytes -= old.bytes;
    }
    const bytes = caseBytes(key, outcome);
    if (bytes > this.budgetBytes) return;
    this.kept.set(key, { outcome: { ...outcome, packed: outcome.packed.slice() }, bytes });
    this.bytes += bytes;
    for (const [k, e] of this.kept) {
      if (this.bytes <= this.budgetBytes) break;
      this.kept.delete(k);
      this.bytes -= e.bytes;
    }
  }

  clear(): void {
    this.kept.clear();
    this.bytes = 0;
  }
}
