/**
 * The candidate closest to a mistyped name, for "did you mean ...?" hints. Distance is the optimal
 * string alignment form of the Damerau-Levenshtein distance: insertions, deletions, substitutions and
 * transpositions of two adjacent characters each cost 1, no substring edited twice (Damerau 1964,
 * "A technique for computer detection and correction of spelling errors", CACM 7(3); dynamic programme
 * of Wagner & Fischer 1974, JACM 21(1), with Lowrance & Wagner's 1975 transposition step). Case is
 * ignored. A candidate is suggested only when the distance is at most a third of the longer name
 * (at least 1, at most 3) - common practice, no source - so unrelated names suggest nothing.
 */

/** Optimal string alignment distance between `a` and `b` (case-sensitive). */
export function editDistance(a: string, b: string): number {
  const n = a.length;
  const m = b.length;
  if (n === 0) return m;
  if (m === 0) return n;
  // Three rolling rows: i-2, i-1 and i.
  let prev2 = new Array<number>(m + 1).fill(0);
  let prev = Array.from({ length: m + 1 }, (_, j) => j);
  let row = new Array<number>(m + 1).fill(0);
  for (let i = 1; i <= n; i++) {
    row[0] = i;
    for (let j = 1; j <= m; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(prev[j]! + 1, row[j - 1]! + 1, prev[j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1])
        d = Math.min(d, prev2[j - 2]! + 1);
      row[j] = d;
    }
    [prev2, prev, row] = [prev, row, prev2];
  }
  return prev[m]!;
}

/**
 * The candidate nearest to `name` (case-insensitive), or null when none is close enough. Ties go to
 * the earlier candidate.
 */
export function nearestName(name: string, candidates: readonly string[]): string | null {
  if (typeof name !== 'string') throw new RangeError(`name must be a string, got ${typeof name}`);
  const lower = name.toLowerCase();
  let best: string | null = null;
  let bestDistance = Number.POSITIVE_INFINITY;
  for (const c of candidates) {
    if (c === name) continue;
    const d = editDistance(lower, c.toLowerCase());
    const limit = Math.min(3, Math.max(1, Math.floor(Math.max(lower.length, c.length) / 3)));
    if (d <= limit && d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  return best;
}
