/**
 * Piecewise-linear interpolation in a table of measured points, held at the end values outside it
 * (common practice for tabulated handbook data, no source needed). `xs` strictly increasing, same
 * length as `ys` (>= 2); the caller checks its own argument's domain.
 */
export function interpolateTable(xs: readonly number[], ys: readonly number[], x: number): number {
  if (xs.length < 2 || xs.length !== ys.length) {
    throw new RangeError(
      `interpolateTable: xs (${xs.length}) and ys (${ys.length}) need 2 or more equal entries`,
    );
  }
  if (!(x > xs[0]!)) return ys[0]!;
  const last = xs.length - 1;
  if (x >= xs[last]!) return ys[last]!;
  let k = 1;
  while (xs[k]! < x) k++;
  const x0 = xs[k - 1]!;
  const t = (x - x0) / (xs[k]! - x0);
  return ys[k - 1]! + t * (ys[k]! - ys[k - 1]!);
}
