/**
 * The non-dominated set of points minimising two figures (a Pareto front): a point is kept unless
 * another is no worse in both figures and better in one. Sort by the first figure (ties by the second)
 * and keep each point that improves on the best second figure so far (Kung, Luccio & Preparata 1975,
 * "On finding the maxima of a set of vectors", J. ACM 22, the two-dimensional case). Points with a
 * NaN figure are left out. Returns the indices of the front, in increasing first figure.
 */
export function paretoFront(first: readonly number[], second: readonly number[]): number[] {
  if (first.length !== second.length) {
    throw new RangeError(`second.length=${second.length}: must equal first.length=${first.length}`);
  }
  const order = first
    .map((_, i) => i)
    .filter((i) => !Number.isNaN(first[i]!) && !Number.isNaN(second[i]!))
    .sort((i, j) => first[i]! - first[j]! || second[i]! - second[j]! || i - j);
  const out: number[] = [];
  let bestSecond = Number.POSITIVE_INFINITY;
  for (const i of order) {
    if (second[i]! < bestSecond) {
      out.push(i);
      bestSecond = second[i]!;
    }
  }
  return out;
}
