/**
 * What the adversarial suite tried, per family: inputs tried, crashes (exit 1, an uncaught throw or a
 * stack trace), hangs (past a generous time bound), lost rows (finished rows missing from an output or
 * a kept partial) and executed injections (CSV cells a spreadsheet would run as a formula). Each test
 * file saves its families' rows to test-results/adversarial/<family>.json when it ends;
 * `npm run adversarial:table` merges every saved row (one per family, sorted) into README's hardening
 * section, so other suites (the page's) add rows the same way.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

export interface FamilyCounts {
  family: string;
  /** Where it is tested (a path under test/). */
  test: string;
  tried: number;
  crashes: number;
  hangs: number;
  lostRows: number;
  injections: number;
}

export const RESULTS_DIR = resolve(__dirname, '../../test-results/adversarial');

export function family(name: string, test: string): FamilyCounts & { save(): void } {
  const counts: FamilyCounts = {
    family: name,
    test,
    tried: 0,
    crashes: 0,
    hangs: 0,
    lostRows: 0,
    injections: 0,
  };
  return Object.assign(counts, {
    save() {
      mkdirSync(RESULTS_DIR, { recursive: true });
      const slug = name
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '');
      const { save: _, ...plain } = counts as FamilyCounts & { save?: unknown };
      writeFileSync(join(RESULTS_DIR, `${slug}.json`), `${JSON.stringify(plain)}\n`);
    },
  });
}

/** A stack trace in a message: "    at fn (file:line:col)". */
export const STACK_TRACE = /\n\s+at [^\n]*:\d+:\d+/;

/** Run `work` with a time bound; resolves to 'hang' past it (the work is left to finish on its own). */
export async function bounded<T>(ms: number, work: () => Promise<T>): Promise<T | 'hang'> {
  let timer: NodeJS.Timeout | undefined;
  const limit = new Promise<'hang'>((done) => {
    timer = setTimeout(() => done('hang'), ms);
  });
  try {
    return await Promise.race([work(), limit]);
  } finally {
    clearTimeout(timer);
  }
}
