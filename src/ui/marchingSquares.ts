/**
 * Contour lines of a gridded field by marching squares (Lorensen & Cline 1987, "Marching cubes", in its
 * two-dimensional form; saddle cells resolved by the cell-centre average, the "asymptotic decider"
 * simplified as in Nielson & Hamann 1991). Values are row-major: values[j * nx + i] at column i, row j.
 * Returns segments as [x0, y0, x1, y1, ...] in grid-index coordinates (x = column, y = row), with the
 * crossing point on each cell edge found by linear interpolation. Cells with a NaN corner are skipped.
 */
export function marchingSquares(values: ArrayLike<number>, nx: number, ny: number, level: number): number[] {
  if (!(Number.isInteger(nx) && nx >= 2)) throw new RangeError(`nx=${nx}: must be an integer >= 2`);
  if (!(Number.isInteger(ny) && ny >= 2)) throw new RangeError(`ny=${ny}: must be an integer >= 2`);
  if (values.length !== nx * ny) {
    throw new RangeError(`values.length=${values.length}: must equal nx * ny = ${nx * ny}`);
  }
  if (!Number.isFinite(level)) throw new RangeError(`level=${level}: must be finite`);
  const out: number[] = [];
  // Edge crossing points: 0 bottom (a-b), 1 right (b-c), 2 top (d-c), 3 left (a-d).
  const ex = [0, 0, 0, 0];
  const ey = [0, 0, 0, 0];
  const t = (v0: number, v1: number) => (v1 === v0 ? 0.5 : (level - v0) / (v1 - v0));
  const seg = (e0: number, e1: number) => {
    out.push(ex[e0]!, ey[e0]!, ex[e1]!, ey[e1]!);
  };
  for (let j = 0; j < ny - 1; j++) {
    for (let i = 0; i < nx - 1; i++) {
      const a = values[j * nx + i]!;
      const b = values[j * nx + i + 1]!;
      const c = values[(j + 1) * nx + i + 1]!;
      const d = values[(j + 1) * nx + i]!;
      if (Number.isNaN(a) || Number.isNaN(b) || Number.isNaN(c) || Number.isNaN(d)) continue;
      const code = (a >= level ? 1 : 0) | (b >= level ? 2 : 0) | (c >= level ? 4 : 0) | (d >= level ? 8 : 0);
      if (code === 0 || code === 15) continue;
      ex[0] = i + t(a, b);
      ey[0] = j;
      ex[1] = i + 1;
      ey[1] = j + t(b, c);
      ex[2] = i + t(d, c);
      ey[2] = j + 1;
      ex[3] = i;
      ey[3] = j + t(a, d);
      const centreAbove = (a + b + c + d) / 4 >= level;
      switch (code) {
        case 1:
        case 14:
          seg(3, 0);
          break;
        case 2:
        case 13:
          seg(0, 1);
          break;
        case 3:
        case 12:
          seg(3, 1);
          break;
        case 4:
        case 11:
          seg(1, 2);
          break;
        case 6:
        case 9:
          seg(0, 2);
          break;
        case 7:
        case 8:
          seg(3, 2);
          break;
        case 5: // a and c above
          if (centreAbove) {
            seg(0, 1);
            seg(2, 3);
          } else {
            seg(3, 0);
            seg(1, 2);
          }
          break;
        case 10: // b and d above
          if (centreAbove) {
            seg(3, 0);
            seg(1, 2);
          } else {
            seg(0, 1);
            seg(2, 3);
          }
          break;
      }
    }
  }
  return out;
}

/**
 * "Nice" contour or tick levels inside [lo, hi]: steps of 1, 2, 2.5 or 5 times a power of ten, the
 * one giving the count of intervals nearest `count` (common practice, no source).
 */
export function niceLevels(lo: number, hi: number, count = 6): number[] {
  if (!(Number.isFinite(lo) && Number.isFinite(hi)) || hi <= lo) return [];
  const span = hi - lo;
  const p = 10 ** Math.floor(Math.log10(span / Math.max(1, count)));
  let step = p;
  for (const k of [1, 2, 2.5, 5, 10, 20]) {
    if (Math.abs(span / (k * p) - count) < Math.abs(span / step - count)) step = k * p;
  }
  const out: number[] = [];
  for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + 1e-9 * step; k++) {
    out.push(Number((k * step).toPrecision(12)));
  }
  return out;
}
